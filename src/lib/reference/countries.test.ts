import { describe, it, expect } from 'vitest';
import {
	countryAlpha3,
	countryName,
	countryNumeric,
	countryOptions,
	isCountryCode,
	normalizeCountryCode
} from './countries';

// Source for codes: ISO, ISO 3166-1:2020 "Codes for the representation of names of
// countries and their subdivisions — Part 1: Country code", alpha-2 / alpha-3 / numeric
// columns (from memory).
const ISO_3166_1_CODES = [
	{ alpha2: 'DE', alpha3: 'DEU', numeric: '276' },
	{ alpha2: 'MY', alpha3: 'MYS', numeric: '458' },
	{ alpha2: 'VN', alpha3: 'VNM', numeric: '704' },
	{ alpha2: 'AU', alpha3: 'AUS', numeric: '036' },
	{ alpha2: 'US', alpha3: 'USA', numeric: '840' },
	{ alpha2: 'NL', alpha3: 'NLD', numeric: '528' }
] as const;

describe('ISO 3166-1 codes', () => {
	it.each(ISO_3166_1_CODES)('$alpha2 ↔ $alpha3 ↔ $numeric', ({ alpha2, alpha3, numeric }) => {
		expect(isCountryCode(alpha2)).toBe(true);
		expect(countryAlpha3(alpha2)).toBe(alpha3);
		expect(countryNumeric(alpha2)).toBe(numeric);
	});

	it('accepts only upper-case alpha-2 codes that ISO 3166-1 assigns', () => {
		expect(isCountryCode('de')).toBe(false);
		expect(isCountryCode(' DE')).toBe(false);
		expect(isCountryCode('DEU')).toBe(false);
		expect(isCountryCode('276')).toBe(false);
		expect(isCountryCode(276)).toBe(false);
		// ISO 3166-1 §8.1.3: XA–XZ are user-assigned; XK (Kosovo) is such a code, not an ISO
		// assignment, though i18n-iso-countries lists it (from memory).
		expect(isCountryCode('XK')).toBe(false);
		// UK and EU are "exceptionally reserved" in ISO 3166-1, not assigned; the assigned
		// code for the United Kingdom is GB (from memory).
		expect(isCountryCode('UK')).toBe(false);
		expect(isCountryCode('EU')).toBe(false);
		expect(isCountryCode('GB')).toBe(true);
	});

	it('normalizes user input', () => {
		expect(normalizeCountryCode(' de ')).toBe('DE');
		expect(normalizeCountryCode('uk')).toBeUndefined();
	});
});

describe('English country names', () => {
	// ISO 3166-1:2020, English short names (from memory). ISO writes the US as
	// "United States of America (the)"; the "(the)" is ISO's sorting form, dropped here.
	it.each([
		['DE', 'Germany'],
		['MY', 'Malaysia'],
		['AU', 'Australia'],
		['US', 'United States of America']
	])('%s is %s, as in ISO 3166-1', (code, name) => {
		expect(countryName(code)).toBe(name);
	});

	it('uses the library’s common English form where it differs from ISO 3166-1', () => {
		// ISO 3166-1 English short name: "Viet Nam" (from memory; also "VIET NAM" in the
		// ISO 4217 List One 2024-06-25 entity names). i18n-iso-countries says "Vietnam".
		expect(countryName('VN')).toBe('Vietnam');
		// ISO 3166-1 English short name: "Netherlands (Kingdom of the)" since 2023
		// (from memory). i18n-iso-countries says "Netherlands".
		expect(countryName('NL')).toBe('Netherlands');
	});

	it('has no name for a code ISO 3166-1 does not assign', () => {
		expect(countryName('XK')).toBeUndefined();
		expect(countryName('ZZ')).toBeUndefined();
	});
});

describe('countryOptions', () => {
	const options = countryOptions();

	it('lists every ISO 3166-1 assigned code once', () => {
		// ISO 3166-1 has 249 officially assigned alpha-2 codes (ISO Online Browsing
		// Platform, 2024; from memory).
		expect(options).toHaveLength(249);
		expect(new Set(options.map((o) => o.code)).size).toBe(options.length);
		expect(options.every((o) => isCountryCode(o.code) && o.name.length > 0)).toBe(true);
	});

	it('is sorted by English name', () => {
		const collator = new Intl.Collator('en', { sensitivity: 'base' });
		const names = options.map((o) => o.name);
		expect(names).toEqual([...names].sort((a, b) => collator.compare(a, b)));
		expect(options.find((o) => o.code === 'DE')).toEqual({ code: 'DE', name: 'Germany' });
	});

	it('returns the same frozen list each time', () => {
		expect(countryOptions()).toBe(options);
		expect(Object.isFrozen(options)).toBe(true);
	});
});
