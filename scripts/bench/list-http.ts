// Part B (HTTP): the shipments list and the measure API of a running `node build`, on loopback.
// Usage: BENCH_BASE=http://127.0.0.1:4395 tsx scripts/bench/list-http.ts
// Latencies per response and exact p95: see http.ts.
import { benchInput } from './measure-input';
import { benchBase, run as runAt, signIn, type Run } from './http';
import { envNumber, recordResult } from './stats';

const base = benchBase('http://127.0.0.1:4395');
const EMAIL = process.env.BENCH_EMAIL ?? 'coordinator@solvrae.example';
const PASSWORD = process.env.BENCH_PASSWORD ?? 'Landfall-demo-2026';
const DURATION_S = envNumber('BENCH_DURATION', 10, 1, 30);
const LIST_TARGET_MS = 150;
const MEASURE_TARGET_MS = 20;

async function get(path: string, cookie: string) {
	const response = await fetch(`${base}${path}`, {
		headers: { cookie },
		redirect: 'manual',
		signal: AbortSignal.timeout(15_000)
	});
	return { status: response.status, text: await response.text() };
}

const run = (r: Run) => runAt(base, r);

const cookie = await signIn(base, EMAIL, PASSWORD);
console.log(`Part B: HTTP on ${base}, signed in as ${EMAIL}`);

const LIST = '/shipments';
const FILTERED = '/shipments?status=booked&sort=etd';
for (const path of [LIST, FILTERED]) {
	const page = await get(path, cookie);
	const rows = new Set(page.text.match(/SHP-\d{4}-\d{5}/g) ?? []).size;
	console.log(
		`  check ${path}: HTTP ${page.status}, ${page.text.length} bytes, ${rows} references`
	);
	if (page.status !== 200 || rows === 0) {
		console.error(
			`  ${path} did not answer a page of shipments; first bytes:`,
			page.text.slice(0, 300)
		);
		process.exit(1);
	}
	for (let i = 0; i < 20; i++) await get(path, cookie); // warm-up: JIT, pool, plan cache
}

const headers = { cookie };
const runs = {
	list: await run({
		name: 'Shipments list, page 1 (10 concurrent)',
		options: { path: LIST, connections: 10, duration: DURATION_S, headers }
	}),
	filtered: await run({
		name: 'Shipments list, status=booked sort=etd (10 concurrent)',
		options: { path: FILTERED, connections: 10, duration: DURATION_S, headers }
	}),
	single: await run({
		name: 'Shipments list, page 1, one connection (service time, for comparison)',
		options: { path: LIST, connections: 1, duration: 3, headers }
	}),
	// Baseline: the same session handling (Auth.js JWT, user row) without the list or a page render.
	me: await run({
		name: 'Baseline GET /api/v1/me, one connection (session cost per request)',
		options: { path: '/api/v1/me', connections: 1, duration: 3, headers }
	}),
	me10: await run({
		name: 'Baseline GET /api/v1/me, 10 concurrent',
		options: { path: '/api/v1/me', connections: 10, duration: 3, headers }
	})
};
for (const [key, label] of [
	['list', 'Shipments list /shipments'],
	['filtered', 'Shipments list ?status=booked&sort=etd']
] as const) {
	const r = runs[key];
	// Errors or non-2xx answers make the figure meaningless: recorded as n/a (over).
	const figures = r.non2xx + r.errors > 0 ? null : r;
	recordResult(label, LIST_TARGET_MS, figures, 'HTTP, 10 connections, 10k shipments');
}

// The measure API over HTTP, one request at a time: server time plus loopback HTTP.
// BENCH_LIST_ONLY=1 skips it (e.g. to profile the list alone with BENCH_NODE_ARGS=--cpu-prof).
for (const pallet of process.env.BENCH_LIST_ONLY ? [] : [false, true]) {
	const body = JSON.stringify(benchInput({ pallet }));
	const label = pallet ? 'on P1208 pallets' : 'loose cartons';
	const probe = await fetch(`${base}/api/v1/calc/measure`, {
		method: 'POST',
		headers: { cookie, 'content-type': 'application/json' },
		body,
		signal: AbortSignal.timeout(30_000)
	});
	const answer = await probe.text();
	console.log(
		`\n  check POST /api/v1/calc/measure (${label}): HTTP ${probe.status}, ` +
			`request ${(body.length / 1024).toFixed(0)} KiB, response ${(answer.length / 1024).toFixed(0)} KiB`
	);
	const r = await run({
		name: `POST /api/v1/calc/measure, 500 lines, ${label} (one connection)`,
		options: {
			path: '/api/v1/calc/measure',
			method: 'POST',
			body,
			connections: 1,
			duration: 5,
			maxOverallRequests: 200,
			headers: { cookie, origin: base, 'content-type': 'application/json' }
		}
	});
	recordResult(
		`Measure API 500 lines, ${label}`,
		MEASURE_TARGET_MS,
		r.non2xx + r.errors > 0 ? null : r,
		'HTTP, 1 connection (incl. HTTP + JSON)'
	);
}
