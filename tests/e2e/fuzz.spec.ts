import { expect, test, type APIRequestContext } from '@playwright/test';
import fc from 'fast-check';
import { DatabaseFingerprint, changedTables, type Fingerprint } from './db-fingerprint';
import {
	apiCase,
	apiRequest,
	formCase,
	formRequest,
	queryCase,
	queryString,
	type ApiCase,
	type FormCase,
	type QueryCase,
	type RawRequest
} from './fuzz-requests';
import { judgeAction, judgeApi, judgePage, type Verdict } from './fuzz-verdicts';
import { DEMO, apiAs } from './helpers';
import {
	MEASURE_BASE,
	freshShipment as copyShipment,
	headerOf,
	linesOf,
	shipmentJson as readShipment,
	type ShipmentJson
} from './fuzz-fixtures';
import { operation, requestSchema, skeleton, type OpenApi } from './openapi-skeleton';
import {
	WHO,
	allProbes,
	fillPath,
	resolveIds,
	type Probe,
	type ProbeIds,
	type Who
} from './route-probes';
import { findForms, pageForms, parseActionResult } from './superform-data';
import { ONLY, RUNS, SEED } from './fuzz-settings';

// Hostile input to every mutating probe of route-probes.ts (form actions and API) and to every
// query a GET reads, as a role that gets past the role check, so the validation is what is
// tested: never a 5xx, refusals that say why (field errors, field paths), and a database
// unchanged after every refused request. The seed is printed; FUZZ_SEED, FUZZ_RUNS and
// FUZZ_ONLY (a substring of the test title) reproduce a failure (DEVELOPERS.md, "Fuzzing").
//
// This file runs in the Playwright project "fuzz", after all other specs and alone (see
// playwright.config.ts), because the fingerprint covers every table.

type Kind = 'action' | 'api' | 'query' | 'page-query';
type Target = Probe & { id: string; kind: Kind };

const targets: Target[] = allProbes().flatMap((probe): Target[] => {
	const api = probe.path.startsWith('/api/');
	if (probe.method !== 'GET') return [{ ...probe, kind: api ? 'api' : 'action' }];
	if (api && probe.path.startsWith('/api/v1/')) return [{ ...probe, kind: 'query' }];
	return probe.path.includes('?') ? [{ ...probe, kind: 'page-query' }] : [];
});

/** The first role that gets past the probe's role check (not 303 / 401 / 403 / 404). */
function fuzzRole(probe: Probe): Who {
	const order: Who[] = ['admin', 'coordinator', 'finance', 'customer', 'broker', 'anonymous'];
	const passes = (who: Who) =>
		![303, 401, 403, 404].includes(probe.expect[who] ?? probe.expect.default);
	return order.find(passes) ?? 'admin';
}

/** A seed per target from the run's seed, so adding a route leaves the others' cases alone. */
function targetSeed(title: string): number {
	let hash = SEED | 0;
	for (const ch of title) hash = (Math.imul(hash, 31) + ch.charCodeAt(0)) | 0;
	return hash >>> 0;
}

function judge(kind: Kind, status: number, contentType: string, text: string): Verdict {
	if (kind === 'action') return judgeAction(status, contentType, text);
	if (kind === 'page-query') return judgePage(status, text);
	return judgeApi(status, contentType, text);
}

const urlencoded = (fields: Record<string, string>): RawRequest => ({
	headers: {
		'x-sveltekit-action': 'true',
		accept: 'application/json',
		'content-type': 'application/x-www-form-urlencoded'
	},
	data: new URLSearchParams(fields).toString()
});

/** Bodies that answered 500 (or wrote half) before the fixes of issue 9, kept as regressions. */
interface Regression {
	title: string;
	who: Who;
	method: 'POST' | 'PATCH';
	path: string;
	kind: Kind;
	request: (ship: ShipmentJson) => RawRequest;
	/** Text the refusal must carry (the field's error). */
	says: string;
}

const REGRESSIONS: Regression[] = [
	{
		title: 'NUL in a place name (PostgreSQL cannot store it)',
		who: 'coordinator',
		method: 'POST',
		path: '/places',
		kind: 'action',
		request: () =>
			urlencoded({ code: 'DEZZZ', name: 'Bre\u0000men', kind: 'seaport', countryCode: 'DE' }),
		says: 'NUL'
	},
	{
		title: 'a text/plain body to an action that reads the form itself',
		who: 'coordinator',
		method: 'POST',
		path: '/places/:place?/retire',
		kind: 'action',
		request: () => ({
			headers: { ...urlencoded({}).headers, 'content-type': 'text/plain' },
			data: 'version=1'
		}),
		says: 'could not be read'
	},
	{
		title: 'a list posted as a plain field (superforms threw)',
		who: 'finance',
		method: 'POST',
		path: '/reference/settings',
		kind: 'action',
		request: () => urlencoded({ insuranceRatePercent: '0.3', brokerage: 'x', version: '0' }),
		says: 'list or a group'
	},
	{
		title: 'a cycle in __superform_json (stack overflow)',
		who: 'coordinator',
		method: 'POST',
		path: '/places',
		kind: 'action',
		request: () => urlencoded({ __superform_json: '[{"countryCode":0}]' }),
		says: 'not one the form can take'
	},
	{
		title: 'a file in a list of text fields (the failure could not be serialised)',
		who: 'coordinator',
		method: 'POST',
		path: '/shipments/:ship?/issuePapers',
		kind: 'action',
		request: () => {
			const boundary = 'landfall-regression';
			const part = (name: string, extra = '', value = 'x') =>
				`--${boundary}\r\nContent-Disposition: form-data; name="${name}"${extra}\r\n\r\n${value}\r\n`;
			return {
				headers: {
					'x-sveltekit-action': 'true',
					accept: 'application/json',
					'content-type': `multipart/form-data; boundary=${boundary}`
				},
				data:
					part('kinds', '; filename="a.pdf"', '%PDF-1.4') +
					part('__superform_id', '', 'issue') +
					`--${boundary}--\r\n`
			};
		},
		says: 'A file cannot go in this field'
	},
	{
		title: 'NUL in an API token name',
		who: 'admin',
		method: 'POST',
		path: '/admin/users/:user?/issueToken',
		kind: 'action',
		request: () => urlencoded({ name: 'ERP\u0000export' }),
		says: 'NUL'
	},
	{
		title: 'NUL in a status note',
		who: 'coordinator',
		method: 'POST',
		path: '/shipments/:ship?/status',
		kind: 'action',
		request: (s) => urlencoded({ to: 'booked', note: 'ok\u0000', version: String(s.version) }),
		says: 'NUL'
	},
	{
		title: 'NUL in the shipment notes through the API',
		who: 'coordinator',
		method: 'PATCH',
		path: '/api/v1/shipments/:ship',
		kind: 'api',
		request: (s) => ({
			headers: { 'content-type': 'application/json' },
			data: JSON.stringify({ ...headerOf(s), notes: 'a\u0000b', version: s.version })
		}),
		says: '"path":"notes"'
	}
];

test.describe('hostile input', () => {
	const clients = new Map<Who, APIRequestContext>();
	const db = new DatabaseFingerprint();
	let ids: ProbeIds;
	let spec: OpenApi;
	let template: ShipmentJson;
	let fuzzUser = '';

	test.beforeAll(async ({ baseURL }) => {
		console.log(`fuzz: seed ${SEED}, ${RUNS} runs per target (FUZZ_SEED, FUZZ_RUNS, FUZZ_ONLY)`);
		for (const who of WHO) {
			clients.set(who, await apiAs(baseURL!, who === 'anonymous' ? null : DEMO[who]));
		}
		const admin = clients.get('admin')!;
		ids = await resolveIds(admin, clients.get('broker')!);
		spec = (await (await admin.get('/api/v1/openapi.json')).json()) as OpenApi;
		template = (await (await admin.get(`/api/v1/shipments/${ids.ship}`)).json()) as ShipmentJson;
		// A person of the fuzzer's own, so a save that happens to pass never locks out a demo user.
		const created = await admin.post('/api/v1/users', {
			data: {
				name: 'Fuzz Target',
				email: `fuzz-${Date.now()}@solvrae.example`,
				role: 'coordinator',
				organizationId: ids.own.get('coordinator'),
				password: 'Fuzz-target-password-2026'
			}
		});
		expect(created.status(), await created.text()).toBe(201);
		fuzzUser = ((await created.json()) as { id: string }).id;
		await db.open();
	});

	test.afterAll(async () => {
		await db.close();
		for (const client of clients.values()) await client.dispose();
	});

	const shipmentJson = (id: string) => readShipment(clients.get('admin')!, id);
	const freshShipment = () => copyShipment(clients.get('admin')!, template);

	async function send(who: Who, method: string, kind: Kind, url: string, request: RawRequest) {
		const response = await clients.get(who)!.fetch(url, {
			method,
			headers: request.headers,
			data: request.data,
			maxRedirects: 0,
			timeout: 30_000
		});
		const text = await response.text();
		const contentType = response.headers()['content-type'] ?? '';
		return { text, verdict: judge(kind, response.status(), contentType, text) };
	}

	test('the fingerprint sees a saved change', async () => {
		const before = await db.take();
		await freshShipment();
		expect(changedTables(before, await db.take())).toEqual(
			expect.arrayContaining(['shipments', 'shipment_lines', 'audit_events'])
		);
	});

	test('requests that once answered 500 are refused on their field', async () => {
		const ship = await freshShipment();
		const local: ProbeIds = { ...ids, ship: ship.id, user: fuzzUser };
		for (const r of REGRESSIONS) {
			const url = fillPath(r.path, local, r.who);
			const before = await db.take();
			const { text, verdict } = await send(r.who, r.method, r.kind, url, r.request(ship));
			expect(verdict.problems, r.title).toEqual([]);
			expect(verdict.status, r.title).toBe(400);
			expect(text, r.title).toContain(r.says);
			expect(changedTables(before, await db.take()), r.title).toEqual([]);
		}
	});

	/** The known-good request of a target and how each fuzzed case becomes a request. */
	async function casesFor(
		target: Target,
		who: Who,
		url: string,
		shipment: ShipmentJson | undefined
	): Promise<{
		arbitrary: fc.Arbitrary<unknown>;
		make: (c: unknown) => RawRequest & { url: string };
	}> {
		const [path, query = ''] = url.split(/\?(.*)/s) as [string, string?];
		if (target.kind === 'query' || target.kind === 'page-query') {
			const base: Record<string, string> = Object.fromEntries(new URLSearchParams(query));
			for (const p of operation(spec, path, 'GET')?.parameters ?? []) {
				if (p.in === 'query') base[p.name] ??= '';
			}
			return {
				arbitrary: queryCase,
				make: (c) => ({ url: `${path}?${queryString(base, c as QueryCase)}`, headers: {} })
			};
		}
		if (target.kind === 'api') {
			let base = skeleton(spec, requestSchema(operation(spec, path, target.method)));
			if (/^\/api\/v1\/shipments(\/[^/]+)?$/.test(path)) {
				const current = shipment ? await shipmentJson(shipment.id) : template;
				base = { ...headerOf(current), version: current.version };
			} else if (path.endsWith('/lines') && shipment) {
				const current = await shipmentJson(shipment.id);
				base = { lines: linesOf(current), version: current.version };
			} else if (path === '/api/v1/calc/measure') {
				base = MEASURE_BASE;
			} else if (base === null || typeof base !== 'object') {
				base = target.body ?? {};
			}
			return {
				arbitrary: apiCase,
				make: (c) => ({ url, ...apiRequest(base, c as ApiCase) })
			};
		}
		// A form action: its answer to the probe's form names the superform (if any); the page's
		// data has that form's current, valid values (and the version other forms send).
		const client = clients.get(who)!;
		const discovery = await client.post(url, {
			headers: { 'x-sveltekit-action': 'true', accept: 'application/json' },
			form: target.form ?? {},
			maxRedirects: 0
		});
		const answered = discovery.headers()['content-type']?.includes('json')
			? findForms(parseActionResult(await discovery.text()).data)
			: [];
		const onPage = await pageForms(client, path);
		const form = answered[0];
		const current = form ? onPage.find((f) => f.id === form.id) : undefined;
		let base: Record<string, unknown> = current?.data ?? form?.data ?? { ...target.form };
		const version = onPage.find((f) => typeof f.data.version === 'number')?.data.version;
		if (!form && version !== undefined) base = { ...base, version };
		return {
			arbitrary: formCase(base),
			make: (c) => ({ url, ...formRequest(base, form?.id, c as FormCase) })
		};
	}

	for (const target of targets) {
		const title = `${target.method} ${target.path}`;
		if (ONLY && !title.includes(ONLY)) continue;

		test(title, async () => {
			test.setTimeout(120_000);
			const who = fuzzRole(target);
			const local: ProbeIds = { ...ids, user: fuzzUser };
			// Mutations get a shipment of their own: one accepted status change or save must not
			// turn the next target's cases into 409s.
			const shipment =
				target.path.includes(':ship') && target.method !== 'GET'
					? await freshShipment()
					: undefined;
			if (shipment) local.ship = shipment.id;
			const url = fillPath(target.path, local, who);
			const seed = targetSeed(title);

			let cases = await casesFor(target, who, url, shipment);
			let before: Fingerprint = await db.take();
			const statuses = new Map<number, number>();
			const property = fc.asyncProperty(cases.arbitrary, async (c) => {
				const request = cases.make(c);
				const { verdict } = await send(who, target.method, target.kind, request.url, request);
				statuses.set(verdict.status, (statuses.get(verdict.status) ?? 0) + 1);
				const after = await db.take();
				if (verdict.rejected) {
					const changed = changedTables(before, after);
					if (changed.length) verdict.problems.push(`refused, yet changed ${changed.join(', ')}`);
					before = after;
				} else if (target.kind === 'action' || target.kind === 'api') {
					// Saved: versions moved on, so the next cases start from the record as it is now.
					cases = await casesFor(target, who, url, shipment);
					before = await db.take();
				} else {
					before = after;
				}
				if (verdict.problems.length) {
					const body =
						typeof request.data === 'string' ? request.data : request.data?.toString('latin1');
					throw new Error(
						`${verdict.problems.join('; ')}\n  request: ${target.method} ` +
							`${request.url.slice(0, 300)} ${JSON.stringify(request.headers)}\n` +
							`  body: ${JSON.stringify((body ?? '').slice(0, 600))}`
					);
				}
			});
			try {
				await fc.assert(property, { seed, numRuns: RUNS, endOnFailure: true });
			} finally {
				const summary = [...statuses].map(([s, n]) => `${s}×${n}`).join(' ');
				console.log(`fuzz ${title} as ${who} (seed ${seed}): ${summary}`);
			}
		});
	}
});
