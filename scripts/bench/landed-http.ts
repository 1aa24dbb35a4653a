// Part B of bench:landed (HTTP): the stored-shipment landed-cost route of a running `node build`
// on loopback, as requests/s relative to no-op routes of the same server in the same run:
// GET /api/health (no session, one `SELECT 1`) and GET /api/v1/me (the same session handling as
// the landed-cost route, and little else). The ratio says what share of the server's light-request
// throughput the landed-cost route keeps; it varies less between machines than requests/s.
// Usage: BENCH_BASE=http://127.0.0.1:4393 BENCH_SHIPMENT_ID=<uuid> tsx scripts/bench/landed-http.ts
// Env: BENCH_DURATION (s per run, default 10), BENCH_CONNECTIONS (default 10), BENCH_MODE
//      (default sea_lcl), BENCH_EMAIL / BENCH_PASSWORD (a finance user of the demo).
import { benchBase, run, signIn, type RunFigures } from './http';
import { envNumber, ms } from './stats';

const base = benchBase('http://127.0.0.1:4393');
const shipmentId = process.env.BENCH_SHIPMENT_ID ?? '';
const EMAIL = process.env.BENCH_EMAIL ?? 'finance@solvrae.example';
const PASSWORD = process.env.BENCH_PASSWORD ?? 'Landfall-demo-2026';
const MODE = process.env.BENCH_MODE ?? 'sea_lcl';
const DURATION_S = envNumber('BENCH_DURATION', 10, 1, 30);
const CONNECTIONS = envNumber('BENCH_CONNECTIONS', 10, 1, 50);

if (!/^[0-9a-f-]{36}$/.test(shipmentId)) {
	console.error('BENCH_SHIPMENT_ID must be the demo Hallvik shipment’s id (a uuid).');
	process.exit(2);
}

const cookie = await signIn(base, EMAIL, PASSWORD);
const headers = { cookie };
const LANDED = `/api/v1/shipments/${shipmentId}/landed-cost?mode=${MODE}`;
const routes = [
	{ key: 'health', label: 'No-op GET /api/health (no session)', path: '/api/health' },
	{ key: 'me', label: 'No-op GET /api/v1/me (session)', path: '/api/v1/me' },
	{ key: 'landed', label: `Landed cost GET …/landed-cost?mode=${MODE}`, path: LANDED }
] as const;

// Each route answers 200 before it is timed, and is warmed up (JIT, pool, plan cache).
for (const { path } of routes) {
	const probe = await fetch(`${base}${path}`, { headers, signal: AbortSignal.timeout(30_000) });
	const text = await probe.text();
	console.log(`  check ${path}: HTTP ${probe.status}, ${text.length} bytes`);
	if (probe.status !== 200) {
		console.error(`  ${path} did not answer 200; first bytes:`, text.slice(0, 300));
		process.exit(1);
	}
	for (let i = 0; i < 30; i++) await (await fetch(`${base}${path}`, { headers })).text();
}
console.log(`Part B: HTTP on ${base}, signed in as ${EMAIL}, ${CONNECTIONS} connections`);

const figures: Record<string, RunFigures> = {};
for (const { key, label, path } of routes) {
	figures[key] = await run(base, {
		name: `${label} (${CONNECTIONS} concurrent)`,
		options: { path, connections: CONNECTIONS, duration: DURATION_S, headers }
	});
}

const landed = figures.landed!;
const valid = (f: RunFigures) => f.non2xx + f.errors === 0;
console.log('');
console.log('| Route | requests/s | p50 | p95 | landed-cost ÷ this route (requests/s) |');
console.log('| --- | --- | --- | --- | --- |');
for (const { key, label } of routes) {
	const f = figures[key]!;
	const ratio =
		key === 'landed'
			? '—'
			: valid(f) && valid(landed)
				? (landed.requestsPerSecond / f.requestsPerSecond).toFixed(3)
				: 'n/a';
	const rps = valid(f)
		? f.requestsPerSecond.toFixed(1)
		: `n/a (${f.non2xx} non-2xx, ${f.errors} errors)`;
	console.log(`| ${label} | ${rps} | ${ms(f.p50)} | ${ms(f.p95)} | ${ratio} |`);
}
