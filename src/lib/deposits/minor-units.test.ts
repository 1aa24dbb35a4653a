import { describe, expect, it } from 'vitest';
import { currencyDigits, formatMinor, fromMinor, percentOfMinor, toMinor } from './minor-units';

// Minor units: ISO 4217:2015 List One as published by SIX, edition 2024-06-25 (shipped in
// currency-codes 2.2.0): JPY 0, EUR and USD 2, KWD and BHD 3 decimals. Stripe takes amounts as
// whole numbers of that minor unit (Stripe API reference, "Currencies" → "Zero-decimal
// currencies", from memory).

describe('ISO 4217 minor units of deposit amounts', () => {
	it.each([
		['JPY', 0],
		['EUR', 2],
		['USD', 2],
		['KWD', 3],
		['BHD', 3]
	])('%s has %i decimals (ISO 4217 List One, 2024-06-25)', (code, digits) => {
		expect(currencyDigits(code)).toBe(digits);
	});

	it('turns typed amounts into whole minor units', () => {
		expect(toMinor('1250.50', 'EUR')).toEqual({ ok: true, minor: 125050n });
		expect(toMinor('1250.5', 'EUR')).toEqual({ ok: true, minor: 125050n });
		expect(toMinor('1250', 'EUR')).toEqual({ ok: true, minor: 125000n });
		expect(toMinor('150000', 'JPY')).toEqual({ ok: true, minor: 150000n });
		expect(toMinor('12.345', 'KWD')).toEqual({ ok: true, minor: 12345n });
		// Beyond 2^53 stays exact.
		expect(toMinor('900719925474099.99', 'USD')).toEqual({ ok: true, minor: 90071992547409999n });
	});

	it('refuses decimals the currency does not have, zero and junk', () => {
		expect(toMinor('10.5', 'JPY')).toMatchObject({ ok: false, message: /no decimals/ });
		expect(toMinor('1.001', 'EUR')).toMatchObject({ ok: false, message: /at most 2/ });
		expect(toMinor('1.0001', 'KWD')).toMatchObject({ ok: false, message: /at most 3/ });
		expect(toMinor('0.00', 'EUR')).toMatchObject({ ok: false });
		expect(toMinor('-5', 'EUR')).toMatchObject({ ok: false });
		expect(toMinor('1,5', 'EUR')).toMatchObject({ ok: false });
		expect(() => toMinor('1', 'XAU')).toThrow(/no ISO 4217 minor unit/);
	});

	it('prints minor units back with exactly the currency decimals', () => {
		expect(fromMinor(125050n, 'EUR')).toBe('1250.50');
		expect(fromMinor(5n, 'EUR')).toBe('0.05');
		expect(fromMinor('150000', 'JPY')).toBe('150000');
		expect(fromMinor(12345n, 'KWD')).toBe('12.345');
		expect(fromMinor(7n, 'KWD')).toBe('0.007');
		expect(formatMinor(123456789n, 'USD')).toBe('USD 1,234,567.89');
		expect(formatMinor(1500000n, 'JPY')).toBe('JPY 1,500,000');
	});

	it('takes a percentage of an estimate, rounded half-up to the minor unit', () => {
		// Rounding half-up to the minor unit: common practice for money amounts.
		expect(percentOfMinor('1234.565', '30', 'EUR')).toBe(37037n); // 370.3695
		expect(percentOfMinor('1000.00', '12.5', 'EUR')).toBe(12500n);
		expect(percentOfMinor('0.10', '5', 'EUR')).toBe(1n); // 0.005 → 0.01
		expect(percentOfMinor('333333', '33.3333', 'JPY')).toBe(111111n); // 111110.9889
		expect(percentOfMinor('10.001', '50', 'KWD')).toBe(5001n); // 5.0005 → 5.001
	});
});
