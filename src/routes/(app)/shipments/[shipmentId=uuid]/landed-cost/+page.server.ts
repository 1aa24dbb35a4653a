import { error, fail } from '@sveltejs/kit';
import { saveScenarioSchema } from '$lib/schemas/landed-cost';
import { readForm } from '$lib/server/forms';
import { NUL_MESSAGE, nulPaths } from '$lib/schemas/nul-text';
import { listScenarios, saveScenario } from '$lib/server/services/landed-cost/scenarios';
import { requireRole } from '$lib/server/auth/guard';
import { landedCostSettings } from '$lib/server/services/landed-cost/reference';
import { getShipment } from '$lib/server/services/shipment-detail';
import type { Actions, PageServerLoad } from './$types';

// The landed-cost comparison of one shipment (finance, coordinators, administrators). The figures
// themselves are fetched by the page from /api/v1/shipments/{id}/landed-cost, per mode, so they
// recompute as the assumptions change.
export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'admin', 'coordinator', 'finance');
	const shipment = await getShipment(user, event.params.shipmentId);
	if (!shipment) error(404, { message: 'No shipment with this id is visible to you.' });
	const [settings, scenarios] = await Promise.all([
		landedCostSettings(),
		listScenarios(user, shipment.id)
	]);
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
		scenarios,
		defaults: {
			allocation: settings?.allocation ?? 'value',
			carryingRatePercent: settings?.carryingRatePercent ?? '8',
			date: new Date().toISOString().slice(0, 10)
		}
	};
};

export const actions: Actions = {
	// Freezes the comparison as it stands: each mode's engine input (with its data rows) and result.
	saveScenario: async (event) => {
		const user = requireRole(event, 'admin', 'coordinator', 'finance');
		const data = await readForm(event.request);
		const parsed = saveScenarioSchema.safeParse({
			name: data.get('name') ?? '',
			modes: data.getAll('modes'),
			date: data.get('date'),
			allocation: data.get('allocation'),
			preferenceClaimed: data.get('preferenceClaimed') === 'true',
			carryingRatePercent: data.get('carryingRatePercent')
		});
		if (!parsed.success)
			return fail(400, {
				scenarioError: parsed.error.issues.map((i) => i.message).join(' ')
			});
		if (nulPaths(parsed.data.name).length) return fail(400, { scenarioError: NUL_MESSAGE });
		const { name, modes, ...options } = parsed.data;
		const result = await saveScenario(
			user,
			event.params.shipmentId,
			{ name, modes, options },
			event.getClientAddress()
		);
		if (!result.ok) return fail(result.status, { scenarioError: result.message });
		return { scenarioSaved: name, skipped: result.value.skipped };
	}
};
