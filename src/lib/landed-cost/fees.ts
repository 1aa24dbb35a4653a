/**
 * Customs fees of the destination: each fee code's row in force on the date, charged only for
 * its modes (e.g. the US harbor maintenance fee, sea only, 19 CFR 24.24), ad valorem on the
 * customs value within its minimum and maximum (e.g. the US merchandise processing fee, 19 CFR
 * 24.23, whose bounds change each fiscal year) or a fixed amount. Rounded half-up to the minor
 * unit. A fee code with rows but none in force is reported, not skipped.
 */
import type Decimal from 'decimal.js';
import { whyNotInForce, type Context } from './context';
import { Exact, inForce, money, percent, roundMinor } from './decimal';
import type { Fee, TransportMode } from './types';

export interface FeeAmount {
	fee: Fee;
	amount: Decimal;
	formula: string;
}

function feeAmount(fee: Fee, customsValue: Decimal, currency: string): FeeAmount {
	if (fee.kind === 'fixed') {
		return { fee, amount: roundMinor(new Exact(fee.amount ?? '0'), currency), formula: 'fixed' };
	}
	const raw = customsValue.times(percent(fee.ratePercent ?? '0'));
	let amount = raw;
	const bounds: string[] = [];
	if (fee.min !== null) {
		bounds.push(`minimum ${fee.min}`);
		amount = Exact.max(amount, fee.min);
	}
	if (fee.max !== null) {
		bounds.push(`maximum ${fee.max}`);
		amount = Exact.min(amount, fee.max);
	}
	const core = `${fee.ratePercent} % × customs value ${money(customsValue, currency)} = ${raw.toString()}`;
	return {
		fee,
		amount: roundMinor(amount, currency),
		formula: bounds.length ? `${core}, within ${bounds.join(' and ')}` : core
	};
}

export function customsFees(
	fees: readonly Fee[],
	mode: TransportMode,
	customsValue: Decimal,
	currency: string,
	ctx: Context
): FeeAmount[] {
	const byCode = new Map<string, Fee[]>();
	for (const fee of fees) byCode.set(fee.code, [...(byCode.get(fee.code) ?? []), fee]);
	const out: FeeAmount[] = [];
	for (const [code, rows] of byCode) {
		const row = rows.find((r) => inForce(r, ctx.date));
		if (row === undefined) {
			const latest = rows.reduce((a, b) => (a.validFrom > b.validFrom ? a : b));
			ctx.miss(
				`country.fees[${code}]`,
				`fee ${code} (row ${latest.id}) is ${whyNotInForce(latest, ctx.date)}; no version in force on ${ctx.date}`
			);
			continue;
		}
		if (row.modes !== null && !row.modes.includes(mode)) continue;
		ctx.used({
			kind: 'fee',
			id: row.id,
			source: row.source,
			validFrom: row.validFrom,
			validTo: row.validTo
		});
		out.push(feeAmount(row, customsValue, currency));
	}
	return out;
}
