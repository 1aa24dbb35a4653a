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
		'by design. The planner runs one search at a time per process in its worker thread, so the ' +
		'other core keeps serving pages; 20 requests at once wait their turn, and p95 ≈ 20 × one small ' +
		'plan (about 14 ms warm). Kept warm between jobs since this benchmark (it was about 140 ms a ' +
		'plan, and 11 of 20 were refused as busy); a second worker would take the core the requests ' +
		'need on 2 cores. Plans are searches of up to seconds (default budget 3 s), asked for once ' +
		'per change, and a stored shipment’s plan is read from its kept copy (the GET above).',
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
