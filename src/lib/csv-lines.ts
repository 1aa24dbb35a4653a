import { cell, readCsv } from './csv';

// Parses a CSV of shipment lines (sku, quantity, optional unit_price) against the known products.
// Pure: the page previews the result; nothing is saved until the user confirms and saves.

export interface CsvLineRow {
	row: number;
	sku: string;
	productId: string | null;
	quantity: number | null;
	unitPrice: string;
	errors: string[];
}

const HEADERS = {
	sku: ['sku'],
	quantity: ['quantity', 'qty'],
	unitPrice: ['unit_price', 'unitprice', 'price']
};

export function parseLinesCsv(text: string, products: { id: string; sku: string }[]) {
	const { records, column, parseError } = readCsv(text);
	const skuColumn = column(HEADERS.sku);
	const quantityColumn = column(HEADERS.quantity);
	const priceColumn = column(HEADERS.unitPrice);
	if (!skuColumn || !quantityColumn) {
		return {
			rows: [],
			fileError: 'The first row must name the columns: sku, quantity and optionally unit_price.'
		};
	}
	const bySku = new Map(products.map((p) => [p.sku.toLowerCase(), p.id]));
	const rows: CsvLineRow[] = records.map((record, index) => {
		const errors: string[] = [];
		const sku = cell(record, skuColumn);
		const productId = bySku.get(sku.toLowerCase()) ?? null;
		if (!sku) errors.push('SKU is empty.');
		else if (!productId) errors.push(`No product with SKU “${sku}”.`);
		const rawQuantity = cell(record, quantityColumn);
		const quantity = /^\d{1,8}$/.test(rawQuantity) ? Number(rawQuantity) : null;
		if (quantity === null || quantity < 1)
			errors.push(`Quantity “${rawQuantity}” must be a whole number of at least 1.`);
		const unitPrice = cell(record, priceColumn);
		if (unitPrice && !/^\d{1,10}(\.\d{1,4})?$/.test(unitPrice)) {
			errors.push(`Unit price “${unitPrice}” must be a number with a dot and at most 4 decimals.`);
		}
		return {
			row: index + 2,
			sku,
			productId,
			quantity: quantity && quantity >= 1 ? quantity : null,
			unitPrice,
			errors
		};
	});
	return { rows, fileError: parseError };
}
