// measure() trusts measureInputSchema's own output without validating it again: that output must
// be frozen (so it is still what the schema accepted) and give the same result as a plain copy.
import { describe, expect, it } from 'vitest';
import { measure } from './measure';
import { isValidatedMeasureInput, measureInputSchema, type MeasureInput } from './schema';

const input = (): MeasureInput => ({
	products: [
		{
			sku: 'RTR',
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
		}
	],
	lines: [{ sku: 'RTR', quantity: 100 }],
	pallet: {
		lengthMm: 1200,
		widthMm: 800,
		deckHeightMm: 144,
		tareKg: '25',
		maxGrossKg: '1525',
		maxLoadedHeightMm: 1800
	}
});

describe('measureInputSchema output', () => {
	it('is marked and deeply frozen, and measures like a plain copy', () => {
		const parsed = measureInputSchema.parse(input());
		expect(isValidatedMeasureInput(parsed)).toBe(true);
		expect(Object.isFrozen(parsed)).toBe(true);
		expect(Object.isFrozen(parsed.lines[0])).toBe(true);
		expect(Object.isFrozen(parsed.products[0]?.packaging)).toBe(true);
		expect(Object.isFrozen(parsed.pallet)).toBe(true);
		expect(() => {
			(parsed.lines[0] as { quantity: number }).quantity = 0;
		}).toThrow(TypeError);
		const copy = structuredClone(parsed);
		expect(isValidatedMeasureInput(copy)).toBe(false);
		expect(measure(parsed)).toEqual(measure(copy));
	});

	it('is not marked when the schema refuses it, nor is the caller’s own object', () => {
		const own = input();
		measureInputSchema.parse(own);
		expect(isValidatedMeasureInput(own)).toBe(false);
		expect(Object.isFrozen(own)).toBe(false);
		const bad = { ...input(), lines: [{ sku: 'NONE', quantity: 1 }] };
		expect(measureInputSchema.safeParse(bad).success).toBe(false);
		const result = measure(bad);
		expect(result.ok).toBe(false);
		expect(result.problems[0]?.path).toBe('lines.0.sku');
	});
});
