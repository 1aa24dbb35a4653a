import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { measureInputSchema, measureResultSchema, type MeasureInput } from './schema';

const valid = (): MeasureInput => ({
	products: [
		{
			sku: 'LF-RTR-01',
			netKgPerUnit: '0.5',
			packaging: {
				unitsPerCarton: 24,
				lengthMm: 400,
				widthMm: 300,
				heightMm: 250,
				cartonGrossKg: '13.2',
				orientation: 'this_way_up',
				maxLoadOnTopKg: '120'
			}
		},
		{ sku: 'LF-CBL-02', netKgPerUnit: '0.1', packaging: null }
	],
	lines: [{ sku: 'LF-RTR-01', quantity: 100 }],
	pallet: {
		lengthMm: 1200,
		widthMm: 800,
		deckHeightMm: 144,
		tareKg: '25',
		maxGrossKg: '1525',
		maxLoadedHeightMm: 1800
	}
});

function paths(input: unknown): string[] {
	const result = measureInputSchema.safeParse(input);
	if (result.success) return [];
	return result.error.issues.map((i) => i.path.map(String).join('.')).sort();
}

function withProduct(change: (p: Record<string, unknown>) => void): unknown {
	const input = structuredClone(valid()) as unknown as { products: Record<string, unknown>[] };
	const first = input.products[0];
	if (first === undefined) throw new Error('no product');
	change(first);
	return input;
}

function withPackaging(change: Record<string, unknown>): unknown {
	return withProduct((p) => {
		p.packaging = { ...(p.packaging as object), ...change };
	});
}

describe('measureInputSchema', () => {
	it('accepts a valid shipment (an unused product may lack packaging)', () => {
		expect(paths(valid())).toEqual([]);
		expect(paths({ ...valid(), pallet: undefined })).toEqual([]);
	});

	it('rejects zero, negative and fractional quantities', () => {
		for (const quantity of [0, -3, 2.5, '5', null]) {
			expect(
				paths({ ...valid(), lines: [{ sku: 'LF-RTR-01', quantity }] }),
				String(quantity)
			).toEqual(['lines.0.quantity']);
		}
	});

	it('rejects an unknown SKU', () => {
		const input = { ...valid(), lines: [...valid().lines, { sku: 'NOPE', quantity: 1 }] };
		const result = measureInputSchema.safeParse(input);
		expect(result.success).toBe(false);
		expect(result.error?.issues).toEqual([
			expect.objectContaining({
				path: ['lines', 1, 'sku'],
				message: 'No product with SKU “NOPE” in products.'
			})
		]);
	});

	it('rejects a line whose product has no packaging, at the product’s packaging', () => {
		const lines = [
			{ sku: 'LF-CBL-02', quantity: 10 },
			{ sku: 'LF-RTR-01', quantity: 1 },
			{ sku: 'LF-CBL-02', quantity: 5 }
		];
		const result = measureInputSchema.safeParse({ ...valid(), lines });
		expect(result.error?.issues.map((i) => [i.path.join('.'), i.message])).toEqual([
			[
				'products.1.packaging',
				'Product “LF-CBL-02” has no packaging (units per carton, carton size and gross), needed by lines 1, 3.'
			]
		]);
		// A missing packaging key counts the same as null.
		const input = {
			...valid(),
			lines,
			products: [valid().products[0], { sku: 'LF-CBL-02', netKgPerUnit: '1' }]
		};
		expect(paths(input)).toEqual(['products.1.packaging']);
	});

	it('rejects a full-carton gross below the units’ net mass', () => {
		// 24 × 0.5 = 12 kg of units in an 11.9 kg carton.
		const result = measureInputSchema.safeParse(withPackaging({ cartonGrossKg: '11.9' }));
		expect(result.error?.issues.map((i) => [i.path.join('.'), i.message])).toEqual([
			[
				'products.0.packaging.cartonGrossKg',
				'A full carton’s gross (11.9 kg) must be at least the net mass of its 24 units (12 kg).'
			]
		]);
	});

	it('rejects dimensions of 0 or less, and fractions of a millimetre', () => {
		expect(paths(withPackaging({ lengthMm: 0 }))).toEqual(['products.0.packaging.lengthMm']);
		expect(paths(withPackaging({ widthMm: -400 }))).toEqual(['products.0.packaging.widthMm']);
		expect(paths(withPackaging({ heightMm: 250.5 }))).toEqual(['products.0.packaging.heightMm']);
		expect(paths({ ...valid(), pallet: { ...valid().pallet, lengthMm: 0 } })).toEqual([
			'pallet.lengthMm'
		]);
	});

	it('rejects masses given as JS numbers, with signs or exponents, and zero gross', () => {
		expect(paths(withPackaging({ cartonGrossKg: 13.2 }))).toEqual([
			'products.0.packaging.cartonGrossKg'
		]);
		expect(paths(withPackaging({ cartonGrossKg: '1e2' }))).toEqual([
			'products.0.packaging.cartonGrossKg'
		]);
		expect(paths(withPackaging({ maxLoadOnTopKg: '-5' }))).toEqual([
			'products.0.packaging.maxLoadOnTopKg'
		]);
		expect(paths(withProduct((p) => (p.netKgPerUnit = '0')))).toEqual(['products.0.netKgPerUnit']);
		expect(paths(withProduct((p) => (p.netKgPerUnit = '0.0000001')))).toEqual([
			'products.0.netKgPerUnit'
		]);
	});

	it('rejects duplicate SKUs and inconsistent pallets', () => {
		const input = valid();
		const first = input.products[0];
		if (first === undefined) throw new Error('no product');
		expect(paths({ ...input, products: [first, first] })).toEqual(['products.1.sku']);
		expect(paths({ ...input, pallet: { ...input.pallet, maxLoadedHeightMm: 144 } })).toEqual([
			'pallet.maxLoadedHeightMm'
		]);
		expect(paths({ ...input, pallet: { ...input.pallet, maxGrossKg: '25' } })).toEqual([
			'pallet.maxGrossKg'
		]);
	});

	it('requires at least one line', () => {
		expect(paths({ ...valid(), lines: [] })).toEqual(['lines']);
	});

	it('reports range, format and cross-field problems together', () => {
		const input = withPackaging({ lengthMm: 0, cartonGrossKg: '11' }) as MeasureInput;
		input.lines = [
			{ sku: 'LF-RTR-01', quantity: 0 },
			{ sku: 'ghost', quantity: 1 }
		];
		expect(paths(input)).toEqual([
			'lines.0.quantity',
			'lines.1.sku',
			'products.0.packaging.cartonGrossKg',
			'products.0.packaging.lengthMm'
		]);
	});

	it('reports a wrong type or a fraction first, before cross-field checks (zod aborts on them)', () => {
		const input = valid();
		input.lines = [
			{ sku: 'LF-RTR-01', quantity: 1.5 },
			{ sku: 'ghost', quantity: 1 }
		];
		expect(paths(input)).toEqual(['lines.0.quantity']);
	});

	it('survives garbage without throwing', () => {
		for (const input of [null, 42, 'x', [], { products: 'no', lines: [null, 3] }]) {
			expect(measureInputSchema.safeParse(input).success).toBe(false);
		}
	});
});

describe('OpenAPI generation', () => {
	it('turns the input schema into JSON Schema with the field descriptions', () => {
		const json = z.toJSONSchema(measureInputSchema, { io: 'input' });
		const text = JSON.stringify(json);
		expect(text).toContain('Gross mass of one FULL carton');
		expect(text).toContain('Whole millimetres');
		expect(text).toContain('"type":"integer"');
	});

	it('turns the result schema into JSON Schema', () => {
		expect(() => z.toJSONSchema(measureResultSchema)).not.toThrow();
	});
});
