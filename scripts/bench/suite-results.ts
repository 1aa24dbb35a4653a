// The shape of the HTTP suite's results (http-suite.ts writes them, report.ts turns them into
// docs/bench-results.md) and the targets, judged in one place.
import type { RunFigures } from './http';

/** Issue 9's targets on 2 cores: reads' p95, any single request, errors. */
export const TARGETS = { readP95Ms: 100, maxMs: 1000, errors: 0 } as const;

/**
 * noop: the floor every ratio is taken against. read: answers without changing anything the user
 * sees (a download still logs itself; the stateless POSTs store nothing). write: sign-in, which
 * hashes on purpose and records the attempt; the p95 target is for reads only.
 */
export type RunKind = 'noop' | 'read' | 'write';

export type Verdict = 'PASS' | 'OVER' | '—';

export interface SuiteRun extends RunFigures {
	key: string;
	label: string;
	kind: RunKind;
	method: string;
	path: string;
	connections: number;
	durationS: number;
	/** Highest VmRSS sampled during the run, MiB. */
	rssPeakMiB: number;
	/** p95 of this route ÷ p95 of the no-op; requests/s of this route ÷ the no-op's. */
	p95Ratio: number;
	rpsRatio: number;
	verdicts: { p95: Verdict; max: Verdict; errors: Verdict };
	note?: string;
}

export interface SuiteResults {
	base: string;
	connections: number;
	durationS: number;
	startedAt: string;
	runs: SuiteRun[];
	memory: { rssStartMiB: number; rssEndMiB: number; hwmMiB: number };
}

export function judge(
	kind: RunKind,
	figures: Pick<RunFigures, 'p95' | 'max' | 'non2xx' | 'errors'>
): SuiteRun['verdicts'] {
	const pass = (ok: boolean): Verdict => (ok ? 'PASS' : 'OVER');
	const clean = figures.non2xx + figures.errors === TARGETS.errors;
	return {
		p95: kind === 'read' ? pass(clean && figures.p95 < TARGETS.readP95Ms) : '—',
		max: pass(figures.max < TARGETS.maxMs),
		errors: pass(clean)
	};
}
