// Why a route of the HTTP suite misses a target, as found when it was profiled (2 cores, 20
// connections, December 2026); report.ts prints the entry of each route that misses one, so the
// results file says why, run after run. A route without an entry is flagged "not explained".
const SHARED =
	'Every figure here also moves with other work on the machine: autocannon, the app and ' +
	'PostgreSQL already share the 2 cores, so a busy machine (see the load average above) can push ' +
	'a route that passes when idle over its target.';

export const WHY_OVER: Record<string, string> = {
	signin:
		'by design. Each sign-in verifies an argon2id hash with the OWASP baseline (19 MiB, 2 passes), ' +
		'about 19 ms of one core, and records the attempt; 20 sign-ins at once queue for the 2 cores ' +
		'(libuv hashes 4 at a time), so each waits for those ahead: p95 ≈ 20 ÷ the rate, and the ' +
		'slowest approach 1 s when other work shares the cores. The hash cost is the protection ' +
		'against password guessing and is not lowered; a person signs in once per 8-hour session.',
	'calc-load-plan':
		'CPU-bound in the planner. Each request is a fresh search (nothing is kept): about 3 ms of ' +
		'one core in process for these 240 cartons, plus about 2 ms of the request thread’s (the ' +
		'session user’s query, the copy to and from the worker, writing 28 kB). Two planner lanes run ' +
		'at once on 2 cores (the second only takes searches of 500 ms or less, so long searches never ' +
		'hold both cores); with autocannon and PostgreSQL the machine is saturated near 320 ' +
		'requests/s when idle: 20 requests at once queue, p95 ≈ 1.25 × 20 ÷ the rate, about 80 ms. ' +
		'A stored shipment’s plan is read from its kept copy (the GET above). ' +
		SHARED,
	'list-page':
		'CPU-bound: about 2.4 ms of the app’s CPU per page (server rendering, the CSP hash of the ' +
		'start-up script, four queries) and 1.2 ms of PostgreSQL’s (the exact count of 10,000 ' +
		'shipments, planned afresh each time). Idle, it runs at about 330 pages/s with p95 80–90 ms. ' +
		SHARED,
	'list-api':
		'the JSON list costs about 0.9 ms of the app’s CPU and 1.2 ms of PostgreSQL’s. ' + SHARED,
	measure: 'kept per shipment stamp, one small query a request. ' + SHARED,
	'load-plan': 'the planner input is kept per stamp; the stored plan is one row read. ' + SHARED,
	landed: 'kept per shipment stamp, one small query a request. ' + SHARED,
	'calc-landed':
		'computes on every request (nothing is kept): in the profile the engine itself (decimal ' +
		'arithmetic, largest-remainder shares per line) took about a quarter of the app’s time, ' +
		'reading, validating and writing the JSON (9 kB in, 39 kB out) about as much. Idle, it ' +
		'runs at 350–420 requests/s with p95 65–90 ms. ' +
		SHARED,
	document: 'one stored PDF read and one download logged (an insert) per request. ' + SHARED,
	noop: SHARED,
	'noop-end': SHARED
};
