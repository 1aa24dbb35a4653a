import { zod4 } from 'sveltekit-superforms/adapters';
import { countryRuleSchema, customsFeeSchema, deMinimisSchema } from '../schemas/country-rules';
import { rateCardSchema } from '../schemas/rate-cards';
import { datedRowPages } from './reference-pages';
import {
	DE_MINIMIS,
	FEE,
	RULE,
	countryRuleFormValues,
	deMinimisFormValues,
	feeFormValues,
	getCountryRule,
	getDeMinimis,
	getFee,
	retireCountryRow,
	saveCountryRule,
	saveDeMinimis,
	saveFee
} from './services/reference-data/country-rules';
import {
	getRateCard,
	rateCardFormValues,
	retireRateCard,
	saveRateCard
} from './services/reference-data/rate-cards';

// The loads and actions of each dated reference row's pages (see reference-pages.ts).

export const rateCardPages = datedRowPages({
	schema: zod4(rateCardSchema),
	formId: 'rate-card-add',
	get: getRateCard,
	values: rateCardFormValues,
	save: saveRateCard,
	retire: retireRateCard,
	param: 'rateCardId',
	path: '/reference/rate-cards',
	missing: 'No such rate card.',
	saved: 'Rate card saved.'
});

export const countryRulePages = datedRowPages({
	schema: zod4(countryRuleSchema),
	formId: 'country-rule-add',
	get: getCountryRule,
	values: countryRuleFormValues,
	save: saveCountryRule,
	retire: retireCountryRow(RULE),
	param: 'ruleId',
	path: '/reference/country-rules',
	missing: 'No such country rule.',
	saved: 'Country rule saved.'
});

export const feePages = datedRowPages({
	schema: zod4(customsFeeSchema),
	formId: 'fee-add',
	get: getFee,
	values: feeFormValues,
	save: saveFee,
	retire: retireCountryRow(FEE),
	param: 'feeId',
	path: '/reference/country-rules/fees',
	missing: 'No such customs fee.',
	saved: 'Customs fee saved.'
});

export const deMinimisPages = datedRowPages({
	schema: zod4(deMinimisSchema),
	formId: 'de-minimis-add',
	get: getDeMinimis,
	values: deMinimisFormValues,
	save: saveDeMinimis,
	retire: retireCountryRow(DE_MINIMIS),
	param: 'deMinimisId',
	path: '/reference/country-rules/de-minimis',
	missing: 'No such de minimis rule.',
	saved: 'De minimis rule saved.'
});
