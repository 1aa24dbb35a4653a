/**
 * What each Incoterms® 2020 rule asks of seller and buyer: where delivery (and with it the risk)
 * passes, who contracts and pays the main carriage, who clears export and import, who pays the
 * import duty, and the seller's insurance duty. One source of truth: `incoterm-costs.ts`, the
 * landed-cost `bearer` and the responsibility matrix all read this table.
 *
 * Source: ICC, Incoterms® 2020 (ICC publication 723E), each rule's A2/B2 "Delivery / Taking
 * delivery", A3/B3 "Transfer of risks", A4/B4 "Carriage", A5/B5 "Insurance", A7/B7 "Export /
 * import clearance", A9/B9 "Allocation of costs"; from memory, not read. Incoterms® is a
 * registered trademark of the International Chamber of Commerce.
 *
 * Pure module: no framework imports.
 */
import { INCOTERM_CODES, type IncotermCode } from './incoterms';

export type TradeParty = 'seller' | 'buyer';

/** E: goods made available; F: main carriage unpaid; C: main carriage paid; D: arrival. */
export type IncotermFamily = 'E' | 'F' | 'C' | 'D';

/** 'any': any mode or modes of transport; 'sea': sea and inland waterway transport only. */
export type IncotermModes = 'any' | 'sea';

/** The seller's A5 insurance duty: none, or the minimum Institute Cargo Clauses asked for. */
export type InsuranceDuty = 'none' | 'icc_c' | 'icc_a';

export interface IncotermObligations {
	readonly code: IncotermCode;
	readonly family: IncotermFamily;
	readonly modes: IncotermModes;
	/** A2/A3: where the seller delivers and the risk passes to the buyer, in a short sentence. */
	readonly delivery: string;
	/** True when the risk passes only at the destination (the D rules). */
	readonly riskPassesAtDestination: boolean;
	/** A4/B4: who contracts and pays the main carriage. */
	readonly mainCarriage: TradeParty;
	/** A7/B7: who clears the goods for export. */
	readonly exportClearance: TradeParty;
	/** A7/B7: who clears the goods for import. */
	readonly importClearance: TradeParty;
	/** A9/B9: who pays import duty, import VAT/GST and other import charges. */
	readonly importDuty: TradeParty;
	/** A5: the seller's duty to insure the goods in transit. */
	readonly insuranceDuty: InsuranceDuty;
	/**
	 * A5: the minimum insured value as a percentage of the contract price when the seller must
	 * insure (110: the price plus 10 %), else null.
	 */
	readonly minimumCoverPercent: string | null;
	/** A9/B9: who pays the unloading at the named destination. */
	readonly unloadingAtDestination: TradeParty;
	/** A2: who loads the goods on the collecting vehicle at the seller's premises. */
	readonly loadingAtOrigin: TradeParty;
}

/** The edition and articles the table follows, for display beside it. */
export const INCOTERM_OBLIGATIONS_SOURCE = Object.freeze({
	issuer: 'International Chamber of Commerce (ICC)',
	document: 'Incoterms® 2020',
	section: 'A2/B2, A3/B3, A4/B4, A5/B5, A7/B7, A9/B9 of each rule',
	basis: 'from memory'
} as const);

/** Institute Cargo Clauses, as the A5 articles name them (from memory). */
export const INSURANCE_DUTY_TEXT: Readonly<Record<InsuranceDuty, string>> = Object.freeze({
	none: 'No obligation to insure',
	icc_c: 'At least Institute Cargo Clauses (C), for at least 110 % of the contract price',
	icc_a: 'At least Institute Cargo Clauses (A), for at least 110 % of the contract price'
});

type Row = [
	IncotermCode,
	IncotermFamily,
	IncotermModes,
	string,
	TradeParty, // main carriage
	TradeParty, // export clearance
	TradeParty, // import clearance and duty
	InsuranceDuty,
	TradeParty // unloading at destination
];

const S = 'seller';
const B = 'buyer';

const ROWS: readonly Row[] = [
	[
		'EXW',
		'E',
		'any',
		'At the named place (usually the seller’s premises), placed at the buyer’s disposal, not loaded on any collecting vehicle.',
		B,
		B,
		B,
		'none',
		B
	],
	[
		'FCA',
		'F',
		'any',
		'To the buyer’s carrier at the named place: loaded on the buyer’s vehicle at the seller’s premises, or on the seller’s vehicle ready for unloading anywhere else.',
		B,
		S,
		B,
		'none',
		B
	],
	[
		'CPT',
		'C',
		'any',
		'To the first carrier the seller contracted, at the place of shipment; the seller still pays carriage to the named destination.',
		S,
		S,
		B,
		'none',
		B
	],
	[
		'CIP',
		'C',
		'any',
		'To the first carrier the seller contracted, at the place of shipment; the seller pays carriage and insurance to the named destination.',
		S,
		S,
		B,
		'icc_a',
		B
	],
	[
		'DAP',
		'D',
		'any',
		'At the named destination, on the arriving means of transport, ready for unloading.',
		S,
		S,
		B,
		'none',
		B
	],
	[
		'DPU',
		'D',
		'any',
		'At the named destination, unloaded from the arriving means of transport.',
		S,
		S,
		B,
		'none',
		S
	],
	[
		'DDP',
		'D',
		'any',
		'At the named destination, cleared for import, on the arriving means of transport, ready for unloading.',
		S,
		S,
		S,
		'none',
		B
	],
	[
		'FAS',
		'F',
		'sea',
		'Alongside the vessel the buyer nominated, at the named port of shipment.',
		B,
		S,
		B,
		'none',
		B
	],
	[
		'FOB',
		'F',
		'sea',
		'On board the vessel the buyer nominated, at the named port of shipment.',
		B,
		S,
		B,
		'none',
		B
	],
	[
		'CFR',
		'C',
		'sea',
		'On board the vessel at the port of shipment; the seller still pays the freight to the named port of destination.',
		S,
		S,
		B,
		'none',
		B
	],
	[
		'CIF',
		'C',
		'sea',
		'On board the vessel at the port of shipment; the seller pays freight and insurance to the named port of destination.',
		S,
		S,
		B,
		'icc_c',
		B
	]
];

const TABLE: Readonly<Record<IncotermCode, IncotermObligations>> = Object.freeze(
	Object.fromEntries(
		ROWS.map(([code, family, modes, delivery, carriage, exp, imp, insurance, unloading]) => [
			code,
			Object.freeze({
				code,
				family,
				modes,
				delivery,
				riskPassesAtDestination: family === 'D',
				mainCarriage: carriage,
				exportClearance: exp,
				importClearance: imp,
				importDuty: imp,
				insuranceDuty: insurance,
				minimumCoverPercent: insurance === 'none' ? null : '110',
				unloadingAtDestination: unloading,
				// Only EXW leaves the loading at the seller's premises to the buyer (A2).
				loadingAtOrigin: code === 'EXW' ? B : S
			} satisfies IncotermObligations)
		])
	) as Record<IncotermCode, IncotermObligations>
);

/** The obligations of one rule. */
export function incotermObligations(code: IncotermCode): IncotermObligations {
	return TABLE[code];
}

/** All 11 rules' obligations, in the order of `INCOTERM_CODES`. */
export const INCOTERM_OBLIGATIONS: readonly IncotermObligations[] = Object.freeze(
	INCOTERM_CODES.map((code) => TABLE[code])
);
