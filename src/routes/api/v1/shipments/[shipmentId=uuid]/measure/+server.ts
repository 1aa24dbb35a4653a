import { error, json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/guard';
import { keptShipmentMeasure } from '$lib/server/services/shipment-measure';
import type { RequestHandler } from './$types';

// Cartons, pallets, weights and chargeable weight per mode of the stored shipment.
export const GET: RequestHandler = async (event) => {
	const user = requireUser(event);
	const kept = await keptShipmentMeasure(user, event.params.shipmentId);
	if (!kept)
		error(404, { message: 'No shipment with this id is visible to you.', code: 'not_found' });
	const { shipment, input, result } = kept.measure;
	return json({ reference: shipment.reference, input, result });
};
