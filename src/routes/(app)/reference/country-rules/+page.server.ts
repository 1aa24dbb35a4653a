import { REFERENCE_DATA_READERS, canEditReferenceData } from '$lib/roles';
import { requireRole } from '$lib/server/auth/guard';
import { countryRulePages, deMinimisPages, feePages } from '$lib/server/reference-page-specs';
import { countryAndCurrencyOptions } from '$lib/server/services/form-options';
import {
	listCountryRules,
	listDeMinimis,
	listFees
} from '$lib/server/services/reference-data/country-rules';
import { lastChanged } from '$lib/server/services/reference-data/dated-rows';
import type { Actions, PageServerLoad } from './$types';

// Returns: rules, fees, deMinimis (of the country filter, or all), countriesWithRules, country
// (the filter), canEdit, ruleForm, feeForm, deMinimisForm (add forms, the filter's country
// filled in), countries, currencies, asOf.
export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...REFERENCE_DATA_READERS);
	const wanted = event.url.searchParams.get('country') ?? '';
	const country = /^[A-Z]{2}$/.test(wanted) ? wanted : null;
	const start = country ? { country } : undefined;
	return {
		rules: await listCountryRules(country),
		fees: await listFees(country),
		deMinimis: await listDeMinimis(country),
		countriesWithRules: [...new Set((await listCountryRules()).map((r) => r.country))],
		country: country ?? '',
		canEdit: canEditReferenceData(user.role),
		ruleForm: await countryRulePages.addForm(start),
		feeForm: await feePages.addForm(start),
		deMinimisForm: await deMinimisPages.addForm(start),
		...countryAndCurrencyOptions(),
		asOf: await lastChanged(['country_rules', 'customs_fees', 'de_minimis_rules'])
	};
};

export const actions: Actions = {
	addRule: countryRulePages.add,
	addFee: feePages.add,
	addDeMinimis: deMinimisPages.add
};
