/**
 * UN/LOCODE-style place codes, e.g. "MYPEN" (written "MY PEN").
 *
 * 5 characters: the ISO 3166-1 alpha-2 country code, then 3 characters for the place. The place
 * part uses letters A–Z and, where letters run out, the digits 2–9; 0 and 1 are not used, to
 * avoid confusion with O and I. UNECE, UN/LOCODE Manual (Recommendation No. 16), section on
 * the code for the location (from memory).
 *
 * Only the shape and the country are checked here, not whether UNECE has assigned the code.
 *
 * Pure module: no framework imports.
 */
import { isCountryCode } from '../reference/countries';

export type LocationCodeResult =
	| {
			readonly ok: true;
			/** 5 characters, no space: "MYPEN". */
			readonly normalized: string;
			/** "MY PEN", as the UN/LOCODE tables print it. */
			readonly formatted: string;
			/** ISO 3166-1 alpha-2: "MY". */
			readonly countryCode: string;
			/** The 3-character place part: "PEN". */
			readonly placeCode: string;
	  }
	| { readonly ok: false; readonly message: string };

const PLACE_PART = /^[A-Z2-9]{3}$/;

/** Remove spaces and upper-case: " my pen " → "MYPEN". */
export function normalizeLocationCode(input: string): string {
	return input.replace(/\s+/g, '').toUpperCase();
}

/** Check a location code and say what is wrong with it, in plain English. */
export function validateLocationCode(input: string): LocationCodeResult {
	const code = normalizeLocationCode(input);
	if (code.length === 0) return invalid('Enter a location code, e.g. MY PEN.');
	if (code.length !== 5) {
		return invalid(
			`A location code has 5 characters (2 for the country, 3 for the place); this has ${code.length}.`
		);
	}
	const countryCode = code.slice(0, 2);
	const placeCode = code.slice(2);
	if (!/^[A-Z]{2}$/.test(countryCode)) {
		return invalid(
			`The first 2 characters are the country code and must be letters, not "${countryCode}".`
		);
	}
	if (!isCountryCode(countryCode)) {
		return invalid(`"${countryCode}" is not an ISO 3166-1 country code.`);
	}
	if (!PLACE_PART.test(placeCode)) {
		return invalid(
			`The place part "${placeCode}" may use only letters A–Z and digits 2–9 (not 0 or 1).`
		);
	}
	return Object.freeze({
		ok: true,
		normalized: code,
		formatted: `${countryCode} ${placeCode}`,
		countryCode,
		placeCode
	});
}

/** True when `input` has the shape of a UN/LOCODE with a known country (space allowed). */
export function isLocationCode(input: string): boolean {
	return validateLocationCode(input).ok;
}

/** "MYPEN" → "MY PEN"; input that is not valid comes back trimmed. */
export function formatLocationCode(input: string): string {
	const result = validateLocationCode(input);
	return result.ok ? result.formatted : input.trim();
}

/** Kinds of place a shipment passes through (Landfall's own list). */
export const PLACE_KINDS = [
	'seaport',
	'airport',
	'inland',
	'rail_terminal',
	'road_terminal'
] as const;
export type PlaceKind = (typeof PLACE_KINDS)[number];

export const PLACE_KIND_LABELS: Readonly<Record<PlaceKind, string>> = Object.freeze({
	seaport: 'Seaport',
	airport: 'Airport',
	inland: 'Inland depot',
	rail_terminal: 'Rail terminal',
	road_terminal: 'Road terminal'
});

/**
 * The UN/LOCODE "Function" column digit that matches each kind: 1 port, 2 rail terminal, 3 road
 * terminal, 4 airport, 6 multimodal function (inland clearance depots and the like). UNECE,
 * UN/LOCODE Manual, code list for the function classifier (from memory).
 */
export const PLACE_KIND_UNLOCODE_FUNCTION: Readonly<Record<PlaceKind, string>> = Object.freeze({
	seaport: '1',
	rail_terminal: '2',
	road_terminal: '3',
	airport: '4',
	inland: '6'
});

export function isPlaceKind(value: unknown): value is PlaceKind {
	return typeof value === 'string' && (PLACE_KINDS as readonly string[]).includes(value);
}

export function placeKindLabel(kind: PlaceKind): string {
	return PLACE_KIND_LABELS[kind];
}

/** `{ value, label }` pairs in list order, for select inputs. */
export function placeKindOptions(): readonly {
	readonly value: PlaceKind;
	readonly label: string;
}[] {
	return PLACE_KINDS.map((value) => Object.freeze({ value, label: PLACE_KIND_LABELS[value] }));
}

function invalid(message: string): { readonly ok: false; readonly message: string } {
	return Object.freeze({ ok: false, message });
}
