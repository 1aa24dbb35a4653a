// Part B (HTTP): the shipments list and the measure API of a running `node build`, on loopback.
// Usage: BENCH_BASE=http://127.0.0.1:4395 tsx scripts/bench/list-http.ts
// Latencies are recorded per response (autocannon's 'response' event) and p95 is computed
// exactly from them (nearest rank), not read off autocannon's histogram.
import autocannon, { type Options, type Result } from 'autocannon';
import { benchInput } from './measure-input';
import { ms, recordResult, summarize } from './stats';

const base = process.env.BENCH_BASE ?? 'http://127.0.0.1:4395';
if (new URL(base).hostname !== '127.0.0.1') {
	console.error(`BENCH_BASE must be on 127.0.0.1 (got ${base})`);
	process.exit(2);
}
const EMAIL = process.env.BENCH_EMAIL ?? 'coordinator@solvrae.example';
const PASSWORD = process.env.BENCH_PASSWORD ?? 'Landfall-demo-2026';
const DURATION_S = Math.min(Math.max(Number(process.env.BENCH_DURATION ?? 10) || 10, 1), 30);
const MAX_REQUESTS = 20_000; // hard cap per run, whatever the duration
const LIST_TARGET_MS = 150;
const MEASURE_TARGET_MS = 20;

async function signIn(): Promise<string> {
	const response = await fetch(`${base}/signin`, {
		method: 'POST',
		redirect: 'manual',
		headers: {
			origin: base,
			accept: 'application/json',
			'content-type': 'application/x-www-form-urlencoded'
		},
		body: new URLSearchParams({ email: EMAIL, password: PASSWORD }),
		signal: AbortSignal.timeout(15_000)
	});
	const body = await response.text();
	const cookies = response.headers
		.getSetCookie()
		.map((c) => c.split(';')[0]!)
		.filter((c) => c.startsWith('authjs.session-token'));
	if (response.status !== 200 || !body.includes('redirect') || cookies.length === 0) {
		throw new Error(`sign-in of ${EMAIL} failed: HTTP ${response.status} ${body.slice(0, 200)}`);
	}
	return cookies.join('; ');
}

async function get(path: string, cookie: string) {
	const response = await fetch(`${base}${path}`, {
		headers: { cookie },
		redirect: 'manual',
		signal: AbortSignal.timeout(15_000)
	});
	return { status: response.status, text: await response.text() };
}

interface Run {
	name: string;
	options: Omit<Options, 'url'> & { path: string };
}

async function run({ name, options }: Run) {
	const { path, ...rest } = options;
	const latencies: number[] = [];
	const statuses = new Map<number, number>();
	const result = await new Promise<Result>((resolve, reject) => {
		const instance = autocannon(
			{ url: `${base}${path}`, timeout: 10, maxOverallRequests: MAX_REQUESTS, ...rest },
			(error, r) => (error ? reject(error) : resolve(r))
		);
		instance.on('response', (_client, statusCode, _bytes, responseTimeMs) => {
			latencies.push(responseTimeMs);
			statuses.set(statusCode, (statuses.get(statusCode) ?? 0) + 1);
		});
	});
	const s = summarize(latencies);
	const codes = [...statuses].map(([code, n]) => `${code}×${n}`).join(' ');
	console.log(`\n  ${name}`);
	console.log(
		`    ${rest.method ?? 'GET'} ${path}: ${rest.connections} connection(s), ` +
			`${result.duration} s, ${s.n} responses (${codes || 'none'})`
	);
	console.log(
		`    requests/s ${(s.n / result.duration).toFixed(1)}   p50 ${ms(s.p50)}   p95 ${ms(s.p95)}` +
			`   p99 ${ms(s.p99)}   max ${ms(s.max)}   mean ${ms(s.mean)}`
	);
	console.log(
		`    non-2xx ${result.non2xx}   errors ${result.errors}   timeouts ${result.timeouts}` +
			`   (autocannon histogram: p90 ${result.latency.p90} ms, p97.5 ${result.latency.p97_5} ms)`
	);
	return { ...s, non2xx: result.non2xx, errors: result.errors + result.timeouts };
}

const cookie = await signIn();
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
