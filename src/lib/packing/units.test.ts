import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
	KG_PER_POUND,
	MM_PER_INCH,
	M_PER_FOOT,
	formatLength,
	formatMass,
	formatVolume,
	ft3ToM3,
	inchesToMm,
	kgToLb,
	lbToKg,
	m3ToFt3,
	mmToInches
} from './units';

/** A non-negative decimal string with up to 6 decimals. */
const decimalString = fc
	.tuple(fc.integer({ min: 0, max: 10_000_000 }), fc.integer({ min: 0, max: 999_999 }))
	.map(([whole, fraction]) => `${whole}.${String(fraction).padStart(6, '0')}`);

describe('exact factors: NIST SP 811 (2008), Appendix B.8, and the 1959 international yard and pound (from memory)', () => {
	it('defines 1 in = 25.4 mm, 1 ft = 0.3048 m, 1 lb = 0.45359237 kg', () => {
		// NIST SP 811, B.8: inch = 2.54 E−02 m (exact); foot = 3.048 E−01 m (exact);
		// pound (avoirdupois) = 4.535 923 7 E−01 kg (exact). From memory.
		expect(MM_PER_INCH).toBe('25.4');
		expect(M_PER_FOOT).toBe('0.3048');
		expect(KG_PER_POUND).toBe('0.45359237');
		expect(inchesToMm('1').toFixed()).toBe('25.4');
		expect(lbToKg('1').toFixed()).toBe('0.45359237');
	});

	it('gives the ISO 6780 inch pallet footprint 48 × 40 in exactly', () => {
		// ISO 6780:2003, Table 1: 1219 × 1016 mm for the 48 × 40 in pallet (from memory).
		expect(inchesToMm('48').toFixed()).toBe('1219.2');
		expect(inchesToMm('40').toFixed()).toBe('1016');
	});

	it('gives the cubic foot as 0.3048³ = 0.028316846592 m³ exactly', () => {
		// NIST SP 811, B.8 lists cubic foot = 2.831 685 E−02 m³ (rounded; from memory); the cube of
		// the exact foot is 0.028316846592.
		expect(ft3ToM3('1').toFixed()).toBe('0.028316846592');
		expect(m3ToFt3('1').toFixed(6)).toBe('35.314667');
	});

	it('converts back: 1 kg = 2.20462262… lb, 1200 mm = 47.244094… in', () => {
		// NIST SP 811, B.9 (by quantity): kilogram = 2.204 623 lb (from memory).
		expect(kgToLb('1').toFixed(8)).toBe('2.20462262');
		expect(mmToInches(1200).toFixed(6)).toBe('47.244094');
		expect(kgToLb(KG_PER_POUND).toFixed()).toBe('1');
		expect(mmToInches('25.4').toFixed()).toBe('1');
	});

	it('round-trips exactly (multiplication by an exact factor, then division by it)', () => {
		fc.assert(
			fc.property(decimalString, (value) => {
				expect(mmToInches(inchesToMm(value)).equals(value)).toBe(true);
				expect(kgToLb(lbToKg(value)).equals(value)).toBe(true);
				expect(m3ToFt3(ft3ToM3(value)).equals(value)).toBe(true);
			})
		);
	});

	it('refuses fractional JS numbers (floats are not exact) but takes whole numbers', () => {
		expect(() => inchesToMm(0.1)).toThrow(RangeError);
		expect(inchesToMm(2).toFixed()).toBe('50.8');
	});
});

describe('display formatting (display only)', () => {
	it('formats lengths', () => {
		expect(formatLength(1200, 'metric')).toBe('1200 mm');
		expect(formatLength(1200, 'imperial')).toBe('47.24 in');
		expect(formatLength(1016, 'imperial', { decimals: 0 })).toBe('40 in');
	});

	it('formats masses', () => {
		expect(formatMass('12.5', 'metric')).toBe('12.500 kg');
		expect(formatMass('1', 'imperial')).toBe('2.20 lb');
		expect(formatMass(KG_PER_POUND, 'imperial')).toBe('1.00 lb');
		expect(formatMass('1525', 'imperial', { decimals: 1 })).toBe('3362.0 lb');
	});

	it('formats volumes in m³ or ft³', () => {
		expect(formatVolume('1.728', 'metric')).toBe('1.728 m³');
		expect(formatVolume('1', 'imperial')).toBe('35.31 ft³');
		expect(formatVolume('0.028316846592', 'imperial')).toBe('1.00 ft³');
	});

	it('rounds half up', () => {
		expect(formatMass('0.0005', 'metric')).toBe('0.001 kg');
		expect(formatLength('0.5', 'metric')).toBe('1 mm');
	});
});
