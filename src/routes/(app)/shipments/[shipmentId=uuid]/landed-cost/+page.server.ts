import { error } from '@sveltejs/kit';
import { requireRole } from '$lib/server/auth/guard';
import { landedCostSettings } from '$lib/server/services/landed-cost/reference';
import { getShipment } from '$lib/server/services/shipment-detail';
import type { PageServerLoad } from './$types';

// The landed-cost comparison of one shipment (finance, coordinators, administrators). The figures
// themselves are fetched by the page from /api/v1/shipments/{id}/landed-cost, per mode, so they
// recompute as the assumptions change.
export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'admin', 'coordinator', 'finance');
	const shipment = await getShipment(user, event.params.shipmentId);
	if (!shipment) error(404, { message: 'No shipment with this id is visible to you.' });
	const settings = await landedCostSettings();
	return {
		shipment: {
			id: shipment.id,
			reference: shipment.reference,
			currency: shipment.currency,
			incoterm: shipment.incoterm,
			incotermPlace: shipment.incotermPlace,
			origin: shipment.origin,
			destination: shipment.destination,
			modesConsidered: shipment.modesConsidered,
			chosenMode: shipment.chosenMode,
			customer: shipment.customer?.name ?? ''
		},
		defaults: {
			allocation: settings?.allocation ?? 'value',
			carryingRatePercent: settings?.carryingRatePercent ?? '8',
			date: new Date().toISOString().slice(0, 10)
		}
	};
};
