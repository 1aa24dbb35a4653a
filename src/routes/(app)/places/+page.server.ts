import { fail } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { canEditMasterData } from '$lib/roles';
import { requireRole } from '$lib/server/auth/guard';
import { refuse, validateForm } from '$lib/server/forms';
import { countryAndCurrencyOptions } from '$lib/server/services/form-options';
import { createPlace, listPlaces } from '$lib/server/services/master-data';
import { placeSchema } from '$lib/schemas/master-data';
import type { Actions, PageServerLoad } from './$types';

// Returns: places, canEdit, form (add a place), countries.
export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'admin', 'coordinator', 'finance', 'broker');
	return {
		places: await listPlaces(),
		canEdit: canEditMasterData(user.role),
		form: await superValidate(zod4(placeSchema)),
		countries: countryAndCurrencyOptions().countries
	};
};

export const actions: Actions = {
	default: async (event) => {
		const user = requireRole(event, 'admin', 'coordinator');
		const form = await validateForm(event.request, zod4(placeSchema));
		if (!form.valid) return fail(400, { form });
		const result = await createPlace(user, form.data, event.getClientAddress());
		if (!result.ok) return refuse(form, result);
		return message(form, { tone: 'ok', text: `${form.data.name} added.` });
	}
};
