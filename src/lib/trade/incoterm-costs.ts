/**
 * Which transport costs an Incoterms® 2020 rule puts in the seller's price, and so on the
 * commercial invoice.
 *
 * Source: ICC, Incoterms® 2020, each rule's A4 "Carriage" and A5 "Insurance" (from memory):
 * - E and F rules (EXW, FCA, FAS, FOB): the seller has no obligation to contract the main
 *   carriage or insurance; the buyer pays them, so the invoice shows neither.
 * - C rules: the seller contracts and pays carriage to the named destination (CPT, CFR); CIF and
 *   CIP also oblige the seller to insure (CIF: at least Institute Cargo Clauses (C); CIP, changed
 *   in 2020: Institute Cargo Clauses (A)), for at least the price plus 10 % (A5).
 * - D rules (DAP, DPU, DDP): the seller carries to the destination at its own cost and risk; no
 *   party is obliged to insure, so insurance is shown only when the seller did insure.
 * Showing freight and insurance as separate amounts lets the importing customs administration
 * build the customs value (WTO Customs Valuation Agreement, Article 8.2: each member decides
 * whether freight and insurance to the place of import are included; common practice).
 *
 * Pure module: no framework imports.
 */
import type { IncotermCode } from './incoterms';

/** 'included': in the price and printed; 'excluded': the buyer's cost; 'optional': printed if any. */
export type CostTreatment = 'included' | 'excluded' | 'optional';

export interface IncotermCosts {
	freight: CostTreatment;
	insurance: CostTreatment;
	/** True when the rule obliges the seller to insure (CIF, CIP). */
	sellerMustInsure: boolean;
	/** The cover the rule asks for, when it asks for one. */
	minimumCover: string | null;
}

const NONE: IncotermCosts = Object.freeze({
	freight: 'excluded',
	insurance: 'excluded',
	sellerMustInsure: false,
	minimumCover: null
});

const CARRIAGE_ONLY: IncotermCosts = Object.freeze({
	freight: 'included',
	insurance: 'excluded',
	sellerMustInsure: false,
	minimumCover: null
});

const DELIVERED: IncotermCosts = Object.freeze({
	freight: 'included',
	insurance: 'optional',
	sellerMustInsure: false,
	minimumCover: null
});

const COSTS: Readonly<Record<IncotermCode, IncotermCosts>> = Object.freeze({
	EXW: NONE,
	FCA: NONE,
	FAS: NONE,
	FOB: NONE,
	CPT: CARRIAGE_ONLY,
	CFR: CARRIAGE_ONLY,
	CIF: Object.freeze({
		freight: 'included',
		insurance: 'included',
		sellerMustInsure: true,
		minimumCover: 'Institute Cargo Clauses (C), price + 10 %'
	}),
	CIP: Object.freeze({
		freight: 'included',
		insurance: 'included',
		sellerMustInsure: true,
		minimumCover: 'Institute Cargo Clauses (A), price + 10 %'
	}),
	DAP: DELIVERED,
	DPU: DELIVERED,
	DDP: DELIVERED
});

export function incotermCosts(code: IncotermCode): IncotermCosts {
	return COSTS[code];
}
