// HTTP helpers shared by the benchmarks that drive a running `node build` on loopback: sign in
// for a session cookie, and an autocannon run whose latencies are recorded per response
// (autocannon's 'response' event), so p50/p95 are exact (nearest rank), not read off its histogram.
import autocannon, { type Options, type Result } from 'autocannon';
import { ms, summarize, type Summary } from './stats';

/** BENCH_BASE, which must be on 127.0.0.1 (the benchmarks never load another host). */
export function benchBase(fallback: string): string {
	const base = process.env.BENCH_BASE ?? fallback;
	if (new URL(base).hostname !== '127.0.0.1') {
		console.error(`BENCH_BASE must be on 127.0.0.1 (got ${base})`);
		process.exit(2);
	}
	return base;
}

/** Signs in through the sign-in form, as a browser does; returns the session cookie header. */
export async function signIn(base: string, email: string, password: string): Promise<string> {
	const response = await fetch(`${base}/signin`, {
		method: 'POST',
		redirect: 'manual',
		headers: {
			origin: base,
			accept: 'application/json',
			'content-type': 'application/x-www-form-urlencoded'
		},
		body: new URLSearchParams({ email, password }),
		signal: AbortSignal.timeout(15_000)
	});
	const body = await response.text();
	const cookies = response.headers
		.getSetCookie()
		.map((c) => c.split(';')[0]!)
		.filter((c) => c.startsWith('authjs.session-token'));
	if (response.status !== 200 || !body.includes('redirect') || cookies.length === 0) {
		throw new Error(`sign-in of ${email} failed: HTTP ${response.status} ${body.slice(0, 200)}`);
	}
	return cookies.join('; ');
}

export interface Run {
	name: string;
	options: Omit<Options, 'url'> & { path: string };
}

export interface RunFigures extends Summary {
	requestsPerSecond: number;
	non2xx: number;
	errors: number;
	/** Responses per HTTP status, e.g. { "200": 1990, "503": 10 }. */
	statuses: Record<string, number>;
}

const MAX_REQUESTS = 20_000; // hard cap per run, whatever the duration

/** One autocannon run against `base + path`, printed and summarised. */
export async function run(base: string, { name, options }: Run): Promise<RunFigures> {
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
	const requestsPerSecond = s.n / result.duration;
	const codes = [...statuses].map(([code, n]) => `${code}×${n}`).join(' ');
	console.log(`\n  ${name}`);
	console.log(
		`    ${rest.method ?? 'GET'} ${path}: ${rest.connections} connection(s), ` +
			`${result.duration} s, ${s.n} responses (${codes || 'none'})`
	);
	console.log(
		`    requests/s ${requestsPerSecond.toFixed(1)}   p50 ${ms(s.p50)}   p95 ${ms(s.p95)}` +
			`   p99 ${ms(s.p99)}   max ${ms(s.max)}   mean ${ms(s.mean)}`
	);
	console.log(
		`    non-2xx ${result.non2xx}   errors ${result.errors}   timeouts ${result.timeouts}` +
			`   (autocannon histogram: p90 ${result.latency.p90} ms, p97.5 ${result.latency.p97_5} ms)`
	);
	return {
		...s,
		requestsPerSecond,
		non2xx: result.non2xx,
		errors: result.errors + result.timeouts,
		statuses: Object.fromEntries([...statuses].map(([code, n]) => [String(code), n]))
	};
}
