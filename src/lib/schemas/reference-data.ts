import { z } from 'zod';
import { countryCode, currencyCode, decimalString } from './fields';
import type { dutyRateSchema } from './landed-cost';

type DutyRate = z.infer<typeof dutyRateSchema>;

// Forms for finance's landed-cost reference data. Every row names its source and the dates it is
// valid (migration 012); amounts and rates stay decimal strings.

export const isoDate = (label: string) =>
	z.iso.date({ error: `${label}: a date as YYYY-MM-DD, e.g. 2026-12-01.` });

export const sourceNote = z
	.string()
	.trim()
	.min(1, 'Say where the figures come from: issuer, document and date.')
	.max(500, 'Keep the source note under 500 characters.');

/** The row version the editor saw (optimistic locking); ignored when adding. */
export const rowVersion = z.number().int().min(0).default(0);

const rateFields = {
	base: currencyCode,
	quote: currencyCode,
	rate: decimalString('Rate', 10),
	validFrom: isoDate('Date')
};
const differentCurrencies = {
	check: (r: { base: string; quote: string }) => r.base !== r.quote,
	issue: { path: ['quote'], message: 'The quote currency must differ from the base.' }
};

/** One rate: 1 unit of `base` buys `rate` units of `quote` from `validFrom`. */
export const exchangeRateRowSchema = z
	.object(rateFields)
	.refine(differentCurrencies.check, differentCurrencies.issue);
export type ExchangeRateRow = z.infer<typeof exchangeRateRowSchema>;

export const exchangeRateSchema = z
	.object({ ...rateFields, source: sourceNote })
	.refine(differentCurrencies.check, differentCurrencies.issue);
export type ExchangeRateInput = z.infer<typeof exchangeRateSchema>;

export const MAX_RATES_PER_IMPORT = 10_000;

/** The import's confirm: every rate of the previewed file, and the one source note for them. */
export const exchangeRateImportSchema = z.object({
	source: sourceNote,
	base: z.string().default(''),
	rates: z
		.array(exchangeRateRowSchema)
		.min(1, 'The file has no rates to import.')
		.max(MAX_RATES_PER_IMPORT, `At most ${MAX_RATES_PER_IMPORT} rates per file.`)
});
export type ExchangeRateImport = z.infer<typeof exchangeRateImportSchema>;

/** An optional form field: '' (empty) or a value `schema` accepts. */
export const blankOr = <T extends z.ZodType>(schema: T) =>
	z.union([z.literal(''), schema]).default('');

/** What every reference row's form carries: its source, the dates it is valid, its version. */
export const validityFields = {
	source: sourceNote,
	validFrom: isoDate('Valid from'),
	validTo: blankOr(isoDate('Valid to')),
	version: rowVersion
};

/** Adds the issue "valid to before valid from" on validTo (for a superRefine). */
export function checkValidity(row: { validFrom: string; validTo: string }, ctx: z.RefinementCtx) {
	if (row.validTo && row.validTo < row.validFrom) {
		ctx.addIssue({ code: 'custom', path: ['validTo'], message: 'Valid to is before valid from.' });
	}
}

export const DUTY_KINDS = ['ad_valorem', 'specific', 'compound'] as const;
export const DUTY_KIND_LABELS: Record<(typeof DUTY_KINDS)[number], string> = {
	ad_valorem: 'Ad valorem (% of the customs value)',
	specific: 'Specific (an amount per unit or kg)',
	compound: 'Compound (% plus an amount per unit or kg)'
};

/** A tariff row as the form edits it: the duty flat, origins as "MY, SG". */
export const tariffSchema = z
	.object({
		destinationCountry: countryCode,
		hsPrefix: z
			.string()
			.trim()
			.regex(/^\d{2,10}$/, 'HS prefix: 2 to 10 digits without dots, e.g. 8518 or 85183000.'),
		dutyKind: z.enum(DUTY_KINDS, { error: 'Choose how the duty is charged.' }),
		ratePercent: z.string().trim().default(''),
		amount: z.string().trim().default(''),
		per: z.enum(['unit', 'kg']).default('unit'),
		currency: z.string().trim().toUpperCase().default(''),
		agreement: z
			.string()
			.trim()
			.max(40, 'Keep the agreement code under 40 characters.')
			.default(''),
		originCountries: z.string().trim().toUpperCase().default(''),
		...validityFields
	})
	.superRefine((t, ctx) => {
		const add = (path: string, message: string) =>
			ctx.addIssue({ code: 'custom', path: [path], message });
		const check = (path: 'ratePercent' | 'amount', label: string) => {
			const r = decimalString(label, 6, 'zero').safeParse(t[path]);
			if (!r.success) add(path, r.error.issues[0]!.message);
		};
		if (t.dutyKind !== 'specific') check('ratePercent', 'Duty rate');
		if (t.dutyKind !== 'ad_valorem') {
			check('amount', 'Duty amount');
			if (!currencyCode.safeParse(t.currency).success) {
				add('currency', 'Choose the currency of the amount (ISO 4217, e.g. USD).');
			}
		}
		const origins = splitCountries(t.originCountries);
		const wrong = origins.filter((c) => !countryCode.safeParse(c).success);
		if (wrong.length) add('originCountries', `Not ISO 3166-1 country codes: ${wrong.join(', ')}.`);
		if (t.agreement && origins.length === 0) {
			add('originCountries', 'A preferential row names the origin countries it is for.');
		}
		if (!t.agreement && origins.length) {
			add(
				'agreement',
				'Name the trade agreement, or leave the origins empty for the general rate.'
			);
		}
		checkValidity(t, ctx);
	});
export type TariffInput = z.infer<typeof tariffSchema>;

export function splitCountries(text: string): string[] {
	return text
		.split(/[\s,;]+/)
		.map((c) => c.trim().toUpperCase())
		.filter(Boolean);
}

/** The duty jsonb (dutyRateSchema in schemas/landed-cost.ts) of a checked tariff form. */
export function tariffDuty(t: TariffInput): DutyRate {
	if (t.dutyKind === 'ad_valorem') return { kind: 'ad_valorem', ratePercent: t.ratePercent };
	const specific = { amount: t.amount, per: t.per, currency: t.currency };
	if (t.dutyKind === 'specific') return { kind: 'specific', ...specific };
	return { kind: 'compound', ratePercent: t.ratePercent, ...specific };
}

/** The form's flat duty fields of a stored duty. */
export function dutyFields(duty: DutyRate) {
	return {
		dutyKind: duty.kind,
		ratePercent: 'ratePercent' in duty ? duty.ratePercent : '',
		amount: 'amount' in duty ? duty.amount : '',
		per: 'per' in duty ? duty.per : ('unit' as const),
		currency: 'currency' in duty ? duty.currency : ''
	};
}

/** Ends a row's validity on a given day (it stays for shipments dated before). */
export const retireSchema = z.object({ validTo: isoDate('Last valid day'), version: rowVersion });
