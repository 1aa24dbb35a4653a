import cc from 'currency-codes';
import { describe, expect, it } from 'vitest';
import { documentNumber, lineAmount, revisionLetter, roundMoney, sumMoney } from './money';

describe('invoice money', () => {
	// Minor units from ISO 4217 List One (SIX, the maintenance agency), read through
	// currency-codes as the reference library: JPY 0, EUR 2, KWD 3.
	const digits = (code: string) => cc.code(code)!.digits;

	it('rounds to the minor unit of each currency, half up', () => {
		expect(digits('JPY')).toBe(0);
		expect(digits('KWD')).toBe(3);
		expect(roundMoney('1234.5', digits('JPY'))).toBe('1235');
		expect(roundMoney('2.0005', digits('KWD'))).toBe('2.001');
		expect(roundMoney('2.0004', digits('KWD'))).toBe('2.000');
		expect(roundMoney('10.125', digits('EUR'))).toBe('10.13');
		expect(roundMoney('10', digits('EUR'))).toBe('10.00');
	});

	it('computes line amounts exactly, where binary floats would not', () => {
		// 0.1 × 3 is 0.30000000000000004 in IEEE 754 doubles.
		expect(lineAmount(3, '0.1000', 2)).toBe('0.30');
		expect(lineAmount(1000, '12.3456', 2)).toBe('12345.60');
		expect(lineAmount(7, '1.0050', 2)).toBe('7.04'); // 7.035 → 7.04
		expect(lineAmount(3, '333.3333', 0)).toBe('1000');
		expect(() => lineAmount(1.5, '1', 2)).toThrow(RangeError);
	});

	it('sums rounded amounts exactly', () => {
		expect(sumMoney(['0.10', '0.20', '0.30'], 2)).toBe('0.60');
		expect(sumMoney([], 3)).toBe('0.000');
	});

	it('letters revisions A…Z, AA…', () => {
		expect([0, 1, 25, 26, 27, 51, 52].map(revisionLetter)).toEqual([
			'A',
			'B',
			'Z',
			'AA',
			'AB',
			'AZ',
			'BA'
		]);
	});

	it('numbers documents per prefix and year', () => {
		expect(documentNumber('CI', 2026, 17)).toBe('CI-2026-00017');
	});
});
