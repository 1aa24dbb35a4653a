import Decimal from 'decimal.js';
import { z } from 'zod';
import { TRANSPORT_MODES } from '../trade/shipment-status';
import { countryCode, currencyCode, decimalString } from './fields';
import { roundingRulesSchema, vatRulesSchema } from './landed-cost';
import { blankOr, checkValidity, validityFields } from './reference-data';

// Forms for a destination's import rules (country_rules), its customs fees and its de minimis
// thresholds. VAT and rounding are checked by the schemas the jsonb columns are checked by.

/** A percentage from 0 to 100 with at most `scale` decimals. */
export const percent = (label: string, scale: number) =>
	decimalString(label, scale, 'zero').refine(
		// zod runs this even when the pattern failed: only a number is compared.
		(v) => !/^\d+(\.\d+)?$/.test(v) || new Decimal(v).lte(100),
		`${label}: at most 100 %.`
	);

export const VAT_BASE_ITEMS = [
	'duty',
	'fees',
	'freight',
	'insurance',
	'origin_charges',
	'destination_charges'
] as const;
export const VAT_BASE_LABELS: Record<(typeof VAT_BASE_ITEMS)[number], string> = {
	duty: 'Duty',
	fees: 'Customs fees',
	freight: 'Freight to the border (if not in the customs value)',
	insurance: 'Insurance (if not in the customs value)',
	origin_charges: 'Origin charges',
	destination_charges: 'Destination charges (to the first place of delivery)'
};

export const ROUNDING_TARGETS = ['dutyBase', 'duty', 'vatBase', 'vat'] as const;
export const ROUNDING_LABELS: Record<(typeof ROUNDING_TARGETS)[number], string> = {
	dutyBase: 'Customs value (duty base)',
	duty: 'Duty',
	vatBase: 'VAT/GST base',
	vat: 'VAT/GST'
};

export const countryRuleSchema = z
	.object({
		country: countryCode,
		currency: currencyCode,
		valuationBasis: z.enum(['CIF', 'FOB'], { error: 'Choose CIF or FOB.' }),
		vat: vatRulesSchema
			.extend({ ratePercent: percent('VAT rate', 4) })
			// No rows in the default: superforms fills a refused form's empty arrays from it.
			.default({ label: 'VAT', ratePercent: '', reduced: [], baseIncludes: [] }),
		rounding: roundingRulesSchema.default({}),
		...validityFields
	})
	.superRefine((rule, ctx) => {
		checkValidity(rule, ctx);
		const seen = new Set<string>();
		rule.vat.reduced.forEach((r, i) => {
			if (seen.has(r.hsPrefix)) {
				ctx.addIssue({
					code: 'custom',
					path: ['vat', 'reduced', i, 'hsPrefix'],
					message: 'This HS prefix is listed twice.'
				});
			}
			seen.add(r.hsPrefix);
		});
	});
export type CountryRuleInput = z.infer<typeof countryRuleSchema>;

const amount = (label: string) => blankOr(decimalString(label, 4, 'zero'));

export const FEE_KINDS = ['ad_valorem', 'fixed'] as const;

/** A customs fee: ad valorem (% of the customs value, with a minimum and maximum) or fixed. */
export const customsFeeSchema = z
	.object({
		country: countryCode,
		code: z
			.string()
			.trim()
			.toUpperCase()
			.regex(/^[A-Z0-9-]{2,20}$/, 'Code: 2 to 20 letters, digits or dashes, e.g. US-MPF.'),
		label: z
			.string()
			.trim()
			.min(1, 'Name the fee, e.g. Merchandise processing fee.')
			.max(100, 'Keep the name under 100 characters.'),
		kind: z.enum(FEE_KINDS, { error: 'Choose how the fee is charged.' }),
		ratePercent: blankOr(percent('Rate', 6)),
		amount: amount('Amount'),
		minAmount: amount('Minimum'),
		maxAmount: amount('Maximum'),
		modes: z.array(z.enum(TRANSPORT_MODES)).default([]),
		...validityFields
	})
	.superRefine((fee, ctx) => {
		const add = (path: string, message: string) =>
			ctx.addIssue({ code: 'custom', path: [path], message });
		checkValidity(fee, ctx);
		if (fee.kind === 'ad_valorem' && !fee.ratePercent) add('ratePercent', 'Enter the rate in %.');
		if (fee.kind === 'fixed' && !fee.amount) add('amount', 'Enter the amount.');
		if (fee.minAmount && fee.maxAmount && new Decimal(fee.minAmount).gt(fee.maxAmount)) {
			add('maxAmount', 'The maximum is below the minimum.');
		}
	});
export type CustomsFeeInput = z.infer<typeof customsFeeSchema>;

/** Relief below a value: no duty (and/or no VAT) up to the threshold, between two dates. */
export const deMinimisSchema = z
	.object({
		country: countryCode,
		dutyUpTo: blankOr(decimalString('Duty threshold', 2, 'zero')),
		vatUpTo: blankOr(decimalString('VAT/GST threshold', 2, 'zero')),
		currency: currencyCode,
		...validityFields
	})
	.superRefine((rule, ctx) => {
		checkValidity(rule, ctx);
		if (!rule.dutyUpTo && !rule.vatUpTo) {
			ctx.addIssue({
				code: 'custom',
				path: ['dutyUpTo'],
				message: 'Give a duty or a VAT/GST threshold (or both).'
			});
		}
	});
export type DeMinimisInput = z.infer<typeof deMinimisSchema>;
