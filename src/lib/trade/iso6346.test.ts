import fc from 'fast-check';
import { describe, it, expect } from 'vitest';
import {
	CHECK_DIGIT_LETTER_VALUES,
	EQUIPMENT_CATEGORIES,
	EQUIPMENT_CATEGORY_LABELS,
	containerCheckDigit,
	formatContainerNumber,
	isContainerNumber,
	isEquipmentCategory,
	normalizeContainerInput,
	parseContainerNumber,
	validateContainerNumber
} from './iso6346';

function messageOf(input: string): string {
	const result = validateContainerNumber(input);
	if (result.ok) throw new Error(`expected "${input}" to be invalid`);
	return result.message;
}

describe('check digit letter values', () => {
	it('follows the rule: A = 10, counting up, skipping multiples of 11', () => {
		// ISO 6346:1995, Annex A, table of equivalent values (from memory): the values 11, 22
		// and 33 are left out so that no letter is worth a multiple of the modulus.
		const expected: Record<string, number> = {};
		let value = 10;
		for (const letter of 'ABCDEFGHIJKLMNOPQRSTUVWXYZ') {
			if (value % 11 === 0) value += 1;
			expected[letter] = value;
			value += 1;
		}
		expect(CHECK_DIGIT_LETTER_VALUES).toEqual(expected);
	});

	it('has the anchor values', () => {
		// ISO 6346:1995, Annex A (from memory).
		expect(CHECK_DIGIT_LETTER_VALUES).toMatchObject({
			A: 10,
			B: 12,
			C: 13,
			K: 21,
			L: 23,
			U: 32,
			V: 34,
			Z: 38
		});
	});
});

describe('containerCheckDigit', () => {
	it('computes the ISO 6346 Annex A worked example CSQU 305438 3', () => {
		// ISO 6346:1995, Annex A, worked example, as commonly reproduced (from memory):
		// C S Q U 3 0 5 4 3 8 → 13 30 28 32 3 0 5 4 3 8
		// × 1 2 4 8 16 32 64 128 256 512
		// = 13 + 60 + 112 + 256 + 48 + 0 + 320 + 512 + 768 + 4096 = 6185
		// 6185 = 11 × 562 + 3 → check digit 3.
		expect(containerCheckDigit('CSQU305438')).toBe(3);
	});

	it.each([
		// Computed by hand with the Annex A method (owner codes invented, not BIC registrations):
		// L D F U 1 2 3 4 5 6 → 23 14 16 32 1 2 3 4 5 6
		// 23 + 28 + 64 + 256 + 16 + 64 + 192 + 512 + 1280 + 3072 = 5507 = 11 × 500 + 7 → 7
		['LDFU123456', 7],
		// L D F J 0 0 0 0 0 1 → 23 14 16 20 0 0 0 0 0 1
		// 23 + 28 + 64 + 160 + 512 = 787 = 11 × 71 + 6 → 6
		['LDFJ000001', 6],
		// L D F Z 9 8 7 6 5 4 → 23 14 16 38 9 8 7 6 5 4
		// 23 + 28 + 64 + 304 + 144 + 256 + 448 + 768 + 1280 + 2048 = 5363 = 11 × 487 + 6 → 6
		['LDFZ987654', 6],
		// A B C U 0 0 0 0 0 0 → 10 12 13 32 → 10 + 24 + 52 + 256 = 342 = 11 × 31 + 1 → 1
		['ABCU000000', 1],
		// A B C U 0 0 0 0 0 7 → 342 + 7 × 512 = 3926 = 11 × 356 + 10 → remainder 10 gives 0
		['ABCU000007', 0]
	])('%s → %i', (prefix, digit) => {
		expect(containerCheckDigit(prefix)).toBe(digit);
	});

	it('accepts separators and lower case', () => {
		expect(containerCheckDigit('csqu 305438')).toBe(3);
		expect(containerCheckDigit('CSQU-305438')).toBe(3);
	});

	it.each(['CSQU30543', 'CSQU3054383', 'CSQ1305438', '1SQU305438', ''])(
		'refuses a malformed prefix %j',
		(prefix) => {
			expect(() => containerCheckDigit(prefix)).toThrow(RangeError);
		}
	);
});

describe('validateContainerNumber', () => {
	it('accepts the worked example in any common spelling', () => {
		for (const input of ['CSQU3054383', 'CSQU 305438 3', 'csqu-305438-3', ' CSQU 3054383 ']) {
			expect(validateContainerNumber(input)).toEqual({
				ok: true,
				ownerCode: 'CSQ',
				category: 'U',
				serial: '305438',
				checkDigit: '3',
				normalized: 'CSQU3054383',
				formatted: 'CSQU 305438 3'
			});
		}
	});

	it('accepts the J and Z categories and a check digit of 0', () => {
		// Check digits computed above.
		expect(validateContainerNumber('LDFJ 000001 6').ok).toBe(true);
		expect(validateContainerNumber('LDFZ 987654 6').ok).toBe(true);
		expect(validateContainerNumber('ABCU 000007 0').ok).toBe(true);
	});

	it('says when the check digit is wrong, and what it should be', () => {
		expect(messageOf('CSQU3054384')).toBe('The check digit should be 3, not 4.');
		expect(messageOf('ABCU0000071')).toContain('should be 0, not 1');
	});

	it('gives a specific message for each kind of mistake', () => {
		expect(messageOf('')).toContain('Enter a container number');
		expect(messageOf('   ')).toContain('Enter a container number');
		expect(messageOf('CSQU305438')).toContain('11 characters');
		expect(messageOf('CSQU305438')).toContain('this has 10');
		expect(messageOf('CSQU30543833')).toContain('this has 12');
		expect(messageOf('CSQU/305438/3')).toContain('only letters and digits');
		expect(messageOf('C5QU3054383')).toContain('owner code');
		expect(messageOf('CSQX3054383')).toContain('must be U, J or Z, not "X"');
		expect(messageOf('CSQ13054383')).toContain('must be U, J or Z');
		expect(messageOf('CSQU30543O3')).toContain('serial number');
		expect(messageOf('CSQU305438X')).toContain('check digit and must be a digit');
	});
});

describe('parse, format and guard helpers', () => {
	it('parses a valid number into its parts', () => {
		expect(parseContainerNumber('csqu 305438 3')).toEqual({
			ownerCode: 'CSQ',
			category: 'U',
			serial: '305438',
			checkDigit: '3',
			normalized: 'CSQU3054383',
			formatted: 'CSQU 305438 3'
		});
		expect(parseContainerNumber('CSQU3054384')).toBeUndefined();
	});

	it('formats valid numbers and leaves others alone', () => {
		expect(formatContainerNumber('csqu3054383')).toBe('CSQU 305438 3');
		expect(formatContainerNumber(' not a number ')).toBe('not a number');
		expect(isContainerNumber('CSQU 305438 3')).toBe(true);
		expect(isContainerNumber('CSQU 305438 4')).toBe(false);
		expect(normalizeContainerInput(' ab-c d ')).toBe('ABCD');
	});

	it('labels each equipment category', () => {
		for (const category of EQUIPMENT_CATEGORIES) {
			expect(EQUIPMENT_CATEGORY_LABELS[category].length).toBeGreaterThan(0);
			expect(isEquipmentCategory(category)).toBe(true);
		}
		expect(isEquipmentCategory('u')).toBe(false);
		expect(isEquipmentCategory('X')).toBe(false);
	});
});

describe('properties', () => {
	const prefix = fc.stringMatching(/^[A-Z]{3}[UJZ][0-9]{6}$/);

	it('appending the computed digit validates; any other digit fails', () => {
		fc.assert(
			fc.property(prefix, (first10) => {
				const digit = containerCheckDigit(first10);
				expect(digit).toBeGreaterThanOrEqual(0);
				expect(digit).toBeLessThanOrEqual(9);
				for (let other = 0; other <= 9; other++) {
					const result = validateContainerNumber(`${first10}${other}`);
					expect(result.ok).toBe(other === digit);
					if (!result.ok) {
						expect(result.message).toBe(`The check digit should be ${digit}, not ${other}.`);
					}
				}
			})
		);
	});

	it('spacing, hyphens and case do not change the result', () => {
		fc.assert(
			fc.property(prefix, fc.constantFrom('', ' ', '-', ' - '), (first10, sep) => {
				const normalized = `${first10}${containerCheckDigit(first10)}`;
				const messy = `${normalized.slice(0, 4).toLowerCase()}${sep}${normalized.slice(4, 10)}${sep}${normalized.slice(10)}`;
				const result = validateContainerNumber(messy);
				expect(result.ok && result.normalized).toBe(normalized);
			})
		);
	});
});
