import type { LoadPlan } from '../../load-plan';
import type { Problem } from '../../packing/problem';

/**
 * A finished search as the planner's worker sends it back: the plan as JSON text (JSON.stringify
 * of planLoad's plan), which the API answers as it is and a service parses with `planOf`.
 */
export type RunResult =
	{ ok: true; planJson: string; problems: Problem[] } | { ok: false; problems: Problem[] };

export function planOf(result: Extract<RunResult, { ok: true }>): LoadPlan {
	return JSON.parse(result.planJson) as LoadPlan;
}
