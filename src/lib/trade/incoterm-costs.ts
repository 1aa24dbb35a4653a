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
import { incotermObligations, type InsuranceDuty } from './incoterm-obligations';
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

const COVER: Readonly<Record<InsuranceDuty, string | null>> = Object.freeze({
	none: null,
	icc_c: 'Institute Cargo Clauses (C), price + 10 %',
	icc_a: 'Institute Cargo Clauses (A), price + 10 %'
});

/** Derived from `incoterm-obligations.ts`, the one table of who pays what. */
export function incotermCosts(code: IncotermCode): IncotermCosts {
	const o = incotermObligations(code);
	const mustInsure = o.insuranceDuty !== 'none';
	return {
		freight: o.mainCarriage === 'seller' ? 'included' : 'excluded',
		// D rules: the seller carries the risk to the destination and may insure; no duty (A5).
		insurance: mustInsure ? 'included' : o.riskPassesAtDestination ? 'optional' : 'excluded',
		sellerMustInsure: mustInsure,
		minimumCover: COVER[o.insuranceDuty]
	};
}
