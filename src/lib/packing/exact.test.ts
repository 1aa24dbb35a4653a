import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { group } from './exact';

// The digit grouping written as the usual regular expression (a comma before every three digits
// counted from the decimal point), which `group` replaced for speed: both must agree.
function byRegex(plain: string): string {
	const negative = plain.startsWith('-');
	const body = negative ? plain.slice(1) : plain;
	const [whole = '', fraction] = body.split('.');
	const grouped = whole.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
	return (negative ? '-' : '') + grouped + (fraction === undefined ? '' : `.${fraction}`);
}

describe('group', () => {
	it('puts a comma before every three whole digits', () => {
		expect(group('0')).toBe('0');
		expect(group('999')).toBe('999');
		expect(group('1000')).toBe('1,000');
		expect(group('19630246.5')).toBe('19,630,246.5');
		expect(group('-1234567.0001')).toBe('-1,234,567.0001');
		expect(group('123456')).toBe('123,456');
	});

	it('agrees with the regular-expression grouping', () => {
		const plain = fc
			.tuple(
				fc.boolean(),
				fc.stringMatching(/^(0|[1-9][0-9]{0,20})$/),
				fc.option(fc.stringMatching(/^[0-9]{1,8}$/))
			)
			.map(
				([neg, whole, fraction]) =>
					`${neg ? '-' : ''}${whole}${fraction === null ? '' : `.${fraction}`}`
			);
		fc.assert(
			fc.property(plain, (s) => {
				expect(group(s)).toBe(byRegex(s));
			})
		);
	});
});
