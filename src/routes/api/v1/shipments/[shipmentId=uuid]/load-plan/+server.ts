import { requireUser } from '$lib/server/auth/guard';
import { refuse, respondPlan, streamPlan } from '$lib/server/load-plan/respond';
import { planPrepared, prepareLoadPlan } from '$lib/server/services/load-plan';
import type { RequestHandler } from './$types';

// The load plan of the shipment's current revision: cached, or computed in a worker thread.
// `Accept: application/x-ndjson` streams the search's progress before the plan.
export const GET: RequestHandler = async (event) => {
	const user = requireUser(event);
	const prepared = await prepareLoadPlan(user, event.params.shipmentId);
	if ('ok' in prepared) refuse(prepared);
	if (event.request.headers.get('accept')?.includes('application/x-ndjson')) {
		return streamPlan((onProgress) => planPrepared(prepared, onProgress));
	}
	return respondPlan(await planPrepared(prepared));
};
