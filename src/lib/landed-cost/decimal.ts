/**
 * Decimal helpers for the landed-cost engine (internal): one decimal.js constructor, parsing of
 * decimal strings, rounding to a currency's minor unit or to a country's multiple, and the
 * validity check of reference rows.
 */
import Decimal from 'decimal.js';
import { minorUnits } from '../reference/currencies';
import type { ReferenceRow, RoundingRule } from './types';

export const Exact = Decimal.clone({
	precision: 50,
	rounding: Decimal.ROUND_HALF_UP,
	toExpNeg: -30,
	toExpPos: 40
});
export type Dec = Decimal;

export const ZERO = new Exact(0);
export const HUNDRED = new Exact(100);

const DECIMAL_PATTERN = /^-?\d+(\.\d+)?$/;

/** True when `value` is a plain decimal string such as '12', '0.35' or '-1.5'. */
export function isDecimalString(value: unknown): value is string {
	return typeof value === 'string' && DECIMAL_PATTERN.test(value);
}

export function dec(value: string | number | Decimal): Decimal {
	return new Exact(value);
}

const digitsCache = new Map<string, number>();

/** Minor-unit digits of a currency; 2 for an unknown code (validation reports those first). */
export function digits(currency: string): number {
	let d = digitsCache.get(currency);
	if (d === undefined) {
		d = minorUnits(currency) ?? 2;
		digitsCache.set(currency, d);
	}
	return d;
}

/** `value` half-up to the currency's minor unit (ISO 4217 via currency-codes). */
export function roundMinor(value: Decimal, currency: string): Decimal {
	return value.toDecimalPlaces(digits(currency), Decimal.ROUND_HALF_UP);
}

/** A figure printed with exactly the currency's minor-unit digits ('1400.00', '1502', '1.250'). */
export function money(value: Decimal, currency: string): string {
	return value.toFixed(digits(currency), Decimal.ROUND_HALF_UP);
}

const MODES = { down: Decimal.ROUND_DOWN, half_up: Decimal.ROUND_HALF_UP, up: Decimal.ROUND_UP };

/** `value` rounded to a multiple of `rule.multiple` (e.g. down to whole units, or to 1000). */
export function roundToRule(value: Decimal, rule: RoundingRule): Decimal {
	const step = new Exact(rule.multiple);
	return value.dividedBy(step).toDecimalPlaces(0, MODES[rule.mode]).times(step);
}

/** The rule in words, for the trail: 'down to a multiple of 1'. */
export function ruleWords(rule: RoundingRule): string {
	const how = rule.mode === 'half_up' ? 'half up' : rule.mode;
	return `${how} to a multiple of ${rule.multiple}`;
}

/** True when the row applies on `date` (ISO dates compare as strings). */
export function inForce(row: Pick<ReferenceRow, 'validFrom' | 'validTo'>, date: string): boolean {
	return row.validFrom <= date && (row.validTo === null || date <= row.validTo);
}

const percentCache = new Map<string, Decimal>();

/** Percent string → fraction: '10' → 0.1 (cached: a shipment repeats the same few rates). */
export function percent(value: string): Decimal {
	let p = percentCache.get(value);
	if (p === undefined) {
		p = new Exact(value).dividedBy(HUNDRED);
		if (percentCache.size < 1000) percentCache.set(value, p);
	}
	return p;
}
