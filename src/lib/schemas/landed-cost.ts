import { z } from 'zod';

// Checks for the landed-cost reference data that the database keeps as jsonb (rate-card terms,
// duty, VAT, rounding, brokerage), mirroring src/lib/landed-cost/types.ts. Amounts and rates are
// decimal strings end to end.

const decimal = (label: string) =>
	z
		.string()
		.trim()
		.regex(/^\d{1,12}(\.\d{1,10})?$/, `${label}: a number with a dot, e.g. 12.5.`);
const currency = z.string().regex(/^[A-Z]{3}$/, 'An ISO 4217 currency code, e.g. USD.');

export const chargeSchema = z.object({
	label: z.string().trim().min(1).max(100),
	basis: z.enum([
		'per_shipment',
		'per_kg',
		'per_chargeable_kg',
		'per_container',
		'per_wm',
		'per_pallet',
		'percent_of_freight'
	]),
	amount: decimal('Amount'),
	currency,
	containerType: z.string().max(10).optional(),
	minimum: decimal('Minimum').optional()
});

const common = {
	surcharges: z.array(chargeSchema).default([]),
	originCharges: z.array(chargeSchema).default([]),
	destinationCharges: z.array(chargeSchema).default([])
};

/** The `terms` column of rate_cards, by mode. */
export const rateCardTermsSchema = z.discriminatedUnion('mode', [
	z.object({
		mode: z.literal('air'),
		minimumCharge: decimal('Minimum charge'),
		breaks: z
			.array(z.object({ fromKg: decimal('Break'), ratePerKg: decimal('Rate per kg') }))
			.min(1),
		...common
	}),
	z.object({
		mode: z.literal('sea_fcl'),
		containerRates: z
			.array(z.object({ typeCode: z.string().min(1).max(10), ratePerContainer: decimal('Rate') }))
			.min(1),
		...common
	}),
	z.object({
		mode: z.literal('sea_lcl'),
		ratePerWm: decimal('Rate per W/M'),
		minimumWm: decimal('Minimum W/M'),
		minimumCharge: decimal('Minimum charge'),
		...common
	}),
	z.object({
		mode: z.literal('road'),
		basis: z.enum(['per_kg', 'per_pallet']),
		rate: decimal('Rate'),
		minimumCharge: decimal('Minimum charge'),
		...common
	}),
	z.object({
		mode: z.literal('courier'),
		firstHalfKg: decimal('First 0.5 kg'),
		additionalHalfKg: decimal('Each further 0.5 kg'),
		...common
	})
]);
export type RateCardTerms = z.infer<typeof rateCardTermsSchema>;

export const dutyRateSchema = z.discriminatedUnion('kind', [
	z.object({ kind: z.literal('ad_valorem'), ratePercent: decimal('Duty rate') }),
	z.object({
		kind: z.literal('specific'),
		amount: decimal('Duty amount'),
		per: z.enum(['unit', 'kg']),
		currency
	}),
	z.object({
		kind: z.literal('compound'),
		ratePercent: decimal('Duty rate'),
		amount: decimal('Duty amount'),
		per: z.enum(['unit', 'kg']),
		currency
	})
]);

export const vatRulesSchema = z.object({
	label: z.string().min(1).max(20),
	ratePercent: decimal('VAT rate'),
	reduced: z
		.array(z.object({ hsPrefix: z.string().regex(/^\d{2,10}$/), ratePercent: decimal('Rate') }))
		.default([]),
	baseIncludes: z.array(
		z.enum(['duty', 'fees', 'freight', 'insurance', 'origin_charges', 'destination_charges'])
	)
});

const roundingRule = z.object({
	multiple: decimal('Multiple'),
	mode: z.enum(['down', 'half_up', 'up'])
});
export const roundingRulesSchema = z.object({
	dutyBase: roundingRule.optional(),
	duty: roundingRule.optional(),
	vatBase: roundingRule.optional(),
	vat: roundingRule.optional()
});

/** landed_cost_settings.brokerage: destination country → the broker's charges there. */
export const brokerageSchema = z.record(z.string().regex(/^[A-Z]{2}$/), z.array(chargeSchema));

/** GET /api/v1/shipments/{id}/landed-cost query. */
export const landedCostQuerySchema = z.object({
	mode: z.enum(['air', 'sea_fcl', 'sea_lcl', 'road', 'courier'], {
		error: 'mode: one of air, sea_fcl, sea_lcl, road, courier.'
	}),
	date: z
		.string()
		.regex(/^\d{4}-\d{2}-\d{2}$/, 'date: YYYY-MM-DD.')
		.optional(),
	allocation: z.enum(['weight', 'value']).optional(),
	preferenceClaimed: z
		.enum(['true', 'false'])
		.transform((v) => v === 'true')
		.optional(),
	carryingRatePercent: decimal('carryingRatePercent').optional(),
	reportCurrency: currency.optional()
});

/** Saving the comparison as a named scenario (the page's assumptions and modes). */
export const saveScenarioSchema = z.object({
	name: z
		.string()
		.trim()
		.min(1, 'Give the scenario a name.')
		.max(100, 'Keep the name to 100 characters.'),
	modes: z
		.array(z.enum(['air', 'sea_fcl', 'sea_lcl', 'road', 'courier']))
		.min(1, 'Choose at least one mode.'),
	date: z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'A date as YYYY-MM-DD.'),
	allocation: z.enum(['weight', 'value']),
	preferenceClaimed: z.boolean().default(false),
	carryingRatePercent: decimal('Cost of money in transit')
});
