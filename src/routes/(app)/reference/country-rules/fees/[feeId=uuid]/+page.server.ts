import { feePages } from '$lib/server/reference-page-specs';
import { countryAndCurrencyOptions } from '$lib/server/services/form-options';
import type { Actions, PageServerLoad } from './$types';

// Returns: row (the stored fee), canEdit, saved, form (edit), retireForm, countries, currencies.
export const load: PageServerLoad = async (event) => ({
	...(await feePages.load(event)),
	...countryAndCurrencyOptions()
});

export const actions: Actions = feePages.actions;
