import { error, fail } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { REFERENCE_DATA_EDITORS, REFERENCE_DATA_READERS, canEditReferenceData } from '$lib/roles';
import { retireSchema, tariffSchema } from '$lib/schemas/reference-data';
import { requireRole } from '$lib/server/auth/guard';
import { refuse, validateForm } from '$lib/server/forms';
import { countryAndCurrencyOptions } from '$lib/server/services/form-options';
import {
	getTariff,
	retireTariff,
	saveTariff,
	tariffFormValues
} from '$lib/server/services/reference-data/tariffs';
import type { Actions, PageServerLoad } from './$types';

const today = () => new Date().toISOString().slice(0, 10);

// Returns: tariff (the stored row), canEdit, form (edit), retireForm, saved, countries, currencies.
export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...REFERENCE_DATA_READERS);
	const tariff = await getTariff(event.params.tariffId);
	if (!tariff) error(404, { message: 'No such tariff row.', code: 'not_found' });
	return {
		tariff,
		canEdit: canEditReferenceData(user.role),
		saved: event.url.searchParams.has('saved'),
		form: await superValidate(tariffFormValues(tariff), zod4(tariffSchema), { errors: false }),
		retireForm: await superValidate(
			{ validTo: tariff.validTo ?? today(), version: tariff.version },
			zod4(retireSchema),
			{ id: 'retire', errors: false }
		),
		...countryAndCurrencyOptions()
	};
};

export const actions: Actions = {
	save: async (event) => {
		const user = requireRole(event, ...REFERENCE_DATA_EDITORS);
		const form = await validateForm(event.request, zod4(tariffSchema));
		if (!form.valid) return fail(400, { form });
		const result = await saveTariff(
			user,
			event.params.tariffId,
			form.data,
			event.getClientAddress()
		);
		if (!result.ok) return refuse(form, result);
		return message(form, { tone: 'ok', text: 'Tariff row saved.' });
	},
	retire: async (event) => {
		const user = requireRole(event, ...REFERENCE_DATA_EDITORS);
		const form = await validateForm(event.request, zod4(retireSchema), { id: 'retire' });
		if (!form.valid) return fail(400, { form });
		const { validTo, version } = form.data;
		const result = await retireTariff(
			user,
			event.params.tariffId,
			version,
			validTo,
			event.getClientAddress()
		);
		if (!result.ok) return refuse(form, result);
		return message(form, { tone: 'ok', text: `Valid until ${validTo}.` });
	}
};
