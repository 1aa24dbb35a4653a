// Small helpers shared by the benchmark scripts: percentiles, formatting, the results file.
import { appendFileSync } from 'node:fs';

/** Nearest-rank percentile (p in 0..100) of unsorted samples; NaN when there are none. */
export function percentile(samples: readonly number[], p: number): number {
	if (samples.length === 0) return Number.NaN;
	const sorted = [...samples].sort((a, b) => a - b);
	const rank = Math.max(1, Math.ceil((p / 100) * sorted.length));
	return sorted[Math.min(rank, sorted.length) - 1]!;
}

export interface Summary {
	n: number;
	mean: number;
	p50: number;
	p95: number;
	p99: number;
	max: number;
}

export function summarize(samples: readonly number[]): Summary {
	const n = samples.length;
	const mean = n ? samples.reduce((sum, x) => sum + x, 0) / n : Number.NaN;
	return {
		n,
		mean,
		p50: percentile(samples, 50),
		p95: percentile(samples, 95),
		p99: percentile(samples, 99),
		max: n ? Math.max(...samples) : Number.NaN
	};
}

/** A whole number from the environment, within [min, max]; the fallback when unset or not one. */
export function envNumber(name: string, fallback: number, min: number, max: number): number {
	const n = Number(process.env[name] ?? fallback) || fallback;
	return Math.min(Math.max(n, min), max);
}

export const ms = (x: number) => (Number.isFinite(x) ? `${x.toFixed(2)} ms` : 'n/a');

/**
 * One row for the final table of measure.sh (tab-separated, appended to $BENCH_RESULTS).
 * The verdict is on p95; `null` (errors, non-2xx answers) counts as over.
 */
export function recordResult(
	name: string,
	targetMs: number,
	figures: Pick<Summary, 'p50' | 'p95'> | null,
	basis: string
) {
	const p95 = figures?.p95 ?? Number.NaN;
	const ratio = p95 / targetMs;
	const verdict = Number.isFinite(ratio) && ratio < 1 ? 'PASS' : 'OVER';
	const row = [
		name,
		`${targetMs} ms`,
		ms(figures?.p50 ?? Number.NaN),
		ms(p95),
		Number.isFinite(ratio) ? ratio.toFixed(2) : 'n/a',
		verdict,
		basis
	];
	const file = process.env.BENCH_RESULTS;
	if (file) appendFileSync(file, `${row.join('\t')}\n`);
	return { ratio, verdict };
}
