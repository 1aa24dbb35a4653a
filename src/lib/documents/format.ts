/**
 * How the papers print figures that were computed upstream: thousands separators and a fixed
 * number of decimals. Nothing here rounds: a value with more decimals than it may print is a bug
 * in whatever built the snapshot, so it throws rather than hide it.
 *
 * Pure module: no framework imports.
 */

const DECIMAL = /^(-?)(\d+)(?:\.(\d+))?$/;

function group(digits: string): string {
	return digits.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
}

/**
 * '1234567.5' with 2 decimals → '1,234,567.50'; '1235' with 0 → '1,235'. Throws on a string that
 * is not a plain decimal number or that has more decimals than `decimals`.
 */
export function formatFixed(value: string, decimals: number, what = 'value'): string {
	if (!Number.isInteger(decimals) || decimals < 0 || decimals > 8) {
		throw new RangeError(`Cannot print ${what} with ${decimals} decimals`);
	}
	const m = DECIMAL.exec(value);
	if (!m) throw new RangeError(`Cannot print ${what} '${value}': not a decimal number`);
	const [, sign, whole, fraction = ''] = m;
	if (fraction.length > decimals) {
		throw new RangeError(
			`Cannot print ${what} '${value}' with ${decimals} decimals: it must be rounded before printing`
		);
	}
	const digits = group(whole!.replace(/^0+(?=\d)/, ''));
	const tail = decimals > 0 ? `.${fraction.padEnd(decimals, '0')}` : '';
	const zero = /^0*$/.test(whole! + fraction);
	return `${zero ? '' : sign}${digits}${tail}`;
}

/** An amount in a currency with `minorUnits` decimals (ISO 4217 minor unit). */
export function formatAmount(value: string, minorUnits: number): string {
	return formatFixed(value, minorUnits, 'amount');
}

/** Kilograms to the gram: '1234.5' → '1,234.500'. */
export function formatKg(value: string): string {
	return formatFixed(value, 3, 'mass');
}

/** Cubic metres with 3 decimals: '2.4' → '2.400'. */
export function formatM3(value: string): string {
	return formatFixed(value, 3, 'volume');
}

/** Whole millimetres, length × width × height: '600 × 400 × 300'. */
export function formatDims(lengthMm: number, widthMm: number, heightMm: number): string {
	for (const n of [lengthMm, widthMm, heightMm]) {
		if (!Number.isSafeInteger(n) || n < 0) {
			throw new RangeError(`Cannot print dimension ${n}: whole millimetres expected`);
		}
	}
	return `${lengthMm} × ${widthMm} × ${heightMm}`;
}

/** A whole count with thousands separators: 12500 → '12,500'. */
export function formatCount(n: number): string {
	if (!Number.isSafeInteger(n))
		throw new RangeError(`Cannot print count ${n}: whole number expected`);
	return formatFixed(String(n), 0, 'count');
}

/** 'Page 2 of 7'. */
export function pageLabel(page: number, pages: number): string {
	return `Page ${page} of ${pages}`;
}
