/**
 * Problems: what is wrong with an input, and where (a dotted path such as "lines.2.quantity",
 * the same form the API uses for zod issues). Shared checks so the schema and the functions
 * word them alike.
 */

export interface Problem {
	/** Dotted path to the field, e.g. "products.0.packaging.cartonGrossKg". */
	path: string;
	message: string;
}

/** Non-negative decimal: "25", "0.5". No sign, exponent, spaces; at most 9 whole digits. */
export const DECIMAL_PATTERN = /^(0|[1-9][0-9]{0,8})(\.[0-9]{1,6})?$/;

/** Largest length accepted anywhere (mm): 100 m. Keeps the layer search bounded. */
export const MAX_MM = 100_000;
/** Largest count (units, cartons) accepted. */
export const MAX_COUNT = 1_000_000_000;

export const MESSAGES = {
	positiveInt: `Enter a whole number from 1 to ${MAX_COUNT}.`,
	positiveMm: `Enter a length in whole millimetres, from 1 to ${MAX_MM}.`,
	decimal: 'Enter a number of kilograms such as "12.5" (up to 6 decimals, no sign).',
	positiveDecimal: 'Enter a number of kilograms above 0, such as "12.5" (up to 6 decimals).'
} as const;

export function joinPath(prefix: string, path: string): string {
	if (prefix === '') return path;
	return path === '' ? prefix : `${prefix}.${path}`;
}

export function prefixProblems(prefix: string, problems: readonly Problem[]): Problem[] {
	return problems.map((p) => ({ path: joinPath(prefix, p.path), message: p.message }));
}

export function isPositiveInt(value: unknown, max = MAX_COUNT): value is number {
	return typeof value === 'number' && Number.isSafeInteger(value) && value > 0 && value <= max;
}

export function isDecimalString(value: unknown): value is string {
	return typeof value === 'string' && DECIMAL_PATTERN.test(value);
}

export function isPositiveDecimalString(value: unknown): value is string {
	return isDecimalString(value) && /[1-9]/.test(value);
}

/** Collects problems for the named fields of `value` that must be whole millimetres. */
export function checkMillimetres(
	value: Record<string, unknown>,
	fields: readonly string[],
	problems: Problem[],
	prefix = ''
): void {
	for (const field of fields) {
		if (!isPositiveInt(value[field], MAX_MM)) {
			problems.push({ path: joinPath(prefix, field), message: MESSAGES.positiveMm });
		}
	}
}
