import { expect, test, type APIRequestContext } from '@playwright/test';
import fc from 'fast-check';
import { LANDED_CARDS, landedBenchInput } from '../../scripts/bench/landed-input';
import { calcLoadPlanBody } from '../../scripts/bench/load-plan-input';
import { DatabaseFingerprint, changedTables } from './db-fingerprint';
import { MEASURE_BASE } from './fuzz-fixtures';
import { judgeApi } from './fuzz-verdicts';
import { DEMO, apiAs } from './helpers';
import { ONLY, RUNS, SEED } from './fuzz-settings';
import { leafPaths, setPath, type Json } from './fuzz-json-paths';

// The stateless calc routes fuzzed from known-valid bodies, one leaf path at a time, so the
// hostile value reaches the deep checks instead of the schema's first refusal (issue 9). Same
// seed conventions as fuzz.spec.ts (FUZZ_SEED, FUZZ_RUNS, FUZZ_ONLY). Asserts: never a 5xx; a
// 400 invalid_body names the mutated path, a prefix of it or a field below it; a 200 is a
// result; these routes store nothing, so the database is unchanged after the whole run.

/** A small load-plan body: a few dozen cartons, a short budget, so each case stays fast. */
function loadPlanBase(): Json {
	const body = calcLoadPlanBody();
	body.items = body.items.map((item) => ({ ...item, count: 12 }));
	body.options = { ...body.options, timeBudgetMs: 20 };
	return JSON.parse(JSON.stringify(body)) as Json;
}

/** JSON drops the card's undefined courier fields, as the API expects. */
const landedBase = (): Json =>
	JSON.parse(JSON.stringify(landedBenchInput('sea_lcl', LANDED_CARDS.sea_lcl, 3))) as Json;

const ROUTES: { path: string; base: () => Json; ok: (body: unknown) => boolean }[] = [
	{
		path: '/api/v1/calc/load-plan',
		base: loadPlanBase,
		ok: (b) => typeof b === 'object' && b !== null && Array.isArray((b as never)['containers'])
	},
	{
		path: '/api/v1/calc/landed-cost',
		base: landedBase,
		ok: (b) => typeof b === 'object' && b !== null && (b as { ok?: unknown }).ok === true
	},
	{
		path: '/api/v1/calc/measure',
		base: () => MEASURE_BASE as Json,
		ok: (b) => typeof b === 'object' && b !== null
	}
];

/** Hostile values for one field: wrong types, signs, sizes, precision, codes, emptiness. */
const hostile: fc.Arbitrary<Json | undefined> = fc.oneof(
	fc.constantFrom<Json | undefined>(
		undefined, // the field left out
		null,
		'',
		' ',
		0,
		-1,
		'-1',
		'0',
		1e308,
		'1e309',
		'NaN',
		'Infinity',
		'-0',
		'0.0000000001',
		'12.3456789012345',
		'99999999999999999999999',
		2 ** 53, // past the safe integers
		'9007199254740993',
		1.5,
		true,
		[],
		{},
		[1, 2],
		{ a: 1 },
		'x'.repeat(5000),
		'XXX', // no such currency
		'ZZ', // no such country
		'1,5',
		'0x10',
		' 5 ',
		// Ids already used by a sibling: duplicates, or references moved to another record.
		'SPK-200',
		'C20GP',
		'FUZZ-1',
		'45G1'
	),
	fc.integer({ min: -1_000_000, max: 10_000_000 }),
	fc.string({ maxLength: 20 })
);

/**
 * Keys other records refer to: a changed one may rightly be refused where it is referred to
 * (a line's SKU no longer in the products, a duplicate id on its twin).
 */
const REFERENCE_KEYS = new Set(['id', 'sku', 'ref', 'typeCode', 'code', 'currency']);

/**
 * Whether an issue path is the mutated path, a prefix of it, a field below it, or a sibling in
 * the same record (cross-field checks such as "carton gross ≥ net of its units" name the other
 * field).
 */
function related(issue: string, mutated: string): boolean {
	const segments = mutated.split('.');
	if (REFERENCE_KEYS.has(segments[segments.length - 1]!)) return true;
	const parent = segments.slice(0, -1).join('.');
	if (parent && issue.startsWith(`${parent}.`)) return true;
	return (
		issue === mutated ||
		issue === '' ||
		mutated.startsWith(`${issue}.`) ||
		issue.startsWith(`${mutated}.`)
	);
}

const title = (path: string) => `valid base, one field hostile: POST ${path}`;

/** A seed per target from the run's seed (as fuzz.spec.ts does). */
function targetSeed(name: string): number {
	let hash = SEED | 0;
	for (const ch of name) hash = (Math.imul(hash, 31) + ch.charCodeAt(0)) | 0;
	return hash >>> 0;
}

let client: APIRequestContext;
let fingerprint: DatabaseFingerprint;

test.beforeAll(async ({ baseURL }) => {
	client = await apiAs(baseURL!, DEMO.coordinator);
	fingerprint = new DatabaseFingerprint();
	await fingerprint.open();
});

test.afterAll(async () => {
	await client?.dispose();
	await fingerprint?.close();
});

for (const route of ROUTES) {
	const name = title(route.path);
	test(name, async () => {
		test.skip(ONLY !== '' && !name.includes(ONLY), `FUZZ_ONLY=${ONLY}`);
		test.setTimeout(120_000);
		const base = route.base();
		// The base itself must be accepted, or the mutations test nothing.
		const good = await client.post(route.path, { data: base });
		expect(good.status(), await good.text()).toBe(200);
		expect(route.ok(await good.json()), 'the base body gives a result').toBe(true);

		const paths = leafPaths(base);
		const before = await fingerprint.take();
		const seed = targetSeed(name);
		const statuses: Record<number, number> = {};
		console.log(`fuzz-calc: ${name} seed ${seed}, ${paths.length} leaf paths`);
		await fc.assert(
			fc.asyncProperty(fc.nat({ max: paths.length - 1 }), hostile, async (index, leaf) => {
				const path = paths[index]!;
				const mutated = path.map(String).join('.');
				const body = setPath(base, path, leaf);
				const response = await client.post(route.path, { data: body });
				const status = response.status();
				statuses[status] = (statuses[status] ?? 0) + 1;
				const text = await response.text();
				const verdict = judgeApi(status, response.headers()['content-type'] ?? '', text);
				const problems = [...verdict.problems];
				if (status === 400) {
					const parsed = JSON.parse(text) as { code?: string; issues?: { path: string }[] };
					if (parsed.code === 'invalid_body') {
						const paths = (parsed.issues ?? []).map((i) => i.path);
						if (!paths.some((p) => related(p, mutated))) {
							problems.push(`issues ${JSON.stringify(paths)} do not name ${mutated}`);
						}
					}
				}
				if (status === 200 && !route.ok(JSON.parse(text))) problems.push('200 without a result');
				expect(
					problems,
					`${mutated} = ${JSON.stringify(leaf)?.slice(0, 80)} → ${status} ${text.slice(0, 300)}`
				).toEqual([]);
			}),
			{ seed, numRuns: RUNS * 3, endOnFailure: true }
		);
		console.log(`fuzz-calc: ${name} statuses ${JSON.stringify(statuses)}`);
		expect(changedTables(before, await fingerprint.take()), 'calc routes store nothing').toEqual(
			[]
		);
	});
}
