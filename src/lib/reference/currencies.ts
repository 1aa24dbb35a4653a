/**
 * ISO 4217 currency codes, wrapping currency-codes (which ingests the ISO 4217
 * "List One" published by SIX, the ISO 4217 maintenance agency; the edition it
 * ships is `ISO_4217_PUBLISHED`).
 *
 * Pure module: no framework imports.
 */
import cc, { type CurrencyCodeRecord } from 'currency-codes';

export interface CurrencyOption {
	readonly code: string;
	readonly name: string;
	/** Number of minor-unit digits (ISO 4217 "minor unit"), e.g. 2 for EUR. */
	readonly minorUnits: number;
}

/** Publication date of the ISO 4217 List One edition that currency-codes ships. */
export const ISO_4217_PUBLISHED: string = cc.publishDate;

/**
 * Codes marked as funds (IsFund="true") in ISO 4217 List One, 2024-06-25.
 * Not payment currencies; left out of `currencyOptions()`.
 */
export const FUND_CODES: ReadonlySet<string> = new Set([
	'BOV',
	'CHE',
	'CHW',
	'CLF',
	'COU',
	'MXV',
	'USN',
	'UYI'
]);

/**
 * Codes whose minor unit is "N.A." in ISO 4217 List One, 2024-06-25:
 * precious metals, bond-market units, SDR, ADB unit of account, SUCRE,
 * the testing code and the "no currency" code. currency-codes reports 0
 * digits for them, which is wrong; `minorUnits()` returns undefined instead.
 */
export const NO_MINOR_UNIT_CODES: ReadonlySet<string> = new Set([
	'XAG',
	'XAU',
	'XBA',
	'XBB',
	'XBC',
	'XBD',
	'XDR',
	'XPD',
	'XPT',
	'XSU',
	'XTS',
	'XUA',
	'XXX'
]);

const CODE_PATTERN = /^[A-Z]{3}$/;

function record(code: string): CurrencyCodeRecord | undefined {
	if (!CODE_PATTERN.test(code)) return undefined;
	return cc.code(code);
}

/** True when `code` is in ISO 4217 List One (any entry, funds and metals included), exactly upper case. */
export function isCurrencyCode(code: unknown): code is string {
	return typeof code === 'string' && record(code) !== undefined;
}

/** True when `code` is an ISO 4217 currency offered for prices and invoices (see `currencyOptions()`). */
export function isPaymentCurrency(code: unknown): code is string {
	return isCurrencyCode(code) && !FUND_CODES.has(code) && !NO_MINOR_UNIT_CODES.has(code);
}

/** ISO 4217 English name ("Yen", "Euro", "US Dollar"), or undefined for an unknown code. */
export function currencyName(code: string): string | undefined {
	return record(code)?.currency;
}

/**
 * ISO 4217 minor-unit digits (JPY 0, EUR 2, KWD 3), or undefined for an
 * unknown code or one whose minor unit is "N.A." in the list.
 */
export function minorUnits(code: string): number | undefined {
	const found = record(code);
	if (found === undefined || NO_MINOR_UNIT_CODES.has(found.code)) return undefined;
	return found.digits;
}

let cachedOptions: readonly CurrencyOption[] | undefined;

/** Payment currencies sorted by code, without funds, metals, units of account and testing codes. */
export function currencyOptions(): readonly CurrencyOption[] {
	if (cachedOptions === undefined) {
		const options: CurrencyOption[] = [];
		for (const code of [...new Set(cc.codes())].sort()) {
			if (!isPaymentCurrency(code)) continue;
			const found = cc.code(code);
			if (found === undefined) continue;
			options.push(Object.freeze({ code, name: found.currency, minorUnits: found.digits }));
		}
		cachedOptions = Object.freeze(options);
	}
	return cachedOptions;
}
