/**
 * Shared decimal helpers for the packing module (internal; not re-exported by index.ts).
 *
 * Every quantity is a decimal.js value from the `Exact` constructor: 60 significant digits, so
 * products and sums of millimetres, counts and gram-precision masses stay exact; only divisions
 * (mm → inches, cm³ ÷ 6000…) can be inexact, and those are rounded explicitly where they are shown.
 */
import Decimal from 'decimal.js';

export const Exact = Decimal.clone({
	precision: 60,
	rounding: Decimal.ROUND_HALF_UP,
	toExpNeg: -40,
	toExpPos: 60
});

/** A decimal quantity: a decimal.js value, a decimal string, or a whole JS number. */
export type DecimalInput = Decimal | string | number;

/**
 * The exact decimal for `value`. JS numbers are accepted only when they are safe integers
 * (millimetres, counts): a fractional number has already lost exactness, so pass a string.
 */
export function exact(value: DecimalInput): Decimal {
	if (typeof value === 'number' && !Number.isSafeInteger(value)) {
		throw new RangeError(
			`expected a whole number, got ${String(value)}; pass non-integers as decimal strings`
		);
	}
	return new Exact(value);
}

export const ZERO = new Exact(0);
export const MM3_PER_M3 = new Exact('1e9');
/** 1e-9 exactly: multiplying by it equals dividing by 1e9, without long division. */
export const M3_PER_MM3 = new Exact('1e-9');

/** Mass for output: kilograms to 3 decimals (gram precision), half up. */
export function kgOut(kg: Decimal): string {
	return kg.toFixed(3, Decimal.ROUND_HALF_UP);
}

/** Volume for output: cubic metres to 6 decimals (one cubic centimetre), half up. */
export function m3Out(m3: Decimal): string {
	return m3.toFixed(6, Decimal.ROUND_HALF_UP);
}

/** Smallest multiple of `step` that is ≥ `value` (step > 0). */
export function ceilToStep(value: Decimal, step: Decimal): Decimal {
	return value.dividedBy(step).ceil().times(step);
}

/** Greater of two decimals (the first on a tie). */
export function maxOf(a: Decimal, b: Decimal): Decimal {
	return b.greaterThan(a) ? b : a;
}

/**
 * The exact product of whole numbers. JS multiplies them exactly while the result stays a safe
 * integer (a result past 2^53 is never reported as safe), so decimal.js is needed only beyond.
 */
export function wholeProduct(...factors: number[]): Decimal {
	let product = 1;
	for (const f of factors) product *= f;
	if (Number.isSafeInteger(product)) return new Exact(product);
	return factors.reduce((acc: Decimal, f) => acc.times(f), new Exact(1));
}

/** Volume in m³ of a box in whole millimetres, exact. */
export function boxM3(lengthMm: number, widthMm: number, heightMm: number): Decimal {
	return wholeProduct(lengthMm, widthMm, heightMm).times(M3_PER_MM3);
}

/** Thousands separators (commas) in the integer part of a plain decimal string. */
export function group(plain: string): string {
	// A slice per three digits: the explanation steps call this thousands of times per measure.
	const start = plain.startsWith('-') ? 1 : 0;
	const dot = plain.indexOf('.');
	const end = dot === -1 ? plain.length : dot;
	if (end - start <= 3) return plain;
	let at = start + ((end - start) % 3 || 3);
	let out = plain.slice(0, at);
	for (; at < end; at += 3) out += `,${plain.slice(at, at + 3)}`;
	return out + plain.slice(end);
}

/**
 * A number for an explanation step: at most `dp` decimals, trailing zeros dropped, thousands
 * grouped, prefixed with "≈" when rounding changed it.
 */
export function show(value: Decimal, dp = 3): string {
	const rounded = value.toDecimalPlaces(dp, Decimal.ROUND_HALF_UP);
	return (rounded.equals(value) ? '' : '≈') + group(rounded.toFixed());
}
