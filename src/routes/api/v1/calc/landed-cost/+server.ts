import { error, json } from '@sveltejs/kit';
import { landedCost } from '$lib/landed-cost';
import { landedCostInputSchema } from '$lib/schemas/landed-cost-input';
import { readJson } from '$lib/server/api';
import { requireRole } from '$lib/server/auth/guard';
import type { RequestHandler } from './$types';

// Stateless: the engine's whole input in (lines, measures, reference rows), the landed cost out;
// nothing is read from or written to the database. Malformed input is a 400 with field paths;
// data the engine finds missing or out of date is a 422 with its list, as for a stored shipment.
export const POST: RequestHandler = async (event) => {
	requireRole(event, 'admin', 'coordinator', 'finance');
	const input = await readJson(event.request, landedCostInputSchema);
	const result = landedCost(input);
	if (!result.ok)
		error(422, {
			message: 'The landed cost cannot be computed: some data is missing or out of date.',
			code: 'missing_data',
			issues: result.missing
		});
	return json(result);
};
