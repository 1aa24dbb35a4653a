import { fail, redirect } from '@sveltejs/kit';
import { superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { REFERENCE_DATA_EDITORS, REFERENCE_DATA_READERS, canEditReferenceData } from '$lib/roles';
import { tariffSchema } from '$lib/schemas/reference-data';
import { requireRole } from '$lib/server/auth/guard';
import { refuse, validateForm } from '$lib/server/forms';
import { countryAndCurrencyOptions } from '$lib/server/services/form-options';
import {
	listTariffs,
	saveTariff,
	tariffDestinations
} from '$lib/server/services/reference-data/tariffs';
import type { Actions, PageServerLoad } from './$types';

// Returns: tariffs (of the destination filter, or all), destinations, destination, canEdit,
// form (add a row), countries, currencies.
export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...REFERENCE_DATA_READERS);
	const wanted = event.url.searchParams.get('destination') ?? '';
	const destination = /^[A-Z]{2}$/.test(wanted) ? wanted : null;
	return {
		tariffs: await listTariffs(destination),
		destinations: await tariffDestinations(),
		destination: destination ?? '',
		canEdit: canEditReferenceData(user.role),
		form: await superValidate(zod4(tariffSchema)),
		...countryAndCurrencyOptions()
	};
};

export const actions: Actions = {
	default: async (event) => {
		const user = requireRole(event, ...REFERENCE_DATA_EDITORS);
		const form = await validateForm(event.request, zod4(tariffSchema));
		if (!form.valid) return fail(400, { form });
		const result = await saveTariff(user, null, form.data, event.getClientAddress());
		if (!result.ok) return refuse(form, result);
		redirect(303, `/reference/tariffs/${result.value.id}?saved=1`);
	}
};
