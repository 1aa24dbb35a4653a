import { rateCardPages } from '$lib/server/reference-page-specs';
import { countryAndCurrencyOptions } from '$lib/server/services/form-options';
import { containerTypeChoices } from '$lib/server/services/reference-data/rate-cards';
import type { Actions, PageServerLoad } from './$types';

// Returns: row (the stored card), canEdit, saved, form (edit), retireForm, currencies,
// containerTypes.
export const load: PageServerLoad = async (event) => ({
	...(await rateCardPages.load(event)),
	currencies: countryAndCurrencyOptions().currencies,
	containerTypes: await containerTypeChoices()
});

export const actions: Actions = rateCardPages.actions;
