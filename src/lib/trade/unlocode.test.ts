import fc from 'fast-check';
import { describe, it, expect } from 'vitest';
import {
	PLACE_KINDS,
	PLACE_KIND_LABELS,
	PLACE_KIND_UNLOCODE_FUNCTION,
	formatLocationCode,
	isLocationCode,
	isPlaceKind,
	normalizeLocationCode,
	placeKindLabel,
	placeKindOptions,
	validateLocationCode
} from './unlocode';

function messageOf(input: string): string {
	const result = validateLocationCode(input);
	if (result.ok) throw new Error(`expected "${input}" to be invalid`);
	return result.message;
}

describe('validateLocationCode', () => {
	it.each([
		// UNECE, UN/LOCODE code list (from memory): Penang, Hamburg, Rotterdam, Singapore,
		// Shanghai, Ho Chi Minh City.
		['MY PEN', 'MY', 'PEN'],
		['DE HAM', 'DE', 'HAM'],
		['NL RTM', 'NL', 'RTM'],
		['SG SIN', 'SG', 'SIN'],
		['CN SHA', 'CN', 'SHA'],
		['VN SGN', 'VN', 'SGN']
	])('accepts %s', (input, countryCode, placeCode) => {
		expect(validateLocationCode(input)).toEqual({
			ok: true,
			normalized: `${countryCode}${placeCode}`,
			formatted: input,
			countryCode,
			placeCode
		});
	});

	it('removes spaces and upper-cases', () => {
		expect(normalizeLocationCode(' my pen ')).toBe('MYPEN');
		const result = validateLocationCode('mypen');
		expect(result.ok && result.normalized).toBe('MYPEN');
		expect(formatLocationCode('mypen')).toBe('MY PEN');
	});

	it('allows digits 2–9 in the place part but not 0 or 1', () => {
		// UNECE, UN/LOCODE Manual (Recommendation No. 16): digits 2 to 9 may be used when letter
		// combinations run out; 0 and 1 are excluded to avoid confusion with O and I (from
		// memory). The codes below only illustrate the shape.
		expect(isLocationCode('US2AB')).toBe(true);
		expect(isLocationCode('USAB9')).toBe(true);
		expect(messageOf('USAB0')).toContain('digits 2–9 (not 0 or 1)');
		expect(messageOf('USAB1')).toContain('digits 2–9 (not 0 or 1)');
	});

	it('gives a specific message for each kind of mistake', () => {
		expect(messageOf('')).toContain('Enter a location code');
		expect(messageOf('MYPE')).toContain('this has 4');
		expect(messageOf('MY PENA')).toContain('this has 6');
		expect(messageOf('M1PEN')).toContain('must be letters');
		// ISO 3166-1 assigns no "QQ" (QM–QZ are user-assigned, from memory).
		expect(messageOf('QQPEN')).toBe('"QQ" is not an ISO 3166-1 country code.');
		expect(messageOf('MYP-N')).toContain('place part "P-N"');
	});

	it('agrees with the country list for every pair of letters', () => {
		fc.assert(
			fc.property(fc.stringMatching(/^[A-Z]{2}$/), (country) => {
				const result = validateLocationCode(`${country}ABC`);
				if (result.ok) expect(result.countryCode).toBe(country);
				else expect(result.message).toContain('not an ISO 3166-1 country code');
			})
		);
	});
});

describe('place kinds', () => {
	it('has the five kinds, each with a label', () => {
		expect([...PLACE_KINDS]).toEqual([
			'seaport',
			'airport',
			'inland',
			'rail_terminal',
			'road_terminal'
		]);
		for (const kind of PLACE_KINDS) {
			expect(placeKindLabel(kind)).toBe(PLACE_KIND_LABELS[kind]);
			expect(isPlaceKind(kind)).toBe(true);
		}
		expect(isPlaceKind('spaceport')).toBe(false);
		expect(placeKindOptions().map((o) => o.value)).toEqual([...PLACE_KINDS]);
	});

	it('maps each kind to a UN/LOCODE function digit', () => {
		// UNECE, UN/LOCODE Manual, function classifier: 1 port, 2 rail terminal, 3 road terminal,
		// 4 airport, 6 multimodal functions such as inland clearance depots (from memory).
		expect(PLACE_KIND_UNLOCODE_FUNCTION).toEqual({
			seaport: '1',
			rail_terminal: '2',
			road_terminal: '3',
			airport: '4',
			inland: '6'
		});
	});
});
