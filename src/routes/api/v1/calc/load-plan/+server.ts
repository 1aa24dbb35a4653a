import { error } from '@sveltejs/kit';
import { validateLoadInput } from '$lib/load-plan';
import { loadPlanInputSchema } from '$lib/schemas/load-plan';
import { readJson } from '$lib/server/api';
import { requireRole } from '$lib/server/auth/guard';
import { runLoadPlan } from '$lib/server/load-plan/runner';
import type { RequestHandler } from './$types';

// Stateless: items and candidate containers in, the load plan out (nothing is stored).
export const POST: RequestHandler = async (event) => {
	requireRole(event, 'admin', 'coordinator', 'finance', 'broker');
	const input = await readJson(event.request, loadPlanInputSchema);
	const problems = validateLoadInput(input);
	if (problems.length > 0) {
		error(400, {
			message: 'Some fields are missing or invalid.',
			code: 'invalid_body',
			issues: problems
		});
	}
	const outcome = await runLoadPlan(input);
	if (!outcome.ok) error(503, { message: outcome.message, code: `planner_${outcome.code}` });
	if (!outcome.result.ok) {
		error(400, {
			message: 'Some fields are missing or invalid.',
			code: 'invalid_body',
			issues: outcome.result.problems
		});
	}
	// The worker's JSON text as it is (what json() would make of the parsed plan).
	const body = outcome.result.planJson;
	return new Response(body, {
		headers: {
			'content-type': 'application/json',
			'content-length': String(Buffer.byteLength(body))
		}
	});
};
