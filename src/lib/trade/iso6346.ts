/**
 * ISO 6346 container identification: owner code, equipment category, serial number and check
 * digit, e.g. "CSQU 305438 3".
 *
 * Structure (ISO 6346:1995, clause 3 "Identification system", from memory):
 * - owner code: 3 letters, registered with the BIC (Bureau International des Containers);
 *   whether a code is registered is not checked here;
 * - equipment category identifier: U (freight container), J (detachable freight
 *   container-related equipment), Z (trailer or chassis);
 * - serial number: 6 digits;
 * - check digit: 1 digit computed from the first ten characters (Annex A).
 *
 * Pure module: no framework imports.
 */

export const EQUIPMENT_CATEGORIES = ['U', 'J', 'Z'] as const;
export type EquipmentCategory = (typeof EQUIPMENT_CATEGORIES)[number];

/** Plain-English labels for the equipment category identifier (ISO 6346, from memory). */
export const EQUIPMENT_CATEGORY_LABELS: Readonly<Record<EquipmentCategory, string>> = Object.freeze(
	{
		U: 'Freight container',
		J: 'Detachable container equipment',
		Z: 'Trailer or chassis'
	}
);

export function isEquipmentCategory(value: unknown): value is EquipmentCategory {
	return typeof value === 'string' && (EQUIPMENT_CATEGORIES as readonly string[]).includes(value);
}

/**
 * Letter values for the check digit: A = 10, counting up and skipping 11, 22 and 33 (multiples
 * of 11), so B = 12, L = 23, V = 34, Z = 38. ISO 6346 Annex A (from memory).
 */
// prettier-ignore
export const CHECK_DIGIT_LETTER_VALUES: Readonly<Record<string, number>> = Object.freeze({
	A: 10, B: 12, C: 13, D: 14, E: 15, F: 16, G: 17, H: 18, I: 19, J: 20, K: 21,
	L: 23, M: 24, N: 25, O: 26, P: 27, Q: 28, R: 29, S: 30, T: 31, U: 32,
	V: 34, W: 35, X: 36, Y: 37, Z: 38
});

export interface ContainerNumber {
	readonly ownerCode: string;
	readonly category: EquipmentCategory;
	readonly serial: string;
	readonly checkDigit: string;
	/** 11 characters, no separators: "CSQU3054383". */
	readonly normalized: string;
	/** As marked on the container: "CSQU 305438 3". */
	readonly formatted: string;
}

export type ContainerNumberResult =
	({ readonly ok: true } & ContainerNumber) | { readonly ok: false; readonly message: string };

/** Remove spaces and hyphens (anywhere) and upper-case. Other characters are kept. */
export function normalizeContainerInput(input: string): string {
	return input.replace(/[\s-]+/g, '').toUpperCase();
}

const PREFIX_PATTERN = /^[A-Z]{4}[0-9]{6}$/;

/**
 * The check digit (0–9) for the first ten characters (4 letters, 6 digits; spaces, hyphens and
 * lower case are accepted). Each character's value is multiplied by 2^position (position 0 to
 * 9), the products are summed, and the sum is taken modulo 11; a remainder of 10 gives 0.
 * ISO 6346 Annex A (from memory). Throws a RangeError for input that is not 4 letters and
 * 6 digits.
 */
export function containerCheckDigit(first10: string): number {
	const prefix = normalizeContainerInput(first10);
	if (!PREFIX_PATTERN.test(prefix)) {
		throw new RangeError(`expected 4 letters and 6 digits, got "${first10}"`);
	}
	let sum = 0;
	for (let i = 0; i < prefix.length; i++) {
		const char = prefix.charAt(i);
		const value = /[0-9]/.test(char) ? Number(char) : (CHECK_DIGIT_LETTER_VALUES[char] ?? 0);
		sum += value * 2 ** i;
	}
	return (sum % 11) % 10;
}

/** "CSQU3054383" → "CSQU 305438 3". Expects a normalized, 11-character number. */
function formatNormalized(normalized: string): string {
	return `${normalized.slice(0, 4)} ${normalized.slice(4, 10)} ${normalized.slice(10)}`;
}

/** Check a container number and say what is wrong with it, in plain English. */
export function validateContainerNumber(input: string): ContainerNumberResult {
	const value = normalizeContainerInput(input);
	if (value.length === 0) return invalid('Enter a container number, e.g. CSQU 305438 3.');
	if (!/^[A-Z0-9]+$/.test(value)) {
		return invalid('A container number has only letters and digits (spaces and hyphens are fine).');
	}
	if (value.length !== 11) {
		return invalid(
			`A container number has 11 characters (4 letters, then 7 digits); this has ${value.length}.`
		);
	}
	const ownerCode = value.slice(0, 3);
	const category = value.charAt(3);
	const serial = value.slice(4, 10);
	const checkDigit = value.charAt(10);
	if (!/^[A-Z]{3}$/.test(ownerCode)) {
		return invalid(`The owner code (first 3 characters) must be letters, not "${ownerCode}".`);
	}
	if (!isEquipmentCategory(category)) {
		return invalid(
			`The 4th character is the equipment category and must be U, J or Z, not "${category}".`
		);
	}
	if (!/^[0-9]{6}$/.test(serial)) {
		return invalid(`The serial number (characters 5 to 10) must be 6 digits, not "${serial}".`);
	}
	if (!/^[0-9]$/.test(checkDigit)) {
		return invalid(
			`The last character is the check digit and must be a digit, not "${checkDigit}".`
		);
	}
	const expected = containerCheckDigit(value.slice(0, 10));
	if (Number(checkDigit) !== expected) {
		return invalid(`The check digit should be ${expected}, not ${checkDigit}.`);
	}
	return Object.freeze({
		ok: true,
		ownerCode,
		category,
		serial,
		checkDigit,
		normalized: value,
		formatted: formatNormalized(value)
	});
}

/** The parts of a valid container number (check digit included), or undefined. */
export function parseContainerNumber(input: string): ContainerNumber | undefined {
	const result = validateContainerNumber(input);
	if (!result.ok) return undefined;
	const { ownerCode, category, serial, checkDigit, normalized, formatted } = result;
	return Object.freeze({ ownerCode, category, serial, checkDigit, normalized, formatted });
}

/** True when `input` is a valid container number (separators and lower case allowed). */
export function isContainerNumber(input: string): boolean {
	return validateContainerNumber(input).ok;
}

/** "csqu-3054383" → "CSQU 305438 3"; input that is not a valid number comes back trimmed. */
export function formatContainerNumber(input: string): string {
	const result = validateContainerNumber(input);
	return result.ok ? result.formatted : input.trim();
}

function invalid(message: string): { readonly ok: false; readonly message: string } {
	return Object.freeze({ ok: false, message });
}
