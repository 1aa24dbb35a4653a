import cc from 'currency-codes';
import { describe, expect, it } from 'vitest';
import {
	formatAmount,
	formatCount,
	formatDims,
	formatFixed,
	formatKg,
	formatM3,
	pageLabel
} from './format';

// Minor units: ISO 4217 List One (SIX Group for ISO, edition 2024-06-25), as shipped in
// currency-codes 2.2.0 (`cc.code(code).digits`): JPY 0, EUR 2, KWD 3.
const digits = (code: string) => cc.code(code)!.digits;

describe('formatAmount', () => {
	it('groups thousands and pads to the minor units', () => {
		expect(formatAmount('1234567.5', 2)).toBe('1,234,567.50');
		expect(formatAmount('0', 2)).toBe('0.00');
		expect(formatAmount('999', 2)).toBe('999.00');
		expect(formatAmount('1000', 2)).toBe('1,000.00');
		expect(formatAmount('-1234.5', 2)).toBe('-1,234.50');
		expect(formatAmount('-0.00', 2)).toBe('0.00');
		expect(formatAmount('007.1', 2)).toBe('7.10');
	});

	it('prints JPY with 0, EUR with 2 and KWD with 3 decimals (ISO 4217 via currency-codes)', () => {
		expect(digits('JPY')).toBe(0);
		expect(digits('EUR')).toBe(2);
		expect(digits('KWD')).toBe(3);
		expect(formatAmount('1234567', digits('JPY'))).toBe('1,234,567');
		expect(formatAmount('1234567.8', digits('EUR'))).toBe('1,234,567.80');
		expect(formatAmount('1234.5', digits('KWD'))).toBe('1,234.500');
		expect(formatAmount('12.345', digits('KWD'))).toBe('12.345');
	});

	it('throws rather than round a value with too many decimals', () => {
		expect(() => formatAmount('12.345', digits('EUR'))).toThrow(/rounded before printing/);
		expect(() => formatAmount('1235.5', digits('JPY'))).toThrow(/rounded before printing/);
		expect(() => formatAmount('1.2345', digits('KWD'))).toThrow(/rounded before printing/);
	});

	it('throws on what is not a decimal string', () => {
		for (const bad of ['', '1,000.00', '1e3', '12.', '.5', ' 1', 'NaN', '+1']) {
			expect(() => formatAmount(bad, 2), bad).toThrow(/not a decimal number/);
		}
		expect(() => formatFixed('1', -1)).toThrow(RangeError);
		expect(() => formatFixed('1', 1.5)).toThrow(RangeError);
	});
});

describe('masses, volumes, dimensions, counts and pages', () => {
	it('prints kilograms and cubic metres with 3 decimals', () => {
		expect(formatKg('1234.5')).toBe('1,234.500');
		expect(formatKg('0.042')).toBe('0.042');
		expect(() => formatKg('0.0425')).toThrow(/mass/);
		expect(formatM3('2.4')).toBe('2.400');
		expect(formatM3('33')).toBe('33.000');
	});

	it('prints dimensions in whole millimetres', () => {
		expect(formatDims(600, 400, 300)).toBe('600 × 400 × 300');
		expect(() => formatDims(600.5, 400, 300)).toThrow(/whole millimetres/);
		expect(() => formatDims(-1, 400, 300)).toThrow(/whole millimetres/);
	});

	it('prints counts and page labels', () => {
		expect(formatCount(12500)).toBe('12,500');
		expect(formatCount(7)).toBe('7');
		expect(() => formatCount(1.5)).toThrow(/whole number/);
		expect(pageLabel(2, 7)).toBe('Page 2 of 7');
	});
});
