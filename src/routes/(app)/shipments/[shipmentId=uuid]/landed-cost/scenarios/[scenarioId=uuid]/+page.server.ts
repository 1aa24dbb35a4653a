import { error } from '@sveltejs/kit';
import { requireRole } from '$lib/server/auth/guard';
import { getScenario } from '$lib/server/services/landed-cost/scenarios';
import { getShipment } from '$lib/server/services/shipment-detail';
import type { PageServerLoad } from './$types';

// One saved scenario: the frozen figures and the data rows they used.
export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'admin', 'coordinator', 'finance');
	const [shipment, scenario] = await Promise.all([
		getShipment(user, event.params.shipmentId),
		getScenario(user, event.params.shipmentId, event.params.scenarioId)
	]);
	if (!shipment || !scenario) error(404, { message: 'No such scenario is visible to you.' });
	return {
		shipment: { id: shipment.id, reference: shipment.reference, currency: shipment.currency },
		scenario: { ...scenario, inputs: undefined }
	};
};
