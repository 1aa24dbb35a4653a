// The part of autocannon 8's programmatic API the benchmarks use (the package ships no types).
declare module 'autocannon' {
	import type { EventEmitter } from 'node:events';

	export interface Options {
		url: string;
		connections?: number;
		duration?: number;
		amount?: number;
		maxOverallRequests?: number;
		timeout?: number;
		method?: string;
		headers?: Record<string, string>;
		body?: string;
	}

	export interface Histogram {
		average: number;
		mean: number;
		stddev: number;
		min: number;
		max: number;
		p50: number;
		p90: number;
		p97_5: number;
		p99: number;
		total: number;
	}

	export interface Result {
		duration: number;
		errors: number;
		timeouts: number;
		non2xx: number;
		latency: Histogram;
		requests: Histogram & { sent: number };
		throughput: Histogram;
		statusCodeStats: Record<string, { count: number }>;
	}

	export interface Instance extends EventEmitter {
		on(
			event: 'response',
			listener: (client: unknown, statusCode: number, bytes: number, responseTimeMs: number) => void
		): this;
		on(event: string, listener: (...args: unknown[]) => void): this;
	}

	function autocannon(
		options: Options,
		callback: (error: Error | null, result: Result) => void
	): Instance;
	export default autocannon;
}
