/**
 * One charge (surcharge, origin or destination charge, brokerage) on the shipment's quantities.
 * See `ChargeBasis` in types.ts for what each basis multiplies.
 */
import type Decimal from 'decimal.js';
import { Exact, money, percent, roundMinor } from './decimal';
import type { Piece } from './piece';
import type { Charge } from './types';

/** The quantities a charge can be multiplied by. */
export interface Quantities {
	grossKg: Decimal;
	chargeableKg: Decimal;
	revenueTonnes: Decimal;
	pallets: number;
	containers: { typeCode: string; count: number }[];
}

/** The base freight a percent_of_freight charge applies to, in its currency. */
export interface FreightBase {
	amount: Decimal;
	currency: string;
}

function multiplier(charge: Charge, q: Quantities): { n: Decimal; words: string } {
	switch (charge.basis) {
		case 'per_shipment':
			return { n: new Exact(1), words: 'per shipment' };
		case 'per_kg':
			return { n: q.grossKg, words: `${q.grossKg.toString()} kg gross` };
		case 'per_chargeable_kg':
			return { n: q.chargeableKg, words: `${q.chargeableKg.toString()} chargeable kg` };
		case 'per_wm':
			return { n: q.revenueTonnes, words: `${q.revenueTonnes.toString()} W/M` };
		case 'per_pallet':
			return { n: new Exact(q.pallets), words: `${q.pallets} pallets` };
		case 'per_container': {
			const boxes = q.containers.filter(
				(c) => charge.containerType === undefined || c.typeCode === charge.containerType
			);
			const count = boxes.reduce((s, c) => s + c.count, 0);
			const type = charge.containerType ? ` ${charge.containerType}` : '';
			return { n: new Exact(count), words: `${count}${type} containers` };
		}
		case 'percent_of_freight':
			return { n: new Exact(1), words: '' };
	}
}

/** The charge as a piece in its currency, rounded to the minor unit. */
export function chargePiece(
	charge: Charge,
	q: Quantities,
	freight: FreightBase,
	key: string,
	rowId: string | undefined,
	source: string | undefined
): Piece {
	let amount: Decimal;
	let currency = charge.currency;
	let formula: string;
	if (charge.basis === 'percent_of_freight') {
		currency = freight.currency;
		amount = freight.amount.times(percent(charge.amount));
		formula = `${charge.amount} % × base freight ${money(freight.amount, currency)}`;
	} else {
		const m = multiplier(charge, q);
		amount = m.n.times(charge.amount);
		formula = `${m.words} × ${charge.amount}`;
	}
	amount = roundMinor(amount, currency);
	if (charge.minimum !== undefined && amount.lt(charge.minimum)) {
		formula = `max(minimum ${charge.minimum}, ${formula})`;
		amount = roundMinor(new Exact(charge.minimum), currency);
	}
	return {
		key,
		label: charge.label,
		amount,
		currency,
		formula,
		inputs: [
			{ label: 'basis', value: charge.basis },
			{ label: 'amount', value: charge.amount }
		],
		rowId,
		source
	};
}
