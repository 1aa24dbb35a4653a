/**
 * Air freight by weight break. Each break's rate applies from its weight up. The break the
 * chargeable weight falls in applies, unless charging the weight of a higher break at that
 * break's lower rate costs less; then the higher break applies at its weight (common practice,
 * the way carriers rate general cargo). The result is never below the minimum charge.
 */
import type Decimal from 'decimal.js';
import { Exact } from './decimal';
import type { AirBreak } from './types';

export interface AirChoice {
	charge: Decimal;
	/** The break used, and the weight charged at it (≥ the chargeable weight). */
	fromKg: Decimal;
	ratePerKg: Decimal;
	chargedKg: Decimal;
	/** True when the minimum charge applied. */
	minimum: boolean;
	/** The break the weight falls in, when a higher one was cheaper. */
	ownBreak: { fromKg: Decimal; ratePerKg: Decimal; charge: Decimal } | null;
}

/** Cheapest of the weight's own break and every higher break; ties keep the lower break. */
export function chooseAirBreak(
	chargeableKg: Decimal,
	breaks: readonly AirBreak[],
	minimumCharge: Decimal
): AirChoice | null {
	const sorted = breaks
		.map((b) => ({ fromKg: new Exact(b.fromKg), ratePerKg: new Exact(b.ratePerKg) }))
		.sort((a, b) => a.fromKg.comparedTo(b.fromKg));
	let own = -1;
	for (let i = 0; i < sorted.length; i++) if (sorted[i]!.fromKg.lte(chargeableKg)) own = i;
	if (own < 0) return null;
	const ownRow = sorted[own]!;
	const ownCharge = chargeableKg.times(ownRow.ratePerKg);
	let best = { ...ownRow, chargedKg: chargeableKg, charge: ownCharge };
	for (let i = own + 1; i < sorted.length; i++) {
		const b = sorted[i]!;
		const charge = b.fromKg.times(b.ratePerKg);
		if (charge.lt(best.charge)) best = { ...b, chargedKg: b.fromKg, charge };
	}
	const higher = best.fromKg.gt(ownRow.fromKg);
	const minimum = minimumCharge.gt(best.charge);
	return {
		charge: minimum ? minimumCharge : best.charge,
		fromKg: best.fromKg,
		ratePerKg: best.ratePerKg,
		chargedKg: best.chargedKg,
		minimum,
		ownBreak: higher ? { ...ownRow, charge: ownCharge } : null
	};
}
