import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { parseExchangeRatesCsv } from './csv-exchange-rates';
import { parseLinesCsv } from './csv-lines';
import { parseLotsCsv } from './csv-lots';
import { lotRowSchema } from './schemas/shipments';

// The CSV imports (lines, lots, exchange rates) are uploads read in the browser: whatever a
// file holds, the preview must come back row by row, never throw, and only pass rows the
// form's own schema accepts. Property-based ("common practice" for parsers); fixed seed.

const PRODUCTS = [{ id: '6f1c2b1e-7d0a-4c1e-9a55-3b7f0e2d9c11', sku: 'SLV-PBL-20' }];

const hostileCell = fc.oneof(
	fc.constantFrom(
		'',
		'SLV-PBL-20',
		'1',
		'21',
		'-1',
		'1e309',
		'NaN',
		'0x10',
		'"quoted, with comma"',
		'"unclosed',
		'a\u0000b',
		'\uD800',
		'<script>window.__pwned=1</script>',
		"'; DROP TABLE shipments;--",
		'=HYPERLINK("http://x")',
		'x'.repeat(5_000),
		'\r\n',
		'PB20-000001',
		'2026-12-01',
		'1.2345'
	),
	fc.string({ maxLength: 12, unit: 'binary' })
);
const header = fc.constantFrom(
	'sku,carton_from,carton_to,lot,serial_from,serial_to',
	'sku,quantity,unit_price',
	'date,base,quote,rate',
	'date,USD,JPY',
	'',
	'sku'
);
const csv = fc
	.tuple(header, fc.array(fc.array(hostileCell, { maxLength: 7 }), { maxLength: 30 }))
	.map(([head, rows]) => [head, ...rows.map((r) => r.join(','))].join('\n'));
const options = { seed: 20261204, numRuns: 300 };

describe('CSV previews of hostile files', () => {
	it('lots: every row is either recorded as the typed form would be, or has errors', () => {
		fc.assert(
			fc.property(csv, (text) => {
				const { rows } = parseLotsCsv(text, PRODUCTS);
				for (const row of rows) {
					expect(row.lot === null).toBe(row.errors.length > 0);
					if (row.lot) expect(lotRowSchema.safeParse(row.lot).success).toBe(true);
				}
			}),
			options
		);
	});

	it('lines: rows keep their spreadsheet numbers and every bad one says why', () => {
		fc.assert(
			fc.property(csv, (text) => {
				const { rows } = parseLinesCsv(text, PRODUCTS);
				rows.forEach((row, i) => expect(row.row).toBe(i + 2));
				for (const row of rows) {
					if (row.quantity === null || row.productId === null) {
						expect(row.errors.length).toBeGreaterThan(0);
					}
				}
			}),
			options
		);
	});

	it('exchange rates: never throws, in either layout', () => {
		fc.assert(
			fc.property(csv, fc.constantFrom('', 'EUR', 'X'), (text, base) => {
				const { rows } = parseExchangeRatesCsv(text, base);
				for (const row of rows) expect(Array.isArray(row.errors)).toBe(true);
			}),
			options
		);
	});
});
