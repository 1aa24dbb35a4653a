import { describe, expect, it } from 'vitest';
import { parseLotsCsv } from './csv-lots';

const PRODUCTS = [
	{ id: '6f1c2b1e-7d0a-4c1e-9a55-3b7f0e2d9c11', sku: 'SLV-PBL-20' },
	{ id: '0b8e4a52-93c4-4f7e-8d21-5e6a7c9b1f02', sku: 'SLV-PWR-20K' }
];

describe('parseLotsCsv', () => {
	it('reads good rows, whatever the case of the SKU and with or without serials', () => {
		const { rows, fileError } = parseLotsCsv(
			'SKU,Carton From,Carton To,Lot,Serial From,Serial To\n' +
				'slv-pbl-20,1,10,PB20-2611-A,PB20-000001,PB20-000120\n' +
				'SLV-PWR-20K,11,12,PW-2611,,\n',
			PRODUCTS
		);
		expect(fileError).toBeNull();
		expect(rows.map((r) => r.errors)).toEqual([[], []]);
		expect(rows[0]!.lot).toEqual({
			productId: PRODUCTS[0]!.id,
			cartonFrom: 1,
			cartonTo: 10,
			lotNumber: 'PB20-2611-A',
			serialFrom: 'PB20-000001',
			serialTo: 'PB20-000120'
		});
		expect(rows[1]!.lot?.serialFrom).toBe('');
	});

	it('reports each bad row with its spreadsheet row number, and keeps it out', () => {
		const { rows } = parseLotsCsv(
			'sku,carton_from,carton_to,lot,serial_from,serial_to\n' +
				'SLV-XXX,1,2,L1,,\n' +
				'SLV-PBL-20,5,3,L2,,\n' +
				'SLV-PBL-20,1,2,,A-01,\n' +
				'SLV-PBL-20,x,2,L4,,\n' +
				'SLV-PBL-20,1,2,L5,A-001,A-01\n',
			PRODUCTS
		);
		expect(rows.map((r) => r.row)).toEqual([2, 3, 4, 5, 6]);
		expect(rows.every((r) => r.lot === null)).toBe(true);
		expect(rows[0]!.errors).toEqual(['No product with SKU “SLV-XXX” on this shipment.']);
		expect(rows[1]!.errors.join(' ')).toMatch(/carton_to: The last carton comes before the first/);
		expect(rows[2]!.errors.join(' ')).toMatch(/lot: Enter the lot number/);
		expect(rows[2]!.errors.join(' ')).toMatch(/serial_to: Give both ends/);
		expect(rows[3]!.errors.join(' ')).toMatch(/carton_from:/);
		expect(rows[4]!.errors.join(' ')).toMatch(
			/serial_to: Both serial numbers need the same length/
		);
	});

	it('needs the named columns', () => {
		const { rows, fileError } = parseLotsCsv('sku,lot\nSLV-PBL-20,L1\n', PRODUCTS);
		expect(rows).toEqual([]);
		expect(fileError).toMatch(/carton_from, carton_to, lot/);
	});
});
