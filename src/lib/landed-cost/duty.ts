/**
 * Duty of one line from its tariff row: ad valorem (rate × the line's customs value), specific
 * (an amount per unit or per net kg) or compound (both added). Exact; the engine rounds the
 * declaration's total by the country's rule.
 */
import type Decimal from 'decimal.js';
import { Exact, percent } from './decimal';
import type { DutyRate, LandedCostLine } from './types';

export interface LineDuty {
	amount: Decimal;
	formula: string;
}

/** `specificFactor` converts the specific amount's currency to the customs currency. */
export function lineDuty(
	rate: DutyRate,
	base: Decimal,
	line: LandedCostLine,
	specificFactor: Decimal
): LineDuty {
	const adValorem = (ratePercent: string) => ({
		amount: base.times(percent(ratePercent)),
		formula: `${ratePercent} % × ${base.toString()}`
	});
	const specific = (amount: string, per: 'unit' | 'kg', currency: string) => {
		const n = per === 'unit' ? new Exact(line.quantity) : new Exact(line.netKg);
		const fx = specificFactor.eq(1)
			? ''
			: ` × ${specificFactor.toSignificantDigits(10).toString()}`;
		return {
			amount: n.times(amount).times(specificFactor),
			formula: `${n.toString()} ${per === 'unit' ? 'units' : 'kg net'} × ${amount} ${currency}${fx}`
		};
	};
	switch (rate.kind) {
		case 'ad_valorem':
			return adValorem(rate.ratePercent);
		case 'specific':
			return specific(rate.amount, rate.per, rate.currency);
		case 'compound': {
			const a = adValorem(rate.ratePercent);
			const s = specific(rate.amount, rate.per, rate.currency);
			return { amount: a.amount.plus(s.amount), formula: `${a.formula} + ${s.formula}` };
		}
	}
}
