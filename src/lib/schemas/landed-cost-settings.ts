import { z } from 'zod';
import { isPaymentCurrency } from '../reference/currencies';
import { countryCode, decimalString } from './fields';
import { brokerageSchema, chargeSchema } from './landed-cost';
import { percent } from './country-rules';
import { blankOr, rowVersion, sourceNote } from './reference-data';

// Finance's landed-cost assumptions: the one landed_cost_settings row. Brokerage is edited as a
// list of countries, each with its charges, and stored as brokerageSchema's record.

export const settingsSchema = z
	.object({
		insuranceRatePercent: percent('Insurance rate', 4),
		insuranceUpliftPercent: percent('Uplift', 4),
		minimumPremium: blankOr(decimalString('Minimum premium', 2, 'zero')),
		insuranceSource: sourceNote,
		carryingRatePercent: percent('Annual rate', 4),
		allocation: z.enum(['weight', 'value'], { error: 'Choose weight or value.' }),
		brokerage: z
			.array(
				z.object({
					country: countryCode,
					charges: z.array(chargeSchema).min(1, 'Give at least one charge, or remove the country.')
				})
			)
			.default([]),
		version: rowVersion
	})
	.superRefine((s, ctx) => {
		const seen = new Set<string>();
		s.brokerage.forEach((b, i) => {
			if (seen.has(b.country)) {
				ctx.addIssue({
					code: 'custom',
					path: ['brokerage', i, 'country'],
					message: 'This country is listed twice.'
				});
			}
			seen.add(b.country);
			b.charges.forEach((c, j) => {
				if (!isPaymentCurrency(c.currency)) {
					ctx.addIssue({
						code: 'custom',
						path: ['brokerage', i, 'charges', j, 'currency'],
						message: 'Not an ISO 4217 currency code.'
					});
				}
			});
		});
	});
export type SettingsInput = z.infer<typeof settingsSchema>;

/** The stored brokerage (a record by country) of the form's list; checked by brokerageSchema. */
export function brokerageRecord(list: SettingsInput['brokerage']) {
	return brokerageSchema.parse(Object.fromEntries(list.map((b) => [b.country, b.charges])));
}

/** The form's list of a stored brokerage record, countries in order. */
export function brokerageList(record: z.infer<typeof brokerageSchema>): SettingsInput['brokerage'] {
	return Object.keys(record)
		.sort()
		.map((country) => ({ country, charges: record[country]! }));
}
