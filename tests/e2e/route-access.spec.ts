import { expect, test, type APIRequestContext } from '@playwright/test';
import { DEMO, apiAs } from './helpers';
import {
	ROUTES,
	WHO,
	allProbes,
	fillPath,
	findRoutes,
	resolveIds,
	type ProbeIds,
	type Who
} from './route-probes';

// Every page, form action and API route, tried as anonymous, each role and a customer of another
// organization. The probes live in route-probes.ts (the fuzzer uses the same list).

test('every route in src/routes has access probes', () => {
	for (const route of findRoutes()) {
		const entry = ROUTES[route.id];
		expect(entry, `route ${route.id} has no entry in ROUTES`).toBeDefined();
		if (route.page) expect(entry?.page?.length, `${route.id}: page probes`).toBeGreaterThan(0);
		if (route.actions) expect(entry?.actions, `${route.id}: action probes`).toBeDefined();
		for (const method of route.methods) {
			expect(
				entry?.api?.some((p) => p.method === method),
				`${route.id}: ${method} probe`
			).toBe(true);
		}
	}
});

test.describe('access per role', () => {
	const clients = new Map<Who, APIRequestContext>();
	let ids: ProbeIds;

	test.beforeAll(async ({ baseURL }) => {
		for (const who of WHO) {
			clients.set(who, await apiAs(baseURL!, who === 'anonymous' ? null : DEMO[who]));
		}
		ids = await resolveIds(clients.get('admin')!, clients.get('broker')!);
	});

	test.afterAll(async () => {
		for (const client of clients.values()) await client.dispose();
	});

	const probes = allProbes();

	for (const who of WHO) {
		test(`as ${who}`, async () => {
			const client = clients.get(who)!;
			for (const probe of probes) {
				const url = fillPath(probe.path, ids, who);
				const response = await client.fetch(url, {
					method: probe.method,
					maxRedirects: 0,
					...(probe.body ? { data: probe.body } : {}),
					...(probe.form ? { form: probe.form, headers: { accept: 'text/html' } } : {})
				});
				const wanted = probe.expect[who] ?? probe.expect.default;
				expect(response.status(), `${who} ${probe.method} ${url}`).toBe(wanted);
				if (response.status() === 303 && who === 'anonymous') {
					expect(response.headers()['location']).toMatch(/^\/signin\?redirectTo=/);
				}
				if (url.startsWith('/api/') && wanted >= 400) {
					const body = (await response.json()) as { message?: string };
					expect(body.message, `${url} explains the refusal`).toBeTruthy();
				}
			}
		});
	}

	test('customers and brokers list only their own organization through the API', async () => {
		for (const who of ['customer', 'broker'] as const) {
			const response = await clients.get(who)!.get('/api/v1/organizations');
			const { organizations } = (await response.json()) as { organizations: { id: string }[] };
			expect(organizations.map((o) => o.id)).toEqual([ids.own.get(who)]);
		}
	});
});
