import { error, json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/guard';
import { measureShipment } from '$lib/server/services/shipment-measure';
import type { RequestHandler } from './$types';

// Cartons, pallets, weights and chargeable weight per mode of the stored shipment.
export const GET: RequestHandler = async (event) => {
	const user = requireUser(event);
	const measured = await measureShipment(user, event.params.shipmentId);
	if (!measured)
		error(404, { message: 'No shipment with this id is visible to you.', code: 'not_found' });
	return json({
		reference: measured.shipment.reference,
		input: measured.input,
		result: measured.result
	});
};
