/**
 * ISO 3166-1 country codes and English names, wrapping i18n-iso-countries.
 *
 * Codes are ISO 3166-1 alpha-2, upper case. Names are the library's English
 * "official" name (its first English name), which is usually but not always
 * the ISO 3166-1 English short name: e.g. the library says "Vietnam" where
 * ISO 3166-1 says "Viet Nam". See data/README.md.
 *
 * Pure module: no framework imports.
 */
import countries from 'i18n-iso-countries';
import en from 'i18n-iso-countries/langs/en.json' with { type: 'json' };

countries.registerLocale(en);

export interface CountryOption {
	readonly code: string;
	readonly name: string;
}

/**
 * Codes the library knows that ISO 3166-1 has not assigned as country codes.
 * XK (Kosovo) is a user-assigned code (ISO 3166-1 reserves XA–XZ for users);
 * from memory.
 */
const NOT_ISO_ASSIGNED: ReadonlySet<string> = new Set(['XK']);

const ALPHA2_CODES: ReadonlySet<string> = new Set(
	Object.keys(countries.getAlpha2Codes()).filter((code) => !NOT_ISO_ASSIGNED.has(code))
);

const ALPHA2_PATTERN = /^[A-Z]{2}$/;

/** True when `code` is an assigned ISO 3166-1 alpha-2 code, exactly (upper case, no spaces). */
export function isCountryCode(code: unknown): code is string {
	return typeof code === 'string' && ALPHA2_PATTERN.test(code) && ALPHA2_CODES.has(code);
}

/** Trim and upper-case user input; return the alpha-2 code if it is one, else undefined. */
export function normalizeCountryCode(input: string): string | undefined {
	const code = input.trim().toUpperCase();
	return isCountryCode(code) ? code : undefined;
}

/** English name of an alpha-2 code, or undefined when the code is not an ISO 3166-1 alpha-2 code. */
export function countryName(code: string): string | undefined {
	if (!isCountryCode(code)) return undefined;
	return countries.getName(code, 'en');
}

/** ISO 3166-1 alpha-3 code for an alpha-2 code, or undefined. */
export function countryAlpha3(code: string): string | undefined {
	if (!isCountryCode(code)) return undefined;
	return countries.alpha2ToAlpha3(code);
}

/** ISO 3166-1 numeric code (three digits, as a string) for an alpha-2 code, or undefined. */
export function countryNumeric(code: string): string | undefined {
	if (!isCountryCode(code)) return undefined;
	return countries.alpha2ToNumeric(code);
}

let cachedOptions: readonly CountryOption[] | undefined;

/** All ISO 3166-1 countries as `{ code, name }`, sorted by English name. */
export function countryOptions(): readonly CountryOption[] {
	if (cachedOptions === undefined) {
		const collator = new Intl.Collator('en', { sensitivity: 'base' });
		const options: CountryOption[] = [];
		for (const code of ALPHA2_CODES) {
			const name = countries.getName(code, 'en');
			if (name !== undefined) options.push(Object.freeze({ code, name }));
		}
		options.sort((a, b) => collator.compare(a.name, b.name) || (a.code < b.code ? -1 : 1));
		cachedOptions = Object.freeze(options);
	}
	return cachedOptions;
}
