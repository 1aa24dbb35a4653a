/**
 * Harmonized System (HS) commodity codes, e.g. "8518.22" or, with national digits, "8518.22.00".
 *
 * - The first 6 digits are the international HS: chapter (2), heading (4), subheading (6).
 *   WCO, International Convention on the Harmonized Commodity Description and Coding System
 *   (Brussels, 1983), Art. 3: contracting parties use the headings and subheadings and their
 *   numerical codes without change, and may add subdivisions at national level (from memory).
 * - Digits after the sixth are national: 8-digit CN in the EU (Council Regulation (EEC)
 *   No 2658/87, Art. 1 and Annex I, from memory), 10-digit HTS statistical reporting numbers in
 *   the US (USITC, Harmonized Tariff Schedule of the United States, General Notes, from memory).
 *   National tariffs use 8 or 10 digits, so 7 and 9 digits are refused (common practice).
 * - Chapters run 01–97; chapter 77 is "reserved for possible future use" (WCO, HS Nomenclature
 *   2022 edition, Section XV). Chapters 98 and 99 are left to national use and are not part of
 *   the international nomenclature (from memory). Headings are numbered from 01 within each
 *   chapter, so no heading ends in 00 (from memory).
 *
 * A code that passes here has the right shape; whether it exists in a given tariff, and whether
 * it fits the goods, is for the tariff and a licensed customs broker to say.
 *
 * Pure module: no framework imports.
 */

export interface HsParts {
	/** 2 digits, "85". */
	readonly chapter: string;
	/** 4 digits, "8518". */
	readonly heading: string;
	/** 6 digits, "851822": the last level the HS itself defines. */
	readonly subheading: string;
	/** National digits after the sixth ("00" or "0000"), when there are any. */
	readonly national?: string;
}

export type HsCodeResult =
	| {
			readonly ok: true;
			/** Digits only: "85182200". */
			readonly normalized: string;
			/** "8518.22.00". */
			readonly formatted: string;
			readonly parts: HsParts;
	  }
	| { readonly ok: false; readonly message: string };

/** Lengths accepted: the 6-digit HS, and 8- or 10-digit national codes. */
export const HS_CODE_LENGTHS = [6, 8, 10] as const;

/** Chapter 77 is reserved for possible future use in the HS (WCO, HS Nomenclature 2022). */
export const RESERVED_HS_CHAPTER = '77';

/** Remove dots, spaces and hyphens: "8518.22.00" and "8518 22 00" → "85182200". */
export function normalizeHsCode(input: string): string {
	return input.replace(/[\s.-]+/g, '');
}

/** Check an HS code and say what is wrong with it, in plain English. */
export function validateHsCode(input: string): HsCodeResult {
	const code = normalizeHsCode(input);
	if (code.length === 0) return invalid('Enter an HS code, e.g. 8518.22 or 8518.22.00.');
	if (!/^[0-9]+$/.test(code)) {
		return invalid('An HS code has only digits (dots and spaces between them are fine).');
	}
	if (code.length < 6) {
		return invalid(
			`An HS code needs at least 6 digits (chapter, heading and subheading); this has ${code.length}.`
		);
	}
	if (code.length > 10) {
		return invalid(`An HS code has at most 10 digits; this has ${code.length}.`);
	}
	if (code.length === 7 || code.length === 9) {
		return invalid(
			`National tariff codes have 8 or 10 digits, not ${code.length}: check for a missing or extra digit.`
		);
	}
	const chapter = code.slice(0, 2);
	if (chapter === '00') return invalid('HS chapters run from 01 to 97; there is no chapter 00.');
	if (chapter === RESERVED_HS_CHAPTER) {
		return invalid('Chapter 77 is reserved for future use in the HS and holds no goods.');
	}
	if (chapter === '98' || chapter === '99') {
		return invalid(
			`Chapter ${chapter} is for national use, not part of the international HS (chapters 01 to 97).`
		);
	}
	if (code.slice(2, 4) === '00') {
		return invalid(
			`Heading ${code.slice(0, 4)} does not exist: headings in a chapter start at 01.`
		);
	}
	const parts = partsOf(code);
	return Object.freeze({ ok: true, normalized: code, formatted: formatDigits(code), parts });
}

/** True when `input` is a well-formed HS code (6, 8 or 10 digits; separators allowed). */
export function isHsCode(input: string): boolean {
	return validateHsCode(input).ok;
}

/** Chapter, heading, subheading and national digits of a valid code, or undefined. */
export function hsParts(input: string): HsParts | undefined {
	const result = validateHsCode(input);
	return result.ok ? result.parts : undefined;
}

/**
 * "85182200" → "8518.22.00"; "851822" → "8518.22"; "8518220000" → "8518.22.00.00". Dots after
 * the heading and then every two digits (common practice). Input that is not a valid code comes
 * back trimmed, unchanged.
 */
export function formatHsCode(input: string): string {
	const result = validateHsCode(input);
	return result.ok ? result.formatted : input.trim();
}

function formatDigits(code: string): string {
	const groups = [code.slice(0, 4)];
	for (let i = 4; i < code.length; i += 2) groups.push(code.slice(i, i + 2));
	return groups.join('.');
}

function partsOf(code: string): HsParts {
	const parts: HsParts = {
		chapter: code.slice(0, 2),
		heading: code.slice(0, 4),
		subheading: code.slice(0, 6),
		...(code.length > 6 ? { national: code.slice(6) } : {})
	};
	return Object.freeze(parts);
}

function invalid(message: string): { readonly ok: false; readonly message: string } {
	return Object.freeze({ ok: false, message });
}
