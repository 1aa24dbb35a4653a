import { json } from '@sveltejs/kit';
import { readJson, respond } from '$lib/server/api';
import { requireRole } from '$lib/server/auth/guard';
import { getShipment } from '$lib/server/services/shipment-detail';
import { replaceLines } from '$lib/server/services/shipments';
import { shipmentLinesSchema } from '$lib/schemas/shipments';
import type { RequestHandler } from './$types';

/** Replaces all lines in one transaction. */
export const PUT: RequestHandler = async (event) => {
	const user = requireRole(event, 'admin', 'coordinator');
	const input = await readJson(event.request, shipmentLinesSchema);
	const result = await replaceLines(user, event.params.shipmentId, input, event.getClientAddress());
	if (!result.ok) return respond(result);
	return json(await getShipment(user, event.params.shipmentId));
};
