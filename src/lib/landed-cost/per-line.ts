/**
 * Per-line shares of every component in the report currency (largest remainder, so each column
 * adds up to its component exactly) and the per-unit split of each line's total.
 */
import type Decimal from 'decimal.js';
import { allocateLargestRemainder, splitOverUnits } from './allocate';
import { ZERO, digits, money } from './decimal';
import { COST_KEYS, type Amount, type CostKey, type LandedCostLine, type LineCost } from './types';

/** For each component: its report-currency total and the weights to share it by. */
export type Shares = Record<CostKey, { total: Decimal; weights: Decimal[] }>;

export function perLine(
	lines: readonly LandedCostLine[],
	shares: Shares,
	customsValues: readonly Amount[],
	tariffRowIds: readonly string[],
	currency: string
): LineCost[] {
	const minor = digits(currency);
	const columns = {} as Record<CostKey, Decimal[]>;
	for (const key of COST_KEYS) {
		columns[key] = allocateLargestRemainder(shares[key].total, shares[key].weights, minor);
	}
	return lines.map((line, i) => {
		const lineShares = {} as Record<CostKey, string>;
		let total = ZERO;
		for (const key of COST_KEYS) {
			const v = columns[key][i]!;
			lineShares[key] = money(v, currency);
			total = total.plus(v);
		}
		return {
			ref: line.ref,
			sku: line.sku,
			quantity: line.quantity,
			hsCode: line.hsCode,
			tariffRowId: tariffRowIds[i]!,
			customsValue: customsValues[i]!,
			shares: lineShares,
			total: money(total, currency),
			perUnit: splitOverUnits(total, line.quantity, minor).map((s) => ({
				amount: money(s.amount, currency),
				units: s.units
			}))
		};
	});
}
