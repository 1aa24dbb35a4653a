// The HTTP part of `npm run bench`: every route the issue names, on a running `node build` with the
// 10,000 bench shipments, each for BENCH_DURATION seconds at BENCH_CONNECTIONS (default 20) on
// loopback, against a no-op route of the same server measured in the same run (first and again
// last, to show the floor did not drift). Writes the figures as JSON for report.ts.
// BENCH_ONLY=key,key (say calc-load-plan) times only those routes, between the two no-ops.
// Usage (all.sh sets these): BENCH_BASE=http://127.0.0.1:4397 BENCH_APP_PID=<node build's pid>
//   BENCH_SHIPMENT_ID=<Hallvik's demo shipment> BENCH_CEDAR_ID=<Cedarpoint's, papers issued>
//   BENCH_OUT=<file.json> tsx scripts/bench/http-suite.ts
import { writeFileSync } from 'node:fs';
import { benchBase, run, signIn } from './http';
import { LANDED_CARDS, landedBenchInput } from './landed-input';
import { calcLoadPlanBody } from './load-plan-input';
import { readMemory, sampleRss } from './proc-memory';
import { envNumber, ms } from './stats';
import { judge, type RunKind, type SuiteResults, type SuiteRun } from './suite-results';

const base = benchBase('http://127.0.0.1:4397');
const pid = Number(process.env.BENCH_APP_PID);
const shipmentId = process.env.BENCH_SHIPMENT_ID ?? '';
const cedarId = process.env.BENCH_CEDAR_ID ?? '';
const out = process.env.BENCH_OUT ?? '';
const EMAIL = process.env.BENCH_EMAIL ?? 'coordinator@solvrae.example';
const PASSWORD = process.env.BENCH_PASSWORD ?? 'Landfall-demo-2026';
const DURATION_S = envNumber('BENCH_DURATION', 10, 1, 60);
const CONNECTIONS = envNumber('BENCH_CONNECTIONS', 20, 1, 100);
/** Lines of the stateless landed-cost request (the in-process bench does 500). */
const CALC_LANDED_LINES = 50;

const uuid = /^[0-9a-f-]{36}$/;
if (!Number.isInteger(pid) || pid <= 0 || !uuid.test(shipmentId) || !uuid.test(cedarId) || !out) {
	console.error(
		'Set BENCH_APP_PID, BENCH_SHIPMENT_ID, BENCH_CEDAR_ID and BENCH_OUT (see the header).'
	);
	process.exit(2);
}

const startedAt = new Date().toISOString();
const cookie = await signIn(base, EMAIL, PASSWORD);
const session = { cookie };
const json = { ...session, origin: base, 'content-type': 'application/json' };

// Cedarpoint's first issued paper, found as the access test finds it.
const register = await fetch(`${base}/api/v1/shipments/${cedarId}/documents`, { headers: session });
const papers = ((await register.json()) as { papers?: { id: string }[] }).papers ?? [];
if (register.status !== 200 || !papers[0]) {
	console.error(`Cedarpoint's papers were not found (HTTP ${register.status}).`);
	process.exit(1);
}

interface Route {
	key: string;
	label: string;
	kind: RunKind;
	method: 'GET' | 'POST';
	path: string;
	headers: Record<string, string>;
	body?: string;
	/** What the probe must answer before the route is timed. */
	status: number;
	contentType: string;
	note?: string;
}

const ship = `/api/v1/shipments/${shipmentId}`;
const noop: Route = {
	key: 'noop',
	label: 'No-op GET /api/ping (no database, no session)',
	kind: 'noop',
	method: 'GET',
	path: '/api/ping',
	headers: {},
	status: 204,
	contentType: ''
};
const allRoutes: Route[] = [
	noop,
	{
		key: 'signin',
		label: 'Sign-in POST /signin (form, argon2id)',
		kind: 'write',
		method: 'POST',
		path: '/signin',
		headers: {
			origin: base,
			accept: 'application/json',
			'content-type': 'application/x-www-form-urlencoded'
		},
		body: new URLSearchParams({ email: EMAIL, password: PASSWORD }).toString(),
		status: 200,
		contentType: 'application/json',
		note: 'a write: argon2id (19 MiB, 2 passes) per request by design, and a sign_in_attempts row'
	},
	{
		key: 'list-page',
		label: 'Shipments list page GET /shipments (10,000 shipments)',
		kind: 'read',
		method: 'GET',
		path: '/shipments',
		headers: session,
		status: 200,
		contentType: 'text/html'
	},
	{
		key: 'list-api',
		label: 'Shipments list API GET /api/v1/shipments',
		kind: 'read',
		method: 'GET',
		path: '/api/v1/shipments',
		headers: session,
		status: 200,
		contentType: 'application/json'
	},
	{
		key: 'measure',
		label: 'Measure GET /api/v1/shipments/{id}/measure',
		kind: 'read',
		method: 'GET',
		path: `${ship}/measure`,
		headers: session,
		status: 200,
		contentType: 'application/json'
	},
	{
		key: 'load-plan',
		label: 'Load plan GET /api/v1/shipments/{id}/load-plan (kept plan)',
		kind: 'read',
		method: 'GET',
		path: `${ship}/load-plan`,
		headers: session,
		status: 200,
		contentType: 'application/json'
	},
	{
		key: 'calc-load-plan',
		label: 'Load plan POST /api/v1/calc/load-plan (240 cartons, stateless)',
		kind: 'read',
		method: 'POST',
		path: '/api/v1/calc/load-plan',
		headers: json,
		body: JSON.stringify(calcLoadPlanBody()),
		status: 200,
		contentType: 'application/json'
	},
	{
		key: 'landed',
		label: 'Landed cost GET /api/v1/shipments/{id}/landed-cost?mode=sea_lcl',
		kind: 'read',
		method: 'GET',
		path: `${ship}/landed-cost?mode=sea_lcl`,
		headers: session,
		status: 200,
		contentType: 'application/json'
	},
	{
		key: 'calc-landed',
		label: `Landed cost POST /api/v1/calc/landed-cost (${CALC_LANDED_LINES} lines, stateless)`,
		kind: 'read',
		method: 'POST',
		path: '/api/v1/calc/landed-cost',
		headers: json,
		body: JSON.stringify(landedBenchInput('sea_lcl', LANDED_CARDS.sea_lcl, CALC_LANDED_LINES)),
		status: 200,
		contentType: 'application/json'
	},
	{
		key: 'document',
		label: 'Document GET /api/v1/shipments/{id}/documents/{doc} (issued PDF)',
		kind: 'read',
		method: 'GET',
		path: `/api/v1/shipments/${cedarId}/documents/${papers[0].id}`,
		headers: session,
		status: 200,
		contentType: 'application/pdf',
		note: 'each download is logged (one audit row)'
	},
	{ ...noop, key: 'noop-end', label: 'No-op GET /api/ping again, last (drift check)' }
];
const only = (process.env.BENCH_ONLY ?? '').split(',').filter(Boolean);
const routes = only.length
	? allRoutes.filter((r) => r.kind === 'noop' || only.includes(r.key))
	: allRoutes;

async function send(route: Route): Promise<Response> {
	return fetch(`${base}${route.path}`, {
		method: route.method,
		headers: route.headers,
		body: route.body,
		redirect: 'manual',
		signal: AbortSignal.timeout(60_000)
	});
}

// Each route answers as expected before it is timed (the first load plan is computed and kept
// here), then is warmed up: JIT, pool, plan cache.
for (const route of routes) {
	const probe = await send(route);
	const bytes = (await probe.arrayBuffer()).byteLength;
	const type = probe.headers.get('content-type') ?? '';
	console.log(
		`  check ${route.method} ${route.path}: HTTP ${probe.status}, ${bytes} bytes, ${type}`
	);
	if (probe.status !== route.status || !type.startsWith(route.contentType)) {
		console.error(`  ${route.path} did not answer ${route.status} ${route.contentType}.`);
		process.exit(1);
	}
	for (let i = 0; i < 20; i++) await (await send(route)).arrayBuffer();
}

const rssStart = readMemory(pid)?.rssMiB ?? Number.NaN;
console.log(`\nHTTP suite on ${base}: ${CONNECTIONS} connections, ${DURATION_S} s per route`);
const runs: SuiteRun[] = [];
for (const route of routes) {
	const stopSampling = sampleRss(pid);
	const figures = await run(base, {
		name: route.label,
		options: {
			path: route.path,
			method: route.method,
			headers: route.headers,
			body: route.body,
			connections: CONNECTIONS,
			duration: DURATION_S,
			maxOverallRequests: 100_000 // http.ts caps at 20,000, which the no-op reaches early
		}
	});
	const floor = runs[0] ?? { ...figures }; // the first run is the no-op
	runs.push({
		...figures,
		key: route.key,
		label: route.label,
		kind: route.kind,
		method: route.method,
		path: route.path.replaceAll(shipmentId, '{id}').replaceAll(cedarId, '{id}'),
		connections: CONNECTIONS,
		durationS: DURATION_S,
		rssPeakMiB: stopSampling(),
		p95Ratio: figures.p95 / floor.p95,
		rpsRatio: figures.requestsPerSecond / floor.requestsPerSecond,
		verdicts: judge(route.kind, figures),
		...(route.note ? { note: route.note } : {})
	});
}

const end = readMemory(pid);
const results: SuiteResults = {
	base,
	connections: CONNECTIONS,
	durationS: DURATION_S,
	startedAt,
	runs,
	memory: {
		rssStartMiB: rssStart,
		rssEndMiB: end?.rssMiB ?? Number.NaN,
		hwmMiB: end?.hwmMiB ?? Number.NaN
	}
};
writeFileSync(out, `${JSON.stringify(results, null, '\t')}\n`);
console.log(
	`\nServer memory: VmHWM (peak) ${results.memory.hwmMiB.toFixed(0)} MiB, RSS before the runs ` +
		`${rssStart.toFixed(0)} MiB, at the end ${results.memory.rssEndMiB.toFixed(0)} MiB`
);
for (const r of runs) {
	console.log(
		`  ${r.key.padEnd(15)} ${r.requestsPerSecond.toFixed(1).padStart(8)}/s  p95 ${ms(r.p95).padStart(10)}` +
			`  max ${ms(r.max).padStart(10)}  ×${r.p95Ratio.toFixed(1)} p95  ${JSON.stringify(r.verdicts)}`
	);
}
