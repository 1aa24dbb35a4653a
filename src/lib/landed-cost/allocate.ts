/**
 * Largest-remainder allocation (Hamilton's method): a total in minor units is shared out in
 * proportion to weights so that the shares add up to the total exactly. Each share first gets the
 * floor of its exact quota; the units left over go one each to the largest fractional remainders
 * (ties to the earlier line). dinero.js `allocate` hands leftovers to the first shares instead,
 * so it is not used here. The arithmetic is in BigInt (exact, and fast enough for 500-line
 * shipments with a dozen columns); weights are scaled to whole numbers first.
 */
import type Decimal from 'decimal.js';
import { Exact } from './decimal';

interface ScaledWeights {
	values: bigint[];
	sum: bigint;
}

// The same weight arrays are used for several columns; scale each array once.
const scaledCache = new WeakMap<readonly Decimal[], ScaledWeights>();

export function toUnits(value: Decimal, places: number): bigint {
	return BigInt(value.toFixed(places, Exact.ROUND_DOWN).replace('.', ''));
}

function scaled(weights: readonly Decimal[]): ScaledWeights {
	const hit = scaledCache.get(weights);
	if (hit) return hit;
	const places = weights.reduce((p, w) => Math.max(p, w.decimalPlaces()), 0);
	let values = weights.map((w) => toUnits(w, places));
	let sum = values.reduce((s, v) => s + v, 0n);
	if (sum === 0n) {
		values = weights.map(() => 1n);
		sum = BigInt(weights.length);
	}
	const result = { values, sum };
	scaledCache.set(weights, result);
	return result;
}

/** Minor units → decimal string: 12345n with 2 digits → '123.45'. */
export function formatUnits(units: bigint, minor: number): string {
	if (minor === 0) return units.toString();
	const negative = units < 0n;
	const digits = (negative ? -units : units).toString().padStart(minor + 1, '0');
	const text = `${digits.slice(0, -minor)}.${digits.slice(-minor)}`;
	return negative ? `-${text}` : text;
}

function fromUnits(units: bigint, minor: number): Decimal {
	return new Exact(formatUnits(units, minor));
}

/**
 * Shares of `total` (already a multiple of 10^-minor, ≥ 0) in proportion to `weights` (≥ 0).
 * When every weight is zero the total is shared equally.
 */
export function allocateLargestRemainder(
	total: Decimal,
	weights: readonly Decimal[],
	minor: number
): Decimal[] {
	return allocateUnits(toUnits(total, minor), weights).map((f) => fromUnits(f, minor));
}

/** The same in whole minor units: `units` shared out by `weights`, as BigInts. */
export function allocateUnits(units: bigint, weights: readonly Decimal[]): bigint[] {
	const n = weights.length;
	if (n === 0) return [];
	const { values, sum } = scaled(weights);
	const floors: bigint[] = new Array<bigint>(n);
	const order: { index: number; rest: bigint }[] = new Array(n);
	let given = 0n;
	for (let i = 0; i < n; i++) {
		const numerator = units * values[i]!;
		const floor = numerator / sum;
		floors[i] = floor;
		order[i] = { index: i, rest: numerator - floor * sum };
		given += floor;
	}
	let left = units - given;
	if (left > 0n) {
		order.sort((a, b) => (b.rest > a.rest ? 1 : b.rest < a.rest ? -1 : a.index - b.index));
		for (let k = 0; left > 0n && k < n; k++, left--) floors[order[k]!.index]! += 1n;
	}
	return floors;
}

/**
 * A line total over its units: `quantity − k` units at the floor amount and `k` units one minor
 * unit more, so amount × units adds back to the total exactly. At most two entries.
 */
export function splitOverUnits(
	total: Decimal,
	quantity: number,
	minor: number
): { amount: Decimal; units: number }[] {
	return splitUnits(toUnits(total, minor), quantity).map((s) => ({
		amount: fromUnits(s.amount, minor),
		units: s.units
	}));
}

/** The same in whole minor units. */
export function splitUnits(total: bigint, quantity: number): { amount: bigint; units: number }[] {
	const q = BigInt(quantity);
	const base = total / q;
	const extra = Number(total - base * q);
	const low = { amount: base, units: quantity - extra };
	const high = { amount: base + 1n, units: extra };
	return [low, high].filter((s) => s.units > 0);
}
