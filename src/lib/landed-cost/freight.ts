/**
 * Base freight per mode from the rate card and the measures, before surcharges:
 * - air: weight breaks with the "higher break when cheaper" rule and a minimum (air-breaks.ts);
 * - sea_fcl: rate per container type × the load plan's containers;
 * - sea_lcl: rate per revenue tonne, weight or measure with 1 t = 1 m³ (common practice), at least
 *   the card's minimum W/M, never below the minimum charge;
 * - road: per chargeable kg or per pallet, with a minimum;
 * - courier: chargeable kg in 0.5 kg steps, the first step at one price and each further step at
 *   another (common practice in express tariffs).
 */
import type Decimal from 'decimal.js';
import { chooseAirBreak } from './air-breaks';
import type { Quantities } from './charges';
import type { Context } from './context';
import { Exact, money, roundMinor } from './decimal';
import type { Piece } from './piece';
import type { RateCard, SeaLclRateCard } from './types';

const HALF_KG = new Exact('0.5');
const KG_PER_TONNE = new Exact(1000);

/** Revenue tonnes: max(gross t, m³, minimum), 1 t = 1 m³ (common practice). */
export function revenueTonnes(grossKg: Decimal, volumeM3: Decimal, minimum: Decimal): Decimal {
	return Exact.max(grossKg.dividedBy(KG_PER_TONNE), volumeM3, minimum);
}

function lcl(card: SeaLclRateCard, q: Quantities): { amount: Decimal; formula: string } {
	const amount = Exact.max(q.revenueTonnes.times(card.ratePerWm), card.minimumCharge);
	const wm = `${q.revenueTonnes.toString()} W/M × ${card.ratePerWm}`;
	return { amount, formula: `max(minimum ${card.minimumCharge}, ${wm})` };
}

function computed(card: RateCard, q: Quantities, ctx: Context) {
	switch (card.mode) {
		case 'air': {
			const choice = chooseAirBreak(q.chargeableKg, card.breaks, new Exact(card.minimumCharge));
			if (choice === null) {
				ctx.miss('rateCard.breaks', `rate card ${card.id} has no weight break from 0 kg`);
				return null;
			}
			const at = `${choice.chargedKg.toString()} kg × ${choice.ratePerKg.toString()} at the ${choice.fromKg.toString()} kg break`;
			const cheaper = choice.ownBreak
				? `, cheaper than ${q.chargeableKg.toString()} kg × ${choice.ownBreak.ratePerKg.toString()} at the ${choice.ownBreak.fromKg.toString()} kg break = ${money(choice.ownBreak.charge, card.currency)}`
				: '';
			return {
				amount: choice.charge,
				formula: `max(minimum ${card.minimumCharge}, ${at}${cheaper})`
			};
		}
		case 'sea_fcl': {
			if (q.containers.length === 0) {
				ctx.miss('measures.containers', 'sea_fcl needs the containers from the load plan');
				return null;
			}
			let amount = new Exact(0);
			const parts: string[] = [];
			for (const [i, c] of q.containers.entries()) {
				const rate = card.containerRates.find((r) => r.typeCode === c.typeCode);
				if (rate === undefined) {
					ctx.miss(
						`measures.containers[${i}].typeCode`,
						`rate card ${card.id} has no rate for container type ${c.typeCode}`
					);
					continue;
				}
				amount = amount.plus(new Exact(rate.ratePerContainer).times(c.count));
				parts.push(`${c.count} × ${c.typeCode} at ${rate.ratePerContainer}`);
			}
			return { amount, formula: parts.join(' + ') };
		}
		case 'sea_lcl':
			return lcl(card, q);
		case 'road': {
			const n = card.basis === 'per_kg' ? q.chargeableKg : new Exact(q.pallets);
			const unit = card.basis === 'per_kg' ? 'chargeable kg' : 'pallets';
			const raw = n.times(card.rate);
			const amount = raw.lt(card.minimumCharge) ? new Exact(card.minimumCharge) : raw;
			return {
				amount,
				formula: `max(minimum ${card.minimumCharge}, ${n.toString()} ${unit} × ${card.rate})`
			};
		}
		case 'courier': {
			const steps = Exact.max(q.chargeableKg.dividedBy(HALF_KG).ceil(), 1);
			const amount = new Exact(card.firstHalfKg).plus(steps.minus(1).times(card.additionalHalfKg));
			return {
				amount,
				formula: `${q.chargeableKg.toString()} kg = ${steps.toString()} steps of 0.5 kg: first ${card.firstHalfKg} + ${steps.minus(1).toString()} × ${card.additionalHalfKg}`
			};
		}
	}
}

/** The base freight piece in the card's currency, or null when the card cannot price it. */
export function baseFreight(card: RateCard, q: Quantities, ctx: Context): Piece | null {
	const result = computed(card, q, ctx);
	if (result === null) return null;
	return {
		key: 'freight.base',
		label: `Base freight (${card.mode}, ${card.laneFrom} → ${card.laneTo})`,
		amount: roundMinor(result.amount, card.currency),
		currency: card.currency,
		formula: result.formula,
		inputs: [
			{ label: 'chargeable kg', value: q.chargeableKg.toString() },
			{ label: 'gross kg', value: q.grossKg.toString() }
		],
		rowId: card.id,
		source: card.source
	};
}

/** The minimum W/M of an LCL card, 0 for the other modes. */
export function minimumWm(card: RateCard | null): Decimal {
	return card?.mode === 'sea_lcl' ? new Exact(card.minimumWm) : new Exact(0);
}
