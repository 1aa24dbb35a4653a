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
	type RawRequest
} from './fuzz-requests';
import { judgeAction, judgeApi, type Verdict } from './fuzz-verdicts';
import { DEMO, apiAs } from './helpers';
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

// Hostile input to every mutating probe of route-probes.ts (form actions and API) and to every
// query a GET reads, as a role that gets past the role check, so the validation is what is
// tested: never a 5xx, refusals that name the fields, and a database unchanged after every
// refused request. The seed is printed; FUZZ_SEED, FUZZ_RUNS and FUZZ_ONLY (a substring of the
// test title) reproduce a failure (DEVELOPERS.md, "Fuzzing").
//
// This file runs in the Playwright project "fuzz", after all other specs and alone (see
// playwright.config.ts), because the fingerprint covers every table.

const SEED = Number(process.env.FUZZ_SEED ?? 20261204);
const RUNS = Number(process.env.FUZZ_RUNS ?? 15);
const ONLY = process.env.FUZZ_ONLY ?? '';

type Target = Probe & { id: string; kind: 'action' | 'api' | 'query' };

interface OpenApi {
	paths: Record<string, Record<string, OpenApiOperation>>;
	components: { schemas: Record<string, JsonSchema> };
}
interface OpenApiOperation {
	parameters?: { in: string; name: string }[];
	requestBody?: { content?: Record<string, { schema?: JsonSchema }> };
}
interface JsonSchema {
	$ref?: string;
	type?: string | string[];
	properties?: Record<string, JsonSchema>;
	items?: JsonSchema;
	enum?: unknown[];
	const?: unknown;
	format?: string;
	anyOf?: JsonSchema[];
	oneOf?: JsonSchema[];
	allOf?: JsonSchema[];
	default?: unknown;
}

/** The OpenAPI path template of a concrete /api/v1 path (ids become {…}). */
function openApiPath(path: string): string {
	return path
		.split('?')[0]!
		.replace(/^\/api\/v1/, '')
		.replace(/\/:[a-zA-Z]+/g, '/{}')
		.replace(/\/[0-9a-f-]{36}/g, '/{}');
}

function operation(spec: OpenApi, path: string, method: string): OpenApiOperation | undefined {
	const wanted = openApiPath(path);
	const entry = Object.entries(spec.paths).find(([p]) => p.replace(/\{[^}]+\}/g, '{}') === wanted);
	return entry?.[1][method.toLowerCase()];
}

/** A skeleton value of a JSON schema: every property, one item per list, the first choice. */
function skeleton(spec: OpenApi, schema: JsonSchema | undefined, depth = 0): unknown {
	if (!schema || depth > 6) return null;
	if (schema.$ref) {
		const name = schema.$ref.split('/').pop()!;
		return skeleton(spec, spec.components.schemas[name], depth + 1);
	}
	if (schema.default !== undefined) return schema.default;
	if (schema.const !== undefined) return schema.const;
	if (schema.enum) return schema.enum[0];
	const choice = schema.anyOf ?? schema.oneOf;
	if (choice) return skeleton(spec, choice[choice.length - 1], depth + 1);
	if (schema.allOf) {
		return Object.assign({}, ...schema.allOf.map((s) => skeleton(spec, s, depth + 1)));
	}
	const type = Array.isArray(schema.type) ? schema.type[0] : schema.type;
	if (type === 'object' || schema.properties) {
		return Object.fromEntries(
			Object.entries(schema.properties ?? {}).map(([k, s]) => [k, skeleton(spec, s, depth + 1)])
		);
	}
	if (type === 'array') return [skeleton(spec, schema.items, depth + 1)];
	if (type === 'integer' || type === 'number') return 1;
	if (type === 'boolean') return false;
	if (schema.format === 'uuid') return '00000000-0000-4000-8000-000000000000';
	if (schema.format === 'date') return '2026-12-01';
	return 'x';
}

/** The first role that gets past the probe's role check (not 303 / 401 / 403 / 404). */
function fuzzRole(probe: Probe): Who {
	const order: Who[] = ['admin', 'coordinator', 'finance', 'customer', 'broker', 'anonymous'];
	return (
		order.find(
			(who) => ![303, 401, 403, 404].includes(probe.expect[who] ?? probe.expect.default)
		) ?? 'admin'
	);
}

/** A seed per target from the run's seed, so adding a route leaves the others' cases alone. */
function targetSeed(title: string): number {
	let hash = SEED | 0;
	for (const ch of title) hash = (Math.imul(hash, 31) + ch.charCodeAt(0)) | 0;
	return hash >>> 0;
}

const HEADER_FIELDS = [
	'customerId',
	'consigneeId',
	'notifyPartyId',
	'brokerId',
	'incoterm',
	'incotermPlace',
	'originId',
	'destinationId',
	'modesConsidered',
	'chosenMode',
	'currency',
	'palletTypeId',
	'carrier',
	'vessel',
	'voyageOrFlight',
	'bookingNumber',
	'etd',
	'eta',
	'notes'
];

interface ShipmentJson extends Record<string, unknown> {
	id: string;
	version: number;
	lines: { productId: string; quantity: number; unitPrice: string }[];
}

function headerOf(shipment: ShipmentJson): Record<string, unknown> {
	return Object.fromEntries(HEADER_FIELDS.map((k) => [k, shipment[k] ?? '']));
}

const targets: Target[] = allProbes().flatMap((probe): Target[] => {
	if (probe.method !== 'GET') {
		return [{ ...probe, kind: probe.path.startsWith('/api/') ? 'api' : 'action' }];
	}
	return probe.path.includes('?') || probe.path.startsWith('/api/v1/')
		? [{ ...probe, kind: 'query' }]
		: [];
});

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
		const { users } = (await (await admin.get('/api/v1/users')).json()) as {
			users: { email: string; organizationId: string }[];
		};
		const created = await admin.post('/api/v1/users', {
			data: {
				name: 'Fuzz Target',
				email: `fuzz-${Date.now()}@solvrae.example`,
				role: 'coordinator',
				organizationId: users.find((u) => u.email === DEMO.coordinator)!.organizationId,
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

	/** A new draft shipment like Hallvik's seeded one (same parties, broker and lines). */
	async function freshShipment(admin: APIRequestContext): Promise<ShipmentJson> {
		const created = await admin.post('/api/v1/shipments', { data: headerOf(template) });
		expect(created.status(), await created.text()).toBe(201);
		const { id } = (await created.json()) as { id: string };
		const lines = template.lines.map((l) => ({
			productId: l.productId,
			quantity: l.quantity,
			unitPrice: l.unitPrice
		}));
		const put = await admin.put(`/api/v1/shipments/${id}/lines`, { data: { lines, version: 0 } });
		expect(put.status(), await put.text()).toBe(200);
		return (await (await admin.get(`/api/v1/shipments/${id}`)).json()) as ShipmentJson;
	}

	for (const target of targets) {
		const title = `${target.method} ${target.path}`;
		if (ONLY && !title.includes(ONLY)) continue;

		test(title, async () => {
			test.setTimeout(120_000);
			const who = fuzzRole(target);
			const client = clients.get(who)!;
			const admin = clients.get('admin')!;
			const local: ProbeIds = { ...ids, user: fuzzUser };
			let shipment: ShipmentJson | undefined;
			if (target.path.includes(':ship') && target.method !== 'GET') {
				shipment = await freshShipment(admin);
				local.ship = shipment.id;
			}
			const url = fillPath(target.path, local, who);
			const [path, query = ''] = url.split(/\?(.*)/s) as [string, string?];
			const seed = targetSeed(title);

			// What a well-formed request looks like, and how each case becomes a request.
			let build: () => Promise<{
				arbitrary: fc.Arbitrary<unknown>;
				make: (c: unknown) => RawRequest & { url: string };
			}>;

			if (target.kind === 'query') {
				const op = path.startsWith('/api/') ? operation(spec, path, 'GET') : undefined;
				const base: Record<string, string> = Object.fromEntries(new URLSearchParams(query));
				for (const p of op?.parameters ?? []) if (p.in === 'query') base[p.name] ??= '';
				build = async () => ({
					arbitrary: queryCase as fc.Arbitrary<unknown>,
					make: (c) => ({
						url: `${path}?${queryString(base, c as Parameters<typeof queryString>[1])}`,
						headers: {}
					})
				});
			} else if (target.kind === 'api') {
				const op = operation(spec, path, target.method);
				build = async () => {
					let base: unknown = skeleton(
						spec,
						op?.requestBody?.content?.['application/json']?.schema
					);
					if (/\/api\/v1\/shipments(\/[^/]+)?$/.test(path) && target.method !== 'GET') {
						const current = shipment
							? ((await (
									await admin.get(`/api/v1/shipments/${shipment.id}`)
								).json()) as ShipmentJson)
							: template;
						base = { ...headerOf(current), version: current.version };
					} else if (path.endsWith('/lines') && shipment) {
						const current = (await (
							await admin.get(`/api/v1/shipments/${shipment.id}`)
						).json()) as ShipmentJson;
						base = {
							lines: current.lines.map((l) => ({
								productId: l.productId,
								quantity: l.quantity,
								unitPrice: l.unitPrice
							})),
							version: current.version
						};
					} else if (base === null || typeof base !== 'object') {
						base = target.body ?? {};
					}
					return {
						arbitrary: apiCase as fc.Arbitrary<unknown>,
						make: (c) => ({ url, ...apiRequest(base, c as Parameters<typeof apiRequest>[1]) })
					};
				};
			} else {
				// A form action: the empty probe form tells which superform answers it; the page's
				// data gives that form's current (valid) values.
				const pagePath = path;
				build = async () => {
					const discovery = await client.post(url, {
						headers: { 'x-sveltekit-action': 'true', accept: 'application/json' },
						form: target.form ?? {},
						maxRedirects: 0
					});
					const answered =
						discovery.headers()['content-type']?.includes('json') === true
							? findForms(parseActionResult(await discovery.text()).data)
							: [];
					const onPage = await pageForms(client, pagePath);
					const form = answered[0];
					const current = form ? onPage.find((f) => f.id === form.id) : undefined;
					const version = onPage.find((f) => typeof f.data.version === 'number')?.data.version;
					let base: Record<string, unknown> = current?.data ?? form?.data ?? { ...target.form };
					if (!form && version !== undefined && 'version' in base) base = { ...base, version };
					if (!form && version !== undefined && !('version' in base)) {
						base = { ...base, version };
					}
					return {
						arbitrary: formCase(base) as fc.Arbitrary<unknown>,
						make: (c) => ({
							url,
							...formRequest(base, form?.id, c as Parameters<typeof formRequest>[2])
						})
					};
				};
			}

			let built = await build();
			let before: Fingerprint = await db.take();
			const statuses = new Map<number, number>();
			const property = fc.asyncProperty(built.arbitrary, async (c) => {
				const request = built.make(c);
				const response = await client.fetch(request.url, {
					method: target.method,
					headers: request.headers,
					data: request.data,
					maxRedirects: 0,
					timeout: 30_000
				});
				const text = await response.text();
				const contentType = response.headers()['content-type'] ?? '';
				const verdict: Verdict =
					target.kind === 'action'
						? judgeAction(response.status(), contentType, text)
						: judgeApi(response.status(), contentType, text);
				statuses.set(verdict.status, (statuses.get(verdict.status) ?? 0) + 1);
				const after = await db.take();
				if (verdict.rejected) {
					const changed = changedTables(before, after);
					if (changed.length) verdict.problems.push(`refused, yet changed: ${changed.join(', ')}`);
					before = after;
				} else {
					// Saved: versions moved on, so the next cases start from the form as it is now.
					if (target.kind !== 'query') built = await build();
					before = await db.take();
				}
				if (verdict.problems.length) {
					const shown =
						typeof request.data === 'string' ? request.data : request.data?.toString('latin1');
					throw new Error(
						`${verdict.problems.join('; ')}\n  request: ${target.method} ${request.url.slice(0, 300)}` +
							` ${JSON.stringify(request.headers)}\n  body: ${(shown ?? '').slice(0, 600)}`
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
