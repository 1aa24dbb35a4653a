/**
 * Invoice arithmetic: exact decimals, rounded half-up to the currency's ISO 4217 minor unit.
 *
 * Each line amount is rounded once, and the subtotal is the sum of the rounded amounts, so the
 * printed figures add up exactly as printed (common practice on invoices).
 *
 * Pure module: no framework imports.
 */
import Decimal from 'decimal.js';

const Money = Decimal.clone({ precision: 40, rounding: Decimal.ROUND_HALF_UP });

/** `value` rounded half-up to `minorUnits` decimals, as a string with exactly that many. */
export function roundMoney(value: Decimal.Value, minorUnits: number): string {
	return new Money(value).toFixed(minorUnits, Decimal.ROUND_HALF_UP);
}

/** quantity × unit price, rounded to the minor unit. */
export function lineAmount(quantity: number, unitPrice: string, minorUnits: number): string {
	if (!Number.isSafeInteger(quantity)) throw new RangeError('quantity must be a whole number');
	return roundMoney(new Money(unitPrice).times(quantity), minorUnits);
}

/** The exact sum of already-rounded amounts, printed with `minorUnits` decimals. */
export function sumMoney(amounts: readonly string[], minorUnits: number): string {
	return amounts.reduce((sum, a) => sum.plus(a), new Money(0)).toFixed(minorUnits);
}

/** 'A' for the first issue, then 'B'…'Z', 'AA', 'AB'…: the revision letter of issue `index`. */
export function revisionLetter(index: number): string {
	if (!Number.isSafeInteger(index) || index < 0) throw new RangeError('bad revision index');
	let n = index;
	let letters = '';
	do {
		letters = String.fromCharCode(65 + (n % 26)) + letters;
		n = Math.floor(n / 26) - 1;
	} while (n >= 0);
	return letters;
}

/** e.g. ('CI', 2026, 17) → 'CI-2026-00017'. */
export function documentNumber(prefix: string, year: number, sequence: number): string {
	return `${prefix}-${year}-${String(sequence).padStart(5, '0')}`;
}
