import { describe, expect, it } from 'vitest';
import { parseLinesCsv } from './csv-lines';

const products = [
	{ id: 'p1', sku: 'SLV-PBL-20' },
	{ id: 'p2', sku: 'SLV-PWR-20K' }
];

describe('parseLinesCsv', () => {
	it('matches SKUs case-insensitively and keeps optional prices', () => {
		const { rows, fileError } = parseLinesCsv(
			'sku,quantity,unit_price\nslv-pbl-20,120,\nSLV-PWR-20K,60,16.90\n',
			products
		);
		expect(fileError).toBeNull();
		expect(rows).toEqual([
			{ row: 2, sku: 'slv-pbl-20', productId: 'p1', quantity: 120, unitPrice: '', errors: [] },
			{ row: 3, sku: 'SLV-PWR-20K', productId: 'p2', quantity: 60, unitPrice: '16.90', errors: [] }
		]);
	});

	it('reports every bad row with its row number and reason', () => {
		const { rows } = parseLinesCsv('SKU,Qty\nNOPE,5\nSLV-PBL-20,0\nSLV-PBL-20,2.5\n', products);
		expect(rows.map((r) => [r.row, r.errors.length])).toEqual([
			[2, 1],
			[3, 1],
			[4, 1]
		]);
		expect(rows[0]!.errors[0]).toContain('No product with SKU “NOPE”');
		expect(rows[1]!.errors[0]).toContain('at least 1');
	});

	it('refuses a file without the sku and quantity columns', () => {
		expect(parseLinesCsv('a,b\n1,2', products).fileError).toMatch(/sku, quantity/);
	});
});
