// Checked against decimal.js (MikeMcl/decimal.js, v10), the reference library the rest of the
// packing module computes with: every fast result must equal its decimal.js result exactly.
import Decimal from 'decimal.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
	mgOfKg,
	wholeEquals,
	wholeFixed,
	wholeFloorDiv,
	wholeLessThan,
	wholeMinus,
	wholePlain,
	wholePlus,
	wholeProductOf,
	wholeTimes,
	wholeToDecimal
} from './whole-units';

const D = Decimal.clone({ precision: 80, toExpPos: 80, toExpNeg: -80 });
const kgString = fc
	.tuple(fc.integer({ min: 0, max: 999_999_999 }), fc.option(fc.stringMatching(/^[0-9]{1,6}$/)))
	.map(([whole, fraction]) => (fraction === null ? String(whole) : `${whole}.${fraction}`));
// Around 2^53, where the number branch must hand over to decimal.js.
const big = fc.oneof(
	fc.integer({ min: 0, max: 1_000_000 }),
	fc.maxSafeNat(),
	fc.integer({ min: Number.MAX_SAFE_INTEGER - 1000, max: Number.MAX_SAFE_INTEGER })
);
const str = (w: number | Decimal) => new D(w).toFixed();

describe('mgOfKg', () => {
	it('reads kilograms with up to 6 decimals as whole milligrams', () => {
		expect(mgOfKg('12.5')).toBe(12_500_000);
		expect(mgOfKg('0.000001')).toBe(1);
		expect(mgOfKg('999999999.999999')).toBe(999_999_999_999_999);
		fc.assert(
			fc.property(kgString, (kg) => {
				const mg = mgOfKg(kg);
				expect(typeof mg).toBe('number');
				expect(str(mg)).toBe(new D(kg).times(1e6).toFixed());
			})
		);
	});

	it('falls back to decimal.js beyond 6 decimals', () => {
		expect(str(mgOfKg('1.0000005'))).toBe('1000000.5');
	});
});

describe('whole arithmetic', () => {
	it('equals decimal.js, also past 2^53', () => {
		fc.assert(
			fc.property(big, big, (a, b) => {
				expect(str(wholeTimes(a, b))).toBe(new D(a).times(b).toFixed());
				expect(str(wholePlus(a, b))).toBe(new D(a).plus(b).toFixed());
				expect(str(wholeMinus(a, b))).toBe(new D(a).minus(b).toFixed());
				expect(str(wholePlus(wholeTimes(a, b), a))).toBe(new D(a).times(b).plus(a).toFixed());
				expect(wholeEquals(wholeTimes(a, b), new D(a).times(b))).toBe(true);
				expect(wholeLessThan(a, b)).toBe(a < b);
				expect(wholeLessThan(wholeTimes(a, 3), wholeTimes(b, 3))).toBe(a < b);
			})
		);
	});

	it('divides to whole numbers like decimal.js dividedBy().floor()', () => {
		expect(wholeFloorDiv(1_500_000_000, 13_200_000)).toBe(113);
		expect(wholeFloorDiv(26_400_000, 13_200_000)).toBe(2);
		fc.assert(
			fc.property(big, big, (a, b) => {
				fc.pre(b > 0);
				expect(wholeFloorDiv(a, b)).toBe(new D(a).dividedBy(b).floor().toNumber());
			})
		);
		expect(wholeFloorDiv(wholeTimes(Number.MAX_SAFE_INTEGER, 4), 2)).toBe(
			2 * Number.MAX_SAFE_INTEGER
		);
	});

	it('hands over to decimal.js when a result is no longer a safe integer', () => {
		const product = wholeTimes(Number.MAX_SAFE_INTEGER, 3);
		expect(product).toBeInstanceOf(Decimal);
		expect(str(product)).toBe('27021597764222973');
		expect(str(wholePlus(Number.MAX_SAFE_INTEGER, 1))).toBe('9007199254740992');
		expect(str(wholeProductOf(100_000, 100_000, 100_000, 1_000_000_000))).toBe(
			'1' + '0'.repeat(24)
		);
	});
});

describe('wholeFixed and wholePlain', () => {
	it('round half up like decimal.js toFixed', () => {
		expect(wholeFixed(5_119_499, 6, 3)).toBe('5.119');
		expect(wholeFixed(5_119_500, 6, 3)).toBe('5.120');
		expect(wholeFixed(0, 6, 3)).toBe('0.000');
		expect(wholeFixed(26_345_472, 9, 6)).toBe('0.026345');
		expect(wholePlain(980_000, 6)).toBe('0.98');
		expect(wholePlain(0, 6)).toBe('0');
		expect(wholePlain(5_000_000, 6)).toBe('5');
		for (const [shift, dp] of [
			[6, 3],
			[9, 6],
			[6, 6],
			[3, 1]
		] as const) {
			fc.assert(
				fc.property(big, (w) => {
					const exact = new D(w).times(new D(10).pow(-shift));
					expect(wholeFixed(w, shift, dp)).toBe(exact.toFixed(dp, Decimal.ROUND_HALF_UP));
					expect(wholePlain(w, shift)).toBe(exact.toFixed());
					expect(wholeToDecimal(w, shift).equals(exact)).toBe(true);
				})
			);
		}
	});

	it('format decimal.js values past 2^53 the same way', () => {
		const w = wholeTimes(Number.MAX_SAFE_INTEGER, 1000);
		expect(wholeFixed(w, 6, 3)).toBe('9007199254740.991');
		expect(wholePlain(w, 6)).toBe('9007199254740.991');
	});
});
