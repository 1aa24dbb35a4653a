/**
 * Exact quantities counted in a small whole unit (milligrams, cubic millimetres), for the
 * per-line arithmetic of measure(): a plain JS number while it is a safe integer, a decimal.js
 * value of the same unit beyond. decimal.js costs about a microsecond per operation and
 * measure() does thousands per shipment; whole numbers cost next to nothing.
 *
 * Why the number branch is exact: its operands are safe integers (|x| ≤ 2^53 − 1). IEEE 754
 * rounds a product, sum or difference correctly, so while the true result is itself a safe
 * integer it is represented exactly; when it is not, the rounded result is ≥ 2^53 in magnitude
 * (rounding is monotonic and 2^53 is representable), `Number.isSafeInteger` rejects it and the
 * operation is redone in decimal.js. Nothing here ever divides in floating point.
 *
 * Pure module: no framework imports.
 */
import Decimal from 'decimal.js';
import { Exact, group, show } from './exact';

/** A whole number of some small unit: exact either way. */
export type Whole = number | Decimal;

/** Input kilograms have at most 6 decimals and 9 whole digits: at most 999 999 999 999 999 mg. */
const KG_PATTERN = /^([0-9]{1,9})(?:\.([0-9]{1,6}))?$/;
const MG_PER_KG = new Exact('1e6');

/** Whole milligrams of a decimal string of kilograms ("12.5" → 12 500 000). */
export function mgOfKg(kg: string): Whole {
	const match = KG_PATTERN.exec(kg);
	// At most 15 digits: Number() reads them exactly.
	if (match !== null) return Number(match[1] + (match[2] ?? '').padEnd(6, '0'));
	return new Exact(kg).times(MG_PER_KG);
}

export function wholeTimes(a: Whole, n: number): Whole {
	if (typeof a === 'number' && Number.isSafeInteger(n)) {
		const product = a * n;
		if (Number.isSafeInteger(product)) return product;
	}
	return new Exact(a).times(n);
}

export function wholePlus(a: Whole, b: Whole): Whole {
	if (typeof a === 'number' && typeof b === 'number') {
		const sum = a + b;
		if (Number.isSafeInteger(sum)) return sum;
	}
	return new Exact(a).plus(b);
}

export function wholeMinus(a: Whole, b: Whole): Whole {
	if (typeof a === 'number' && typeof b === 'number') {
		const difference = a - b;
		if (Number.isSafeInteger(difference)) return difference;
	}
	return new Exact(a).minus(b);
}

/** ⌊a ÷ b⌋ for a ≥ 0 and b > 0 (how many cartons a mass allows), as a JS number. */
export function wholeFloorDiv(a: Whole, b: Whole): number {
	if (typeof a === 'number' && typeof b === 'number' && a >= 0 && b > 0) {
		// a − (a mod b) is an exact multiple of b, so the quotient is a whole number, exactly divided.
		return (a - (a % b)) / b;
	}
	return new Exact(a).dividedBy(b).floor().toNumber();
}

/** The product of whole numbers (mm × mm × mm…), exact. */
export function wholeProductOf(...factors: number[]): Whole {
	let product: Whole = 1;
	for (const f of factors) product = wholeTimes(product, f);
	return product;
}

export function wholeEquals(a: Whole, b: Whole): boolean {
	if (typeof a === 'number' && typeof b === 'number') return a === b;
	return new Exact(a).equals(b);
}

export function wholeLessThan(a: Whole, b: Whole): boolean {
	if (typeof a === 'number' && typeof b === 'number') return a < b;
	return new Exact(a).lessThan(b);
}

/** The quantity in the large unit (kg, m³) as a decimal: `w` × 10^−shift, exact. */
export function wholeToDecimal(w: Whole, shift: number): Decimal {
	return new Exact(w).times(new Exact(`1e-${shift}`));
}

const POW10 = [1, 10, 100, 1000, 10_000, 100_000, 1_000_000, 10_000_000, 100_000_000, 1e9];

/**
 * `w` × 10^−shift to `dp` decimals, half up (as decimal.js `toFixed(dp, ROUND_HALF_UP)`):
 * kilograms to grams from milligrams is (w, 6, 3), cubic metres from mm³ to 6 decimals (w, 9, 6).
 */
export function wholeFixed(w: Whole, shift: number, dp: number): string {
	if (typeof w === 'number' && w >= 0 && dp >= 1 && dp <= shift && shift <= 9) {
		const step = POW10[shift - dp] ?? 1;
		const rest = w % step; // exact for integers
		// (w − rest) is a multiple of step, so the quotient is a whole number and exactly divided.
		const rounded = (w - rest) / step + (2 * rest >= step ? 1 : 0);
		const unit = POW10[dp] ?? 1;
		const fraction = rounded % unit;
		// Padding by prefix: the hot path of measure() formats several figures per line.
		const digits = String(fraction + unit); // "1" followed by exactly dp digits
		return `${(rounded - fraction) / unit}.${digits.slice(1)}`;
	}
	return wholeToDecimal(w, shift).toFixed(dp, Decimal.ROUND_HALF_UP);
}

/** `w` × 10^−shift with every decimal and no trailing zeros (as decimal.js `toFixed()`). */
export function wholePlain(w: Whole, shift: number): string {
	if (typeof w === 'number' && w >= 0 && shift >= 1 && shift <= 9) {
		const unit = POW10[shift] ?? 1;
		let fraction = w % unit; // exact for integers
		const whole = (w - fraction) / unit; // a whole number, exactly divided
		if (fraction === 0) return String(whole);
		let places = shift;
		while (fraction % 10 === 0) {
			fraction /= 10;
			places -= 1;
		}
		return `${whole}.${String(fraction + (POW10[places] ?? 1)).slice(1)}`;
	}
	return wholeToDecimal(w, shift).toFixed();
}

/** A whole number for an explanation step, thousands grouped (as `show` of its decimal). */
export function showWhole(w: Whole): string {
	return typeof w === 'number' ? group(String(w)) : show(w);
}
