import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { describe, it, expect } from 'vitest';
import {
	FUND_CODES,
	ISO_4217_PUBLISHED,
	NO_MINOR_UNIT_CODES,
	currencyName,
	currencyOptions,
	isCurrencyCode,
	isPaymentCurrency,
	minorUnits
} from './currencies';

// Source: ISO 4217:2015 "Codes for the representation of currencies", List One
// (current currency & funds), as published by SIX, the ISO 4217 maintenance agency.
// Edition: 2024-06-25, the XML file shipped inside currency-codes 2.2.0, which the
// last describe block reads directly.

describe('ISO 4217 minor units', () => {
	it.each([
		['JPY', 0],
		['EUR', 2],
		['USD', 2],
		['KWD', 3],
		['BHD', 3],
		['CLF', 4]
	])('%s has %i minor-unit digits (ISO 4217 List One, 2024-06-25)', (code, digits) => {
		expect(minorUnits(code)).toBe(digits);
	});

	it('has no minor unit where ISO 4217 says "N.A." (gold, testing code, no currency)', () => {
		expect(minorUnits('XAU')).toBeUndefined();
		expect(minorUnits('XTS')).toBeUndefined();
		expect(minorUnits('XXX')).toBeUndefined();
		expect(minorUnits('XDR')).toBeUndefined();
	});

	it('has none for unknown or mis-cased codes', () => {
		expect(minorUnits('ABC')).toBeUndefined();
		expect(minorUnits('eur')).toBeUndefined();
	});
});

describe('ISO 4217 codes and names', () => {
	it('knows codes exactly as ISO writes them', () => {
		expect(isCurrencyCode('EUR')).toBe(true);
		expect(isCurrencyCode('XAU')).toBe(true);
		expect(isCurrencyCode('eur')).toBe(false);
		expect(isCurrencyCode('EURO')).toBe(false);
		expect(isCurrencyCode(978)).toBe(false);
		// Withdrawn from List One before 2024-06-25: Croatian kuna (euro since 2023-01-01)
		// and the old Sierra Leone leone SLL (from memory).
		expect(isCurrencyCode('HRK')).toBe(false);
		expect(isCurrencyCode('SLL')).toBe(false);
	});

	it.each([
		['JPY', 'Yen'],
		['EUR', 'Euro'],
		['USD', 'US Dollar'],
		['KWD', 'Kuwaiti Dinar'],
		['MYR', 'Malaysian Ringgit'],
		['VND', 'Dong']
	])('%s is named %s in ISO 4217 List One', (code, name) => {
		expect(currencyName(code)).toBe(name);
	});
});

describe('currencyOptions', () => {
	const options = currencyOptions();
	const codes = options.map((o) => o.code);

	it('leaves out funds, precious metals, units of account and testing codes', () => {
		for (const code of [
			'XAU',
			'XAG',
			'XPT',
			'XPD',
			'XTS',
			'XXX',
			'XDR',
			'XBA',
			'BOV',
			'CHE',
			'USN'
		]) {
			expect(codes).not.toContain(code);
			expect(isPaymentCurrency(code)).toBe(false);
		}
	});

	it('keeps real currencies, including X-codes that are currencies', () => {
		// XAF, XOF (CFA francs), XPF (CFP franc) and XCD (East Caribbean dollar) are
		// currencies in ISO 4217 List One with minor units 0, 0, 0 and 2.
		for (const code of ['EUR', 'USD', 'JPY', 'MYR', 'VND', 'AUD', 'XAF', 'XOF', 'XPF', 'XCD']) {
			expect(codes).toContain(code);
		}
		expect(options.find((o) => o.code === 'XOF')).toEqual({
			code: 'XOF',
			name: 'CFA Franc BCEAO',
			minorUnits: 0
		});
	});

	it('is sorted by code, without duplicates, and frozen', () => {
		expect(codes).toEqual([...codes].sort());
		expect(new Set(codes).size).toBe(codes.length);
		expect(Object.isFrozen(options)).toBe(true);
		expect(currencyOptions()).toBe(options);
	});
});

describe('cross-check against the ISO 4217 List One XML shipped with currency-codes', () => {
	const require = createRequire(import.meta.url);
	const xml = readFileSync(require.resolve('currency-codes/iso-4217-list-one.xml'), 'utf8');

	interface Entry {
		code: string;
		fund: boolean;
		minorUnits: string;
	}
	const entries: Entry[] = [];
	for (const match of xml.matchAll(/<CcyNtry>([\s\S]*?)<\/CcyNtry>/g)) {
		const body = match[1] ?? '';
		const code = /<Ccy>([A-Z]{3})<\/Ccy>/.exec(body)?.[1];
		const units = /<CcyMnrUnts>([^<]*)<\/CcyMnrUnts>/.exec(body)?.[1];
		if (code === undefined || units === undefined) continue; // e.g. Antarctica: no currency
		entries.push({ code, fund: /IsFund="true"/.test(body), minorUnits: units });
	}

	it('is the 2024-06-25 edition', () => {
		expect(/<ISO_4217 Pblshd="([0-9-]+)">/.exec(xml)?.[1]).toBe('2024-06-25');
		expect(ISO_4217_PUBLISHED).toBe('2024-06-25');
	});

	it('marks exactly FUND_CODES as funds', () => {
		const funds = new Set(entries.filter((e) => e.fund).map((e) => e.code));
		expect([...funds].sort()).toEqual([...FUND_CODES].sort());
	});

	it('gives "N.A." minor units exactly for NO_MINOR_UNIT_CODES', () => {
		const na = new Set(entries.filter((e) => e.minorUnits === 'N.A.').map((e) => e.code));
		expect([...na].sort()).toEqual([...NO_MINOR_UNIT_CODES].sort());
	});

	it('agrees with minorUnits() for every code in the list', () => {
		for (const entry of entries) {
			expect(isCurrencyCode(entry.code), entry.code).toBe(true);
			const expected =
				entry.minorUnits === 'N.A.' ? undefined : Number.parseInt(entry.minorUnits, 10);
			expect(minorUnits(entry.code), entry.code).toBe(expected);
		}
	});
});
