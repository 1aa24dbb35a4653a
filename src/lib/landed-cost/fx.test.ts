import cc from 'currency-codes';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Context } from './context';
import { dec, digits } from './decimal';
import { Fx } from './fx';
import { rate } from './test-fixtures';

const fxFor = (rates = [rate('USD', 'JPY', '149.857'), rate('USD', 'KWD', '0.30745')]) => {
	const ctx = new Context('2026-03-02');
	return { ctx, fx: new Fx(rates, ctx) };
};

describe('ISO 4217 minor units', () => {
	it('JPY 0 and KWD 3, as in currency-codes (ISO 4217 List One)', () => {
		expect(digits('JPY')).toBe(cc.code('JPY')?.digits);
		expect(digits('KWD')).toBe(cc.code('KWD')?.digits);
		expect([digits('JPY'), digits('KWD'), digits('USD')]).toEqual([0, 3, 2]);
	});
	it('conversions round to the target minor unit, half up (rates invented)', () => {
		const { fx } = fxFor();
		expect(fx.convert(dec('100.00'), 'USD', 'JPY', 'x', 'x').toFixed()).toBe('14986');
		expect(fx.convert(dec('100.01'), 'USD', 'KWD', 'x', 'x').toFixed()).toBe('30.748');
		expect(fx.convert(dec('14986'), 'JPY', 'USD', 'x', 'x').toFixed(2)).toBe('100.00');
	});
	it('states the rate and its date, and reports a missing pair', () => {
		const { fx, ctx } = fxFor();
		fx.convert(dec('1.00'), 'USD', 'JPY', 'g', 'Goods');
		expect(ctx.trail[0]?.formula).toContain('1 USD = 149.857 JPY, rate of 2025-01-01');
		fx.convert(dec('1.00'), 'USD', 'EUR', 'g', 'Goods');
		expect(ctx.missing).toEqual([
			{ path: 'exchangeRates', message: 'no exchange rate USD → EUR for 2026-03-02' }
		]);
	});
});

describe('property: there and back stays within one minor unit', () => {
	// Rounding twice loses at most half a minor unit each way, so the round trip stays within one
	// minor unit of the coarser of the two currencies (expressed in the starting currency).
	const pairs = [
		['USD', 'JPY'],
		['USD', 'KWD'],
		['EUR', 'USD'],
		['JPY', 'KWD']
	] as const;
	it('holds for random amounts and rates', () => {
		fc.assert(
			fc.property(
				fc.constantFrom(...pairs),
				fc.integer({ min: 0, max: 10_000_000_000 }),
				fc.integer({ min: 1, max: 5_000_000 }),
				fc.boolean(),
				([a, b], minorAmount, rateMillis, reverse) => {
					const [from, to] = reverse ? [b, a] : [a, b];
					const { fx, ctx } = fxFor([rate(a, b, dec(rateMillis).dividedBy(10_000).toString())]);
					const x = dec(minorAmount).dividedBy(dec(10).pow(digits(from)));
					const there = fx.convert(x, from, to, 'p', 'p');
					const back = fx.convert(there, to, from, 'p', 'p');
					const unitFrom = dec(10).pow(-digits(from));
					const unitTo = dec(10).pow(-digits(to)).times(fx.quote(to, from)!.factor);
					const tolerance = unitFrom.gt(unitTo) ? unitFrom : unitTo;
					expect(ctx.missing).toEqual([]);
					expect(back.minus(x).abs().lte(tolerance)).toBe(true);
				}
			)
		);
	});
});
