import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { allocateLargestRemainder, splitOverUnits } from './allocate';
import { dec } from './decimal';
import { landedCost } from './engine';
import { baseInput, courierCard, line, tariff } from './test-fixtures';
import { COST_KEYS, type LandedCostInput } from './types';

const lineArb = fc.record({
	quantity: fc.integer({ min: 1, max: 500 }),
	cents: fc.integer({ min: 1, max: 2_000_000 }),
	grams: fc.integer({ min: 0, max: 50_000 })
});

function shipment(
	lines: { quantity: number; cents: number; grams: number }[],
	allocation: 'weight' | 'value',
	dutyPercent: string
): LandedCostInput {
	return baseInput({
		allocation,
		lines: lines.map((l, i) =>
			line({
				ref: String(i + 1),
				quantity: l.quantity,
				unitPrice: dec(l.cents).dividedBy(100).toFixed(2),
				grossKg: dec(l.grams).dividedBy(1000).toFixed(3)
			})
		),
		rateCard: courierCard({ firstHalfKg: '33.33', additionalHalfKg: '7.77' }),
		tariffRows: [tariff('8518', dutyPercent)],
		insurance: { ratePercent: '0.35', upliftPercent: '10', minimumPremium: null, source: 'test' },
		brokerage: [{ label: 'Entry', basis: 'per_shipment', amount: '95.00', currency: 'AUD' }]
	});
}

describe('property tests', () => {
	it('largest remainder: shares add up exactly to the total', () => {
		fc.assert(
			fc.property(
				fc.integer({ min: 0, max: 100_000_000 }),
				fc.array(fc.integer({ min: 0, max: 1_000_000 }), { minLength: 1, maxLength: 40 }),
				fc.constantFrom(0, 2, 3),
				(units, weights, minor) => {
					const total = dec(units).dividedBy(dec(10).pow(minor));
					const shares = allocateLargestRemainder(total, weights.map(dec), minor);
					expect(shares.reduce((s, x) => s.plus(x), dec(0)).eq(total)).toBe(true);
					expect(shares.every((s) => s.gte(0) && s.decimalPlaces() <= minor)).toBe(true);
				}
			)
		);
	});

	it('per-line shares and per-unit amounts add back to every total to the minor unit', () => {
		fc.assert(
			fc.property(
				fc.array(lineArb, { minLength: 1, maxLength: 12 }),
				fc.constantFrom('weight' as const, 'value' as const),
				(lines, allocation) => {
					const r = landedCost(shipment(lines, allocation, '5'));
					if (!r.ok) throw new Error(JSON.stringify(r.missing));
					for (const key of COST_KEYS) {
						const sum = r.perLine.reduce((s, l) => s.plus(l.shares[key]), dec(0));
						expect(sum.toFixed(2)).toBe(r.components[key].amount);
					}
					const units = r.perLine.flatMap((l) =>
						l.perUnit.map((u) => dec(u.amount).times(u.units))
					);
					expect(units.reduce((s, x) => s.plus(x), dec(0)).toFixed(2)).toBe(r.total.amount);
					for (const l of r.perLine) {
						expect(l.perUnit.reduce((s, u) => s + u.units, 0)).toBe(l.quantity);
					}
				}
			),
			{ numRuns: 60 }
		);
	});

	it('a higher duty rate never lowers the landed cost', () => {
		fc.assert(
			fc.property(
				fc.array(lineArb, { minLength: 1, maxLength: 6 }),
				fc.integer({ min: 0, max: 4000 }),
				fc.integer({ min: 0, max: 4000 }),
				(lines, a, b) => {
					const [lo, hi] = a <= b ? [a, b] : [b, a];
					const pct = (n: number) => dec(n).dividedBy(100).toString();
					const low = landedCost(shipment(lines, 'value', pct(lo)));
					const high = landedCost(shipment(lines, 'value', pct(hi)));
					if (!low.ok || !high.ok) throw new Error('unexpected failure');
					expect(dec(high.total.amount).gte(low.total.amount)).toBe(true);
					expect(dec(high.components.duty.amount).gte(low.components.duty.amount)).toBe(true);
				}
			),
			{ numRuns: 60 }
		);
	});

	it('a line split over its units adds back exactly', () => {
		fc.assert(
			fc.property(
				fc.integer({ min: 0, max: 10_000_000 }),
				fc.integer({ min: 1, max: 9999 }),
				(c, n) => {
					const total = dec(c).dividedBy(100);
					const split = splitOverUnits(total, n, 2);
					expect(split.reduce((s, u) => s.plus(u.amount.times(u.units)), dec(0)).eq(total)).toBe(
						true
					);
				}
			)
		);
	});
});
