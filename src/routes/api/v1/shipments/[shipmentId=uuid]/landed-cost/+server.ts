import { error, json } from '@sveltejs/kit';
import { requireRole } from '$lib/server/auth/guard';
import { shipmentLandedCost } from '$lib/server/services/landed-cost/compute';
import { landedCostQuerySchema } from '$lib/schemas/landed-cost';
import type { RequestHandler } from './$types';

// Landed cost of the shipment for one mode (finance, coordinators, administrators). 422 lists
// what is missing (rate card, tariff row, exchange rate, expired data) instead of guessing.
export const GET: RequestHandler = async (event) => {
	const user = requireRole(event, 'admin', 'coordinator', 'finance');
	const parsed = landedCostQuerySchema.safeParse(Object.fromEntries(event.url.searchParams));
	if (!parsed.success)
		error(400, {
			message: 'Some query parameters are missing or invalid.',
			code: 'invalid_query',
			issues: parsed.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message }))
		});
	const { mode, ...options } = parsed.data;
	const outcome = await shipmentLandedCost(user, event.params.shipmentId, mode, options);
	if (!outcome.ok)
		error(outcome.status, {
			message: outcome.message,
			code: outcome.status === 404 ? 'not_found' : 'not_computable',
			issues: outcome.missing
		});
	if (!outcome.result.ok)
		error(422, {
			message: 'The landed cost cannot be computed: some data is missing or out of date.',
			code: 'missing_data',
			issues: outcome.result.missing
		});
	return json({
		shipmentId: event.params.shipmentId,
		reference: outcome.reference,
		...outcome.result
	});
};
