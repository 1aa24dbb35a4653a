import { describe, expect, it } from 'vitest';
import { nulPaths } from './nul-text';

// PostgreSQL 15 documentation, 8.3 "Character Types": "the character with code zero (sometimes
// called NUL) cannot be stored".
describe('nulPaths', () => {
	it('finds NUL in nested strings, with their paths', () => {
		expect(nulPaths({ a: 'ok', b: ['x', 'y\u0000'], c: { d: '\u0000' } })).toEqual([
			['b', 1],
			['c', 'd']
		]);
	});

	it('passes text without NUL, other control characters and non-strings', () => {
		expect(nulPaths({ a: 'tab\there', b: 1, c: null, d: [true], e: '%00' })).toEqual([]);
		expect(nulPaths('\u0000')).toEqual([[]]);
	});
});
