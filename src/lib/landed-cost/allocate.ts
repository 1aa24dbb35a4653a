/**
 * Largest-remainder allocation (Hamilton's method): a total in minor units is shared out in
 * proportion to weights so that the shares add up to the total exactly. Each share first gets the
 * floor of its exact quota; the units left over go one each to the largest fractional remainders
 * (ties to the earlier line). dinero.js `allocate` hands leftovers to the first shares instead,
 * so it is not used here.
 */
import type Decimal from 'decimal.js';
import { Exact, ZERO } from './decimal';

/**
 * Shares of `total` (already a multiple of 10^-minor, ≥ 0) in proportion to `weights` (≥ 0).
 * When every weight is zero the total is shared equally.
 */
export function allocateLargestRemainder(
	total: Decimal,
	weights: readonly Decimal[],
	minor: number
): Decimal[] {
	const n = weights.length;
	if (n === 0) return [];
	const scale = new Exact(10).pow(minor);
	const units = total.times(scale);
	const sum = weights.reduce((s, w) => s.plus(w), ZERO);
	const effective = sum.isZero() ? weights.map(() => new Exact(1)) : weights;
	const divisor = sum.isZero() ? new Exact(n) : sum;
	const floors: Decimal[] = new Array<Decimal>(n);
	const remainders: { index: number; rest: Decimal }[] = new Array(n);
	let given = ZERO;
	for (let i = 0; i < n; i++) {
		const quota = units.times(effective[i]!).dividedBy(divisor);
		const floor = quota.floor();
		floors[i] = floor;
		remainders[i] = { index: i, rest: quota.minus(floor) };
		given = given.plus(floor);
	}
	let left = units.minus(given).toNumber();
	remainders.sort((a, b) => b.rest.comparedTo(a.rest) || a.index - b.index);
	for (let k = 0; left > 0 && k < n; k++, left--) {
		const i = remainders[k]!.index;
		floors[i] = floors[i]!.plus(1);
	}
	return floors.map((f) => f.dividedBy(scale));
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
	const scale = new Exact(10).pow(minor);
	const units = total.times(scale);
	const base = units.dividedBy(quantity).floor();
	const extra = units.minus(base.times(quantity)).toNumber();
	const low = { amount: base.dividedBy(scale), units: quantity - extra };
	const high = { amount: base.plus(1).dividedBy(scale), units: extra };
	return [low, high].filter((s) => s.units > 0);
}
