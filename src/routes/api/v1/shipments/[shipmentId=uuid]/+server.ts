import { error, json } from '@sveltejs/kit';
import { readJson, respond } from '$lib/server/api';
import { requireRole, requireUser } from '$lib/server/auth/guard';
import { getShipment } from '$lib/server/services/shipment-detail';
import { updateShipment } from '$lib/server/services/shipments';
import { shipmentSchema } from '$lib/schemas/shipments';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	const user = requireUser(event);
	const shipment = await getShipment(user, event.params.shipmentId);
	if (!shipment)
		error(404, { message: 'No shipment with this id is visible to you.', code: 'not_found' });
	return json(shipment);
};

/** Replaces the header; send the version you read (optimistic locking: 409 when stale). */
export const PATCH: RequestHandler = async (event) => {
	const user = requireRole(event, 'admin', 'coordinator');
	const input = await readJson(event.request, shipmentSchema);
	const result = await updateShipment(
		user,
		event.params.shipmentId,
		input,
		event.getClientAddress()
	);
	if (!result.ok) return respond(result);
	return json(await getShipment(user, event.params.shipmentId));
};
