// Why a route of the HTTP suite misses a target, as found when it was profiled; report.ts prints
// the entry of each route that misses one, so the results file says why, run after run.
export const WHY_OVER: Record<string, string> = {};
