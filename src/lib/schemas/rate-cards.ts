import { z } from 'zod';
import { isCountryCode } from '../reference/countries';
import { isPaymentCurrency } from '../reference/currencies';
import { isLocationCode } from '../trade/unlocode';
import type { TransportMode } from '../trade/shipment-status';
import { currencyCode } from './fields';
import { chargeSchema, rateCardTermsSchema, type RateCardTerms } from './landed-cost';
import { blankOr, checkValidity, validityFields } from './reference-data';

// A rate card as its form edits it: the columns of rate_cards, and `terms` checked by the very
// schema the database's jsonb is checked by (schemas/landed-cost.ts), so there is one shape.

export type Charge = z.infer<typeof chargeSchema>;
export type ChargeList = 'surcharges' | 'originCharges' | 'destinationCharges';
export const CHARGE_LISTS: readonly ChargeList[] = [
	'surcharges',
	'originCharges',
	'destinationCharges'
];

export const CHARGE_BASIS_LABELS: Record<Charge['basis'], string> = {
	per_shipment: 'Per shipment',
	per_kg: 'Per kg gross',
	per_chargeable_kg: 'Per chargeable kg',
	per_container: 'Per container',
	per_wm: 'Per W/M (revenue tonne)',
	per_pallet: 'Per pallet',
	percent_of_freight: '% of the base freight'
};

/** A charge without the optional fields left empty on the form (the schema wants them absent). */
export function cleanCharge(c: Charge): Charge {
	const { minimum, containerType, ...rest } = c;
	return {
		...rest,
		...(minimum ? { minimum } : {}),
		...(containerType && c.basis === 'per_container' ? { containerType } : {})
	};
}

/** Terms with every charge list cleaned (see cleanCharge). */
export function cleanTerms(terms: RateCardTerms): RateCardTerms {
	return {
		...terms,
		surcharges: terms.surcharges.map(cleanCharge),
		originCharges: terms.originCharges.map(cleanCharge),
		destinationCharges: terms.destinationCharges.map(cleanCharge)
	};
}

/** A lane end: a country (MY) or a UN/LOCODE place (MYPKG). */
export const laneEnd = (label: string) =>
	z
		.string()
		.trim()
		.toUpperCase()
		.refine(
			(v) => (v.length === 2 ? isCountryCode(v) : isLocationCode(v)),
			`${label}: a country code (MY) or a UN/LOCODE of 5 characters (MYPKG).`
		);

/** Blank terms of a mode, with the rows a card of that mode usually has (rates left empty). */
export function termsTemplate(mode: TransportMode, currency = 'USD'): RateCardTerms {
	const charge = (label: string, basis: Charge['basis']): Charge => ({
		label,
		basis,
		amount: '',
		currency
	});
	const none = { surcharges: [], originCharges: [], destinationCharges: [] };
	switch (mode) {
		case 'air':
			return {
				mode,
				minimumCharge: '',
				// The usual general-cargo breaks: under 45 kg, then 45, 100, 300, 500, 1000 kg.
				breaks: ['0', '45', '100', '300', '500', '1000'].map((fromKg) => ({
					fromKg,
					ratePerKg: ''
				})),
				...none,
				surcharges: [
					charge('Fuel surcharge', 'per_chargeable_kg'),
					charge('Security surcharge', 'per_chargeable_kg')
				]
			};
		case 'sea_fcl':
			return {
				mode,
				containerRates: ['C20GP', 'C40GP', 'C40HC'].map((typeCode) => ({
					typeCode,
					ratePerContainer: ''
				})),
				surcharges: [charge('Bunker adjustment (BAF)', 'per_container')],
				originCharges: [charge('Origin terminal handling', 'per_container')],
				destinationCharges: [charge('Destination terminal handling', 'per_container')]
			};
		case 'sea_lcl':
			return { mode, ratePerWm: '', minimumWm: '1', minimumCharge: '', ...none };
		case 'road':
			return { mode, basis: 'per_kg', rate: '', minimumCharge: '', ...none };
		case 'courier':
			return { mode, firstHalfKg: '', additionalHalfKg: '', ...none };
	}
}

/**
 * Terms of another mode. Charges with an amount typed are kept; a list with none takes the new
 * mode's usual rows instead (so an air card's blank fuel surcharge does not follow to road).
 */
export function switchMode(terms: RateCardTerms, mode: TransportMode): RateCardTerms {
	if (terms.mode === mode) return terms;
	const next = termsTemplate(mode);
	for (const list of CHARGE_LISTS) {
		const typed = terms[list].filter((c) => c.amount !== '');
		if (typed.length) next[list] = typed;
	}
	return next;
}

const distance = z
	.string()
	.trim()
	.regex(/^\d{1,8}(\.\d)?$/, 'Distance: kilometres with at most one decimal, e.g. 15400.')
	.refine((v) => /[1-9]/.test(v), 'Distance must be more than zero.');

export const rateCardSchema = z
	.object({
		laneFrom: laneEnd('From'),
		laneTo: laneEnd('To'),
		currency: currencyCode,
		transitDays: z
			.number({ error: 'Transit days: a whole number.' })
			.int('Transit days: a whole number.')
			.min(0, 'Transit days cannot be negative.')
			.max(365, 'Transit days: at most 365.'),
		distanceKm: blankOr(distance),
		// Empty lists: superforms fills a refused form's empty arrays from the default, so the
		// default must not carry rows (the add form starts from termsTemplate instead).
		terms: rateCardTermsSchema.default({
			mode: 'air',
			minimumCharge: '',
			breaks: [],
			surcharges: [],
			originCharges: [],
			destinationCharges: []
		}),
		...validityFields
	})
	.superRefine((card, ctx) => {
		const add = (path: (string | number)[], message: string) =>
			ctx.addIssue({ code: 'custom', path, message });
		checkValidity(card, ctx);
		if (card.laneFrom === card.laneTo) add(['laneTo'], 'The lane must end somewhere else.');
		const t = card.terms;
		for (const list of CHARGE_LISTS) {
			t[list].forEach((c, i) => {
				if (!isPaymentCurrency(c.currency)) {
					add(['terms', list, i, 'currency'], 'Not an ISO 4217 currency code.');
				}
			});
		}
		if (t.mode === 'air') {
			const seen = new Set<string>();
			t.breaks.forEach((b, i) => {
				const key = String(Number(b.fromKg));
				if (seen.has(key)) add(['terms', 'breaks', i, 'fromKg'], 'This break is listed twice.');
				seen.add(key);
			});
			if (!seen.has('0')) {
				add(['terms', 'breaks', 0, 'fromKg'], 'Start with a break from 0 kg (under 45 kg).');
			}
		}
		if (t.mode === 'sea_fcl') {
			const seen = new Set<string>();
			t.containerRates.forEach((r, i) => {
				if (seen.has(r.typeCode)) {
					add(['terms', 'containerRates', i, 'typeCode'], 'This container type is listed twice.');
				}
				seen.add(r.typeCode);
			});
		}
	});
export type RateCardInput = z.infer<typeof rateCardSchema>;
