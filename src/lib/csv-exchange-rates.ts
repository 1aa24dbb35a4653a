import { cell, readCsv } from './csv';
import {
	exchangeRateRowSchema,
	MAX_RATES_PER_IMPORT,
	type ExchangeRateRow
} from './schemas/reference-data';

// Parses a daily reference-rate table for the import preview. Two layouts:
// - long: `date,base,quote,rate`, one rate per row;
// - wide: `date,USD,JPY,…`, one row per date and one column per currency against a base that
//   the form names (the layout central banks publish, e.g. the ECB's euro reference rates).
// In the wide layout an empty cell or N/A means no rate that day, not an error. Pure.

export interface CsvRateRow {
	/** The row as a spreadsheet numbers it (the header is row 1). */
	row: number;
	date: string;
	/** The rates this row gives, as typed (checked ones go in `rates`). */
	cells: { base: string; quote: string; rate: string }[];
	rates: ExchangeRateRow[];
	errors: string[];
}

export type CsvLayout = 'long' | 'wide';

export interface CsvRates {
	layout: CsvLayout | null;
	rows: CsvRateRow[];
	fileError: string | null;
}

const LABELS: Record<string, string> = {
	base: 'base',
	quote: 'quote',
	rate: 'rate',
	validFrom: 'date'
};
const MISSING = new Set(['', 'n/a', 'na', '-', '—']);
const HEADER_HELP =
	'The first row must name the columns: date,base,quote,rate — or date followed by one ' +
	'column per currency code (date,USD,JPY,…) with the base chosen above.';

function check(raw: { base: string; quote: string; rate: string; validFrom: string }) {
	const parsed = exchangeRateRowSchema.safeParse(raw);
	if (parsed.success) return { rate: parsed.data, errors: [] };
	const prefix = `${raw.base || '?'}/${raw.quote || '?'}`;
	return {
		rate: null,
		errors: parsed.error.issues.map((i) => {
			const field = String(i.path[0] ?? '');
			return `${prefix} ${LABELS[field] ?? field}: ${i.message}`;
		})
	};
}

export function parseExchangeRatesCsv(text: string, wideBase = ''): CsvRates {
	const { records, column, parseError } = readCsv(text);
	const dateColumn = column(['date', 'valid_from', 'day']);
	const baseColumn = column(['base', 'base_currency', 'from']);
	const quoteColumn = column(['quote', 'quote_currency', 'to']);
	const rateColumn = column(['rate', 'value']);
	if (!dateColumn) return { layout: null, rows: [], fileError: HEADER_HELP };
	const long = Boolean(baseColumn && quoteColumn && rateColumn);
	const currencyColumns = long
		? []
		: Object.keys(records[0] ?? {}).filter((c) => /^[a-z]{3}$/.test(c) && c !== dateColumn);
	if (!long && currencyColumns.length === 0) {
		return { layout: null, rows: [], fileError: HEADER_HELP };
	}
	const base = wideBase.trim().toUpperCase();
	if (!long && !base) {
		return {
			layout: 'wide',
			rows: [],
			fileError: 'This file has one column per currency: choose the base currency it is against.'
		};
	}
	const seen = new Set<string>();
	const rows = records.map((record, index): CsvRateRow => {
		const date = cell(record, dateColumn);
		const cells = long
			? [
					{
						base: cell(record, baseColumn).toUpperCase(),
						quote: cell(record, quoteColumn).toUpperCase(),
						rate: cell(record, rateColumn)
					}
				]
			: currencyColumns
					.map((c) => ({ base, quote: c.toUpperCase(), rate: cell(record, c) }))
					.filter((c) => !MISSING.has(c.rate.toLowerCase()));
		const rates: ExchangeRateRow[] = [];
		const errors: string[] = [];
		if (cells.length === 0) errors.push('No rate in this row.');
		for (const c of cells) {
			const result = check({ ...c, validFrom: date });
			errors.push(...result.errors);
			if (!result.rate) continue;
			const key = `${result.rate.base}/${result.rate.quote} ${result.rate.validFrom}`;
			if (seen.has(key)) errors.push(`${key} appears twice in the file.`);
			else rates.push(result.rate);
			seen.add(key);
		}
		return { row: index + 2, date, cells, rates: errors.length ? [] : rates, errors };
	});
	const count = rows.reduce((n, r) => n + r.cells.length, 0);
	if (count > MAX_RATES_PER_IMPORT) {
		return {
			layout: long ? 'long' : 'wide',
			rows: [],
			fileError: `The file has ${count} rates; import at most ${MAX_RATES_PER_IMPORT} at a time.`
		};
	}
	return { layout: long ? 'long' : 'wide', rows, fileError: parseError };
}
