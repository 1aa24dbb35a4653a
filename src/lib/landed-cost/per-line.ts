/**
 * Per-line shares of every component in the report currency (largest remainder, so each column
 * adds up to its component exactly) and the per-unit split of each line's total. Works in whole
 * minor units (BigInt) so that 500 lines × 9 columns stay cheap.
 */
import type Decimal from 'decimal.js';
import { allocateUnits, formatUnits, splitUnits, toUnits } from './allocate';
import { digits } from './decimal';
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
	const columns = {} as Record<CostKey, bigint[]>;
	for (const key of COST_KEYS) {
		columns[key] = allocateUnits(toUnits(shares[key].total, minor), shares[key].weights);
	}
	return lines.map((line, i) => {
		const lineShares = {} as Record<CostKey, string>;
		let total = 0n;
		for (const key of COST_KEYS) {
			const v = columns[key][i]!;
			lineShares[key] = formatUnits(v, minor);
			total += v;
		}
		return {
			ref: line.ref,
			sku: line.sku,
			quantity: line.quantity,
			hsCode: line.hsCode,
			tariffRowId: tariffRowIds[i]!,
			customsValue: customsValues[i]!,
			shares: lineShares,
			total: formatUnits(total, minor),
			perUnit: splitUnits(total, line.quantity).map((s) => ({
				amount: formatUnits(s.amount, minor),
				units: s.units
			}))
		};
	});
}
