/**
 * The search's budget as a count of work, not of time, so that the same input and seed give the
 * same plan on any machine and under any load (the determinism rule). One unit is one
 * block looked at in a space (the inner loop of the search), and each space an update touches;
 * both grow with the real cost of the search on every machine alike.
 *
 * `timeBudgetMs` is turned into units by WORK_PER_MS, measured on the benchmark machine (see
 * docs/load-plan-benchmark.md); a faster machine simply finishes sooner. The wall clock stays
 * only as a safety stop at SAFETY_FACTOR × the budget (plus SAFETY_SLACK_MS): a search that hits
 * it reports `stoppedBy: 'time'` and its plan may then depend on the machine. (On the shared
 * benchmark machine wall time reached 10 × CPU time for single instances under load, hence the
 * wide margin.)
 */

/** Work units per millisecond of `timeBudgetMs` (calibrated on the benchmark machine). */
export const WORK_PER_MS = 50_000;
export const SAFETY_FACTOR = 10;
export const SAFETY_SLACK_MS = 5_000;

export interface WorkMeter {
	/** Units spent so far. */
	used: number;
	/** Units this meter may spend. */
	limit: number;
	/** performance.now() safety stop. */
	deadline: number;
}

export function meter(limit: number, deadline: number): WorkMeter {
	return { used: 0, limit, deadline };
}

/** Why the search must stop now, or null to go on. */
export function exhausted(m: WorkMeter): 'work' | 'time' | null {
	if (m.used >= m.limit) return 'work';
	if (performance.now() > m.deadline) return 'time';
	return null;
}

export type StopReason = 'complete' | 'work' | 'time';

/** The more telling of two stop reasons ('time' over 'work' over 'complete'). */
export function worse(a: StopReason, b: StopReason): StopReason {
	const rank = { complete: 0, work: 1, time: 2 } as const;
	return rank[a] >= rank[b] ? a : b;
}
