import { z } from 'zod';
import { currencyCode, decimalString } from './fields';

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
