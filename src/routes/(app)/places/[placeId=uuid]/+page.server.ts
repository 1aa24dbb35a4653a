import { error, fail } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { canEditMasterData } from '$lib/roles';
import { requireRole } from '$lib/server/auth/guard';
import { refuse, validateForm } from '$lib/server/forms';
import { lifecycleActions } from '$lib/server/master-record-actions';
import { countryAndCurrencyOptions } from '$lib/server/services/form-options';
import { getPlace, savePlace } from '$lib/server/services/master-data';
import { placeSchema } from '$lib/schemas/master-data';
import type { Actions, PageServerLoad } from './$types';

// Returns: place (with the shipments that name it), canEdit, form, countries.
export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'admin', 'coordinator', 'finance', 'broker');
	const place = await getPlace(event.params.placeId);
	if (!place) error(404, { message: 'No such place.' });
	const { code, name, kind, countryCode, version } = place;
	return {
		place,
		canEdit: canEditMasterData(user.role),
		form: await superValidate({ code, name, kind, countryCode, version }, zod4(placeSchema)),
		countries: countryAndCurrencyOptions().countries
	};
};

export const actions: Actions = {
	save: async (event) => {
		const user = requireRole(event, 'admin', 'coordinator');
		const form = await validateForm(event.request, zod4(placeSchema));
		if (!form.valid) return fail(400, { form });
		const result = await savePlace(user, event.params.placeId, form.data, event.getClientAddress());
		if (!result.ok) return refuse(form, result);
		form.data.version += 1;
		return message(form, { tone: 'ok', text: 'Saved.' });
	},
	...lifecycleActions('place')
};
