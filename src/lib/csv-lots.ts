import { lotRowSchema, MAX_LOTS_PER_IMPORT, type LotRowInput } from './schemas/shipments';
import { cell, readCsv } from './csv';

// Parses a CSV of lots (sku, carton_from, carton_to, lot, optional serial_from and serial_to)
// against the shipment's products, row by row with the same rules as the typed form. Pure: the
// page previews the result; nothing is saved until the user confirms.

export interface CsvLotRow {
	row: number;
	sku: string;
	cartonFrom: string;
	cartonTo: string;
	lotNumber: string;
	serialFrom: string;
	serialTo: string;
	/** The row as the import sends it, or null when it has errors. */
	lot: LotRowInput | null;
	errors: string[];
}

const HEADERS = {
	sku: ['sku'],
	cartonFrom: ['carton_from', 'first_carton', 'from_carton'],
	cartonTo: ['carton_to', 'last_carton', 'to_carton'],
	lotNumber: ['lot', 'lot_number', 'lot_no'],
	serialFrom: ['serial_from', 'first_serial'],
	serialTo: ['serial_to', 'last_serial']
} as const;

const LABELS: Record<string, string> = {
	productId: 'SKU',
	cartonFrom: 'carton_from',
	cartonTo: 'carton_to',
	lotNumber: 'lot',
	serialFrom: 'serial_from',
	serialTo: 'serial_to'
};

export function parseLotsCsv(
	text: string,
	products: { id: string; sku: string }[]
): { rows: CsvLotRow[]; fileError: string | null } {
	const { records, column, parseError } = readCsv(text);
	const columns = {
		sku: column(HEADERS.sku),
		cartonFrom: column(HEADERS.cartonFrom),
		cartonTo: column(HEADERS.cartonTo),
		lotNumber: column(HEADERS.lotNumber),
		serialFrom: column(HEADERS.serialFrom),
		serialTo: column(HEADERS.serialTo)
	};
	if (!columns.sku || !columns.cartonFrom || !columns.cartonTo || !columns.lotNumber) {
		return {
			rows: [],
			fileError:
				'The first row must name the columns: sku, carton_from, carton_to, lot and optionally ' +
				'serial_from, serial_to.'
		};
	}
	if (records.length > MAX_LOTS_PER_IMPORT) {
		return {
			rows: [],
			fileError: `The file has ${records.length} rows; import at most ${MAX_LOTS_PER_IMPORT} at a time.`
		};
	}
	const bySku = new Map(products.map((p) => [p.sku.toLowerCase(), p.id]));
	const rows = records.map((record, index): CsvLotRow => {
		const raw = {
			sku: cell(record, columns.sku),
			cartonFrom: cell(record, columns.cartonFrom),
			cartonTo: cell(record, columns.cartonTo),
			lotNumber: cell(record, columns.lotNumber),
			serialFrom: cell(record, columns.serialFrom),
			serialTo: cell(record, columns.serialTo)
		};
		const errors: string[] = [];
		const productId = bySku.get(raw.sku.toLowerCase());
		if (!raw.sku) errors.push('SKU is empty.');
		else if (!productId) errors.push(`No product with SKU “${raw.sku}” on this shipment.`);
		const whole = (text: string) => (/^\d{1,7}$/.test(text) ? Number(text) : text);
		const parsed = lotRowSchema.safeParse({
			productId: productId ?? '00000000-0000-4000-8000-000000000000',
			cartonFrom: whole(raw.cartonFrom),
			cartonTo: whole(raw.cartonTo),
			lotNumber: raw.lotNumber,
			serialFrom: raw.serialFrom,
			serialTo: raw.serialTo
		});
		if (!parsed.success) {
			for (const issue of parsed.error.issues) {
				const field = String(issue.path[0] ?? '');
				errors.push(`${LABELS[field] ?? field}: ${issue.message}`);
			}
		}
		return {
			row: index + 2,
			...raw,
			lot: errors.length === 0 && parsed.success ? parsed.data : null,
			errors
		};
	});
	return { rows, fileError: parseError };
}
