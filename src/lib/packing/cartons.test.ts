import Decimal from 'decimal.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
	countCartons,
	packCartonLines,
	packCartons,
	type CartonLine,
	type CartonLineInput,
	type Packaging
} from './cartons';

const box: Packaging = {
	unitsPerCarton: 24,
	lengthMm: 400,
	widthMm: 300,
	heightMm: 250,
	cartonGrossKg: '13.2',
	orientation: 'this_way_up',
	maxLoadOnTopKg: '120'
};

function pack(quantity: number, packaging: Packaging = box, netKgPerUnit = '0.5'): CartonLine {
	const result = packCartons({ quantity, netKgPerUnit, packaging });
	if (!result.ok) throw new Error(JSON.stringify(result.problems));
	return result.line;
}

describe('one line', () => {
	it('packs full cartons and one remainder carton', () => {
		// 100 units ÷ 24 = 4 full cartons (96 units) + 1 carton of 4 units.
		// Tare = 13.2 − 24 × 0.5 = 1.2 kg; remainder carton = 1.2 + 4 × 0.5 = 3.2 kg.
		// Gross = 4 × 13.2 + 3.2 = 56 kg; net = 100 × 0.5 = 50 kg; volume 5 × 0.03 m³ = 0.15 m³.
		const line = pack(100);
		expect(line).toMatchObject({
			fullCartons: 4,
			remainderUnits: 4,
			cartons: 5,
			firstCarton: 1,
			lastCarton: 5,
			netKg: '50.000',
			grossKg: '56.000',
			volumeM3: '0.150000',
			carton: { tareKg: '1.200', fullGrossKg: '13.200', volumeM3: '0.030000' }
		});
		expect(line.groups).toEqual([
			{
				fromCarton: 1,
				toCarton: 4,
				cartons: 4,
				unitsPerCarton: 24,
				netKgPerCarton: '12.000',
				grossKgPerCarton: '13.200'
			},
			{
				fromCarton: 5,
				toCarton: 5,
				cartons: 1,
				unitsPerCarton: 4,
				netKgPerCarton: '2.000',
				grossKgPerCarton: '3.200'
			}
		]);
	});

	it('has no remainder carton for an exact multiple', () => {
		const line = pack(96);
		expect(line).toMatchObject({ fullCartons: 4, remainderUnits: 0, cartons: 4 });
		expect(line.groups).toHaveLength(1);
		expect(line.grossKg).toBe('52.800');
	});

	it('packs fewer units than a carton holds into one carton', () => {
		const line = pack(7);
		expect(line).toMatchObject({ fullCartons: 0, remainderUnits: 7, cartons: 1 });
		expect(line.groups).toEqual([
			{
				fromCarton: 1,
				toCarton: 1,
				cartons: 1,
				unitsPerCarton: 7,
				netKgPerCarton: '3.500',
				grossKgPerCarton: '4.700'
			}
		]);
	});

	it('keeps small net masses exact', () => {
		// 1000 units × 0.000123 kg = 0.123 kg net, in 10 cartons of 100.
		const line = pack(1000, { ...box, unitsPerCarton: 100, cartonGrossKg: '0.5' }, '0.000123');
		expect(line.netKg).toBe('0.123');
		// tare = 0.5 − 100 × 0.000123 = 0.4877; gross = 10 × 0.4877 + 0.123 = 5.
		expect(line.carton.tareKg).toBe('0.488');
		expect(line.grossKg).toBe('5.000');
	});

	it('allows a zero tare but not a negative one', () => {
		expect(pack(48, { ...box, cartonGrossKg: '12' }).carton.tareKg).toBe('0.000');
		const result = packCartons({
			quantity: 48,
			netKgPerUnit: '0.5',
			packaging: { ...box, cartonGrossKg: '11.999' }
		});
		expect(result.ok).toBe(false);
		if (!result.ok) {
			expect(result.problems).toHaveLength(1);
			expect(result.problems[0]?.path).toBe('packaging.cartonGrossKg');
			expect(result.problems[0]?.message).toMatch(
				/at least the net mass of its 24 units \(12 kg\)/
			);
		}
	});

	it('reports bad fields by path instead of throwing', () => {
		const result = packCartons({
			quantity: 0,
			netKgPerUnit: '-1',
			packaging: { ...box, unitsPerCarton: 2.5, widthMm: 0, maxLoadOnTopKg: 'lots' }
		});
		expect(result.ok).toBe(false);
		if (!result.ok) {
			expect(result.problems.map((p) => p.path).sort()).toEqual([
				'netKgPerUnit',
				'packaging.maxLoadOnTopKg',
				'packaging.unitsPerCarton',
				'packaging.widthMm',
				'quantity'
			]);
		}
	});
});

describe('several lines', () => {
	it('numbers cartons consecutively across lines', () => {
		// Line 1: 960 ÷ 24 = 40 cartons → 1–40. Line 2: 150 ÷ 10 = 15 → 41–55.
		// Line 3: 5 units, 12 per carton → 1 carton → 56.
		const result = packCartonLines([
			{ quantity: 960, netKgPerUnit: '0.5', packaging: box },
			{
				quantity: 150,
				netKgPerUnit: '1',
				packaging: { ...box, unitsPerCarton: 10, cartonGrossKg: '11' }
			},
			{
				quantity: 5,
				netKgPerUnit: '0.25',
				packaging: { ...box, unitsPerCarton: 12, cartonGrossKg: '3.5' }
			}
		]);
		expect(result.ok).toBe(true);
		if (!result.ok) return;
		expect(result.lines.map((l) => [l.firstCarton, l.lastCarton])).toEqual([
			[1, 40],
			[41, 55],
			[56, 56]
		]);
		expect(result.lines[2]?.groups[0]).toMatchObject({
			fromCarton: 56,
			toCarton: 56,
			unitsPerCarton: 5
		});
		// Gross: 40 × 13.2 + 15 × 11 + (3.5 − 12 × 0.25 + 5 × 0.25) = 528 + 165 + 1.75 = 694.75.
		expect(result.totals).toEqual({
			units: 1115,
			cartons: 56,
			netKg: '631.250',
			grossKg: '694.750',
			volumeM3: '1.680000'
		});
	});

	it('prefixes problem paths with the line index', () => {
		const result = packCartonLines([
			{ quantity: 1, netKgPerUnit: '0.5', packaging: box },
			{ quantity: -3, netKgPerUnit: '0.5', packaging: box }
		]);
		expect(result.ok).toBe(false);
		if (!result.ok) expect(result.problems.map((p) => p.path)).toEqual(['1.quantity']);
	});
});

const lineArb: fc.Arbitrary<CartonLineInput> = fc
	.record({
		quantity: fc.integer({ min: 1, max: 100_000 }),
		netKgPerUnit: fc.integer({ min: 1, max: 5000 }).map((g) => new Decimal(g).div(1000).toFixed()),
		packaging: fc.record({
			unitsPerCarton: fc.integer({ min: 1, max: 500 }),
			lengthMm: fc.integer({ min: 50, max: 1200 }),
			widthMm: fc.integer({ min: 50, max: 1000 }),
			heightMm: fc.integer({ min: 50, max: 1000 }),
			cartonGrossKg: fc.constant('0'),
			orientation: fc.constantFrom('any' as const, 'this_way_up' as const),
			maxLoadOnTopKg: fc.constant(null)
		})
	})
	.map((line) => ({
		...line,
		packaging: {
			...line.packaging,
			// Tare 0.3 kg on top of the units, so gross ≥ units × net always holds.
			cartonGrossKg: new Decimal(line.netKgPerUnit)
				.times(line.packaging.unitsPerCarton)
				.plus('0.3')
				.toFixed()
		}
	}));

describe('properties', () => {
	it('conserves units and numbers every carton once', () => {
		fc.assert(
			fc.property(fc.array(lineArb, { minLength: 1, maxLength: 6 }), (inputs) => {
				const result = packCartonLines(inputs);
				expect(result.ok).toBe(true);
				if (!result.ok) return;
				let expectedFirst = 1;
				result.lines.forEach((line, i) => {
					const units = line.groups.reduce((s, g) => s + g.cartons * g.unitsPerCarton, 0);
					expect(units).toBe(inputs[i]?.quantity);
					expect(line.groups.reduce((s, g) => s + g.cartons, 0)).toBe(line.cartons);
					expect(line.firstCarton).toBe(expectedFirst);
					expectedFirst = line.lastCarton + 1;
				});
				expect(result.totals.cartons).toBe(expectedFirst - 1);
				expect(result.totals.units).toBe(inputs.reduce((s, l) => s + l.quantity, 0));
			})
		);
	});

	it('never gives fewer cartons or less gross for more units', () => {
		fc.assert(
			fc.property(lineArb, fc.integer({ min: 1, max: 1000 }), (input, more) => {
				const a = packCartons(input);
				const b = packCartons({ ...input, quantity: input.quantity + more });
				if (!a.ok || !b.ok) throw new Error('unexpected problems');
				expect(b.line.cartons).toBeGreaterThanOrEqual(a.line.cartons);
				expect(new Decimal(b.line.grossKg).gte(a.line.grossKg)).toBe(true);
				const direct = countCartons(input.quantity, input.packaging.unitsPerCarton);
				expect(direct.cartons).toBe(Math.ceil(input.quantity / input.packaging.unitsPerCarton));
			})
		);
	});
});
