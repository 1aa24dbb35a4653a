import { fail, redirect } from '@sveltejs/kit';
import { superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { requireRole } from '$lib/server/auth/guard';
import { refuse, validateForm } from '$lib/server/forms';
import { countryAndCurrencyOptions } from '$lib/server/services/form-options';
import { shipmentFormOptions } from '$lib/server/services/shipment-options';
import { createShipment } from '$lib/server/services/shipments';
import { shipmentSchema } from '$lib/schemas/shipments';
import type { Actions, PageServerLoad } from './$types';

// Returns: form (a new shipment's header), options (customers, parties, places, pallets…).
export const load: PageServerLoad = async (event) => {
	requireRole(event, 'admin', 'coordinator');
	const [options, form] = await Promise.all([
		shipmentFormOptions(),
		superValidate(
			{ currency: 'USD', incoterm: 'FCA', modesConsidered: ['sea_fcl', 'air'] },
			zod4(shipmentSchema),
			{
				errors: false
			}
		)
	]);
	return { form, options: { ...options, currencies: countryAndCurrencyOptions().currencies } };
};

export const actions: Actions = {
	default: async (event) => {
		const user = requireRole(event, 'admin', 'coordinator');
		const form = await validateForm(event.request, zod4(shipmentSchema));
		if (!form.valid) return fail(400, { form });
		const result = await createShipment(user, form.data, event.getClientAddress());
		if (!result.ok) return refuse(form, result);
		redirect(303, `/shipments/${result.value.id}`);
	}
};
