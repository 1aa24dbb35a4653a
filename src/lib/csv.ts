import Papa from 'papaparse';

// Shared CSV reading for the import previews: a header row (names trimmed, lower-cased, spaces
// as underscores), blank lines skipped, the first parse problem as a file error. Pure.

export interface CsvTable {
	records: Record<string, string>[];
	/** The column for the first of `names` that the header has, if any. */
	column: (names: readonly string[]) => string | undefined;
	/** The first problem papaparse reported, with its row number as a spreadsheet shows it. */
	parseError: string | null;
}

export function readCsv(text: string): CsvTable {
	const parsed = Papa.parse<Record<string, string>>(text.trim(), {
		header: true,
		skipEmptyLines: 'greedy',
		transformHeader: (h) => h.trim().toLowerCase().replace(/\s+/g, '_')
	});
	const fields = parsed.meta.fields ?? [];
	const first = parsed.errors[0];
	return {
		records: parsed.data,
		column: (names) => fields.find((f) => names.includes(f)),
		parseError: first ? `Row ${(first.row ?? 0) + 2}: ${first.message}` : null
	};
}

/** A cell's trimmed text ('' for a missing column or cell). */
export function cell(record: Record<string, string>, column: string | undefined): string {
	return column ? (record[column] ?? '').trim() : '';
}

export const MAX_CSV_BYTES = 1_000_000;

/**
 * The chosen file of a file input, parsed; null when none was chosen. Files over 1 MB are
 * refused before reading (the previews are for a shipment's lines or lots, not bulk loads).
 */
export async function parseChosenFile<Row>(
	event: Event,
	parse: (text: string) => { rows: Row[]; fileError: string | null }
): Promise<{ rows: Row[]; fileError: string | null } | null> {
	const file = (event.currentTarget as HTMLInputElement).files?.[0];
	if (!file) return null;
	if (file.size > MAX_CSV_BYTES) {
		return { rows: [], fileError: 'That file is larger than 1 MB; split it into smaller files.' };
	}
	return parse(await file.text());
}
