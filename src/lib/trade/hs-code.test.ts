import fc from 'fast-check';
import { describe, it, expect } from 'vitest';
import {
	HS_CODE_LENGTHS,
	RESERVED_HS_CHAPTER,
	formatHsCode,
	hsParts,
	isHsCode,
	normalizeHsCode,
	validateHsCode
} from './hs-code';

function messageOf(input: string): string {
	const result = validateHsCode(input);
	if (result.ok) throw new Error(`expected "${input}" to be invalid`);
	return result.message;
}

describe('electronics examples from the HS', () => {
	it.each([
		// WCO, HS Nomenclature 2022 edition, subheading 8518.22 "Multiple loudspeakers,
		// mounted in the same enclosure" (from memory).
		['8518.22', '85', '8518'],
		// WCO, HS Nomenclature 2022 edition, subheading 8507.60 "Lithium-ion" (electric
		// accumulators) (from memory).
		['8507.60', '85', '8507'],
		// WCO, HS Nomenclature 2022 edition, subheading 8531.10 "Burglar or fire alarms and
		// similar apparatus" (from memory).
		['8531.10', '85', '8531'],
		// WCO, HS Nomenclature 2022 edition, subheading 8504.40 "Static converters" (from memory).
		['8504.40', '85', '8504'],
		// WCO, HS Nomenclature 2022 edition, heading 90.26, instruments for measuring or checking
		// the flow, level or pressure of liquids or gases; 9026.20 "for measuring or checking
		// pressure" (from memory).
		['9026.20', '90', '9026']
	])('%s is a valid 6-digit HS code', (input, chapter, heading) => {
		const result = validateHsCode(input);
		expect(result.ok).toBe(true);
		if (!result.ok) return;
		expect(result.normalized).toBe(input.replace('.', ''));
		expect(result.formatted).toBe(input);
		expect(result.parts).toEqual({ chapter, heading, subheading: result.normalized });
		expect(result.parts.national).toBeUndefined();
	});
});

describe('national subdivisions', () => {
	it('splits an 8-digit code (EU Combined Nomenclature length) into its parts', () => {
		// Council Regulation (EEC) No 2658/87, Art. 1 and Annex I: the CN adds 2 digits to the
		// 6-digit HS (from memory). The digits "00" are an illustration, not a checked CN line.
		expect(hsParts('85182200')).toEqual({
			chapter: '85',
			heading: '8518',
			subheading: '851822',
			national: '00'
		});
		expect(formatHsCode('85182200')).toBe('8518.22.00');
	});

	it('accepts a 10-digit code (US HTS statistical reporting number length)', () => {
		// USITC, Harmonized Tariff Schedule of the United States, General Notes: 8-digit
		// tariff lines plus a 2-digit statistical suffix (from memory). Digits illustrative.
		const result = validateHsCode('8507.60.0020');
		expect(result).toEqual({
			ok: true,
			normalized: '8507600020',
			formatted: '8507.60.00.20',
			parts: { chapter: '85', heading: '8507', subheading: '850760', national: '0020' }
		});
	});

	it('refuses 7 and 9 digits: national tariffs use 8 or 10 (common practice)', () => {
		expect(messageOf('8518220')).toContain('8 or 10 digits, not 7');
		expect(messageOf('851822000')).toContain('8 or 10 digits, not 9');
	});

	it('accepts exactly 6, 8 and 10 digits', () => {
		expect([...HS_CODE_LENGTHS]).toEqual([6, 8, 10]);
		for (let length = 1; length <= 12; length++) {
			const code = '851822000000'.slice(0, length);
			expect(isHsCode(code), code).toBe((HS_CODE_LENGTHS as readonly number[]).includes(length));
		}
	});
});

describe('chapters', () => {
	it('refuses chapter 77, reserved for possible future use', () => {
		// WCO, HS Nomenclature 2022 edition, Section XV, Chapter 77 "(Reserved for possible
		// future use in the Harmonized System)".
		expect(RESERVED_HS_CHAPTER).toBe('77');
		expect(messageOf('770100')).toContain('Chapter 77 is reserved');
	});

	it('accepts chapters 01 and 97 and refuses 00, 98 and 99', () => {
		// WCO, HS Nomenclature 2022 edition: chapters 1 to 97; 0101 live horses, asses, mules
		// and hinnies; 9701 paintings, drawings and pastels (from memory). The subheading digits
		// only illustrate the shape.
		expect(isHsCode('0101.21')).toBe(true);
		expect(isHsCode('9701.91')).toBe(true);
		expect(messageOf('000100')).toContain('no chapter 00');
		// Chapters 98 and 99 are left for national use, e.g. US HTS chapter 98 special
		// classification provisions (from memory).
		expect(messageOf('980100')).toContain('national use');
		expect(messageOf('990100')).toContain('national use');
	});

	it('refuses a heading ending in 00 (headings start at 01, from memory)', () => {
		expect(messageOf('850010')).toContain('Heading 8500 does not exist');
	});
});

describe('input handling', () => {
	it('strips dots, spaces and hyphens', () => {
		expect(normalizeHsCode(' 8518.22 00 ')).toBe('85182200');
		expect(normalizeHsCode('8518-22-00')).toBe('85182200');
		expect(formatHsCode('8518 22 00')).toBe('8518.22.00');
	});

	it('gives a specific message for each kind of mistake', () => {
		expect(messageOf('')).toContain('Enter an HS code');
		expect(messageOf('8518.2A')).toContain('only digits');
		expect(messageOf('8518')).toContain('at least 6 digits');
		expect(messageOf('8518')).toContain('this has 4');
		expect(messageOf('85182200001')).toContain('at most 10 digits');
	});

	it('leaves an invalid code unformatted', () => {
		expect(formatHsCode(' 77.01 ')).toBe('77.01');
		expect(hsParts('7701.00')).toBeUndefined();
	});

	it('formatting round-trips for any accepted code', () => {
		const chapter = fc
			.integer({ min: 1, max: 97 })
			.filter((n) => n !== 77)
			.map((n) => String(n).padStart(2, '0'));
		const headingDigits = fc.integer({ min: 1, max: 99 }).map((n) => String(n).padStart(2, '0'));
		const rest = fc
			.constantFrom(2, 4, 6)
			.chain((n) => fc.stringMatching(new RegExp(`^[0-9]{${n}}$`)));
		fc.assert(
			fc.property(chapter, headingDigits, rest, (c, h, r) => {
				const code = `${c}${h}${r}`;
				const result = validateHsCode(code);
				expect(result.ok).toBe(true);
				if (!result.ok) return;
				expect(result.normalized).toBe(code);
				expect(normalizeHsCode(result.formatted)).toBe(code);
				expect(result.parts.chapter + code.slice(2)).toBe(code);
			})
		);
	});
});
