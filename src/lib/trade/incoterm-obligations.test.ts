import { describe, expect, it } from 'vitest';
import {
	INCOTERM_OBLIGATIONS,
	INCOTERM_OBLIGATIONS_SOURCE,
	incotermObligations
} from './incoterm-obligations';
import { INCOTERM_CODES, INCOTERMS_2020 } from './incoterms';
import { bearer } from '../landed-cost/bearer';
import { COST_KEYS } from '../landed-cost/types';

const codes = (pick: (o: (typeof INCOTERM_OBLIGATIONS)[number]) => boolean) =>
	INCOTERM_OBLIGATIONS.filter(pick)
		.map((o) => o.code)
		.sort();

describe('Incoterms 2020 obligations', () => {
	it('has all 11 rules, in the order of INCOTERM_CODES', () => {
		// ICC, Incoterms® 2020, Introduction: eleven rules (from memory).
		expect(INCOTERM_OBLIGATIONS.map((o) => o.code)).toEqual([...INCOTERM_CODES]);
		expect(INCOTERM_OBLIGATIONS_SOURCE.document).toBe('Incoterms® 2020');
	});

	it('gives seven any-mode rules and four sea and inland waterway rules', () => {
		// ICC, Incoterms® 2020, Introduction: "Rules for any mode or modes of transport" EXW, FCA,
		// CPT, CIP, DAP, DPU, DDP; "Rules for sea and inland waterway transport" FAS, FOB, CFR,
		// CIF (from memory).
		expect(codes((o) => o.modes === 'any')).toEqual(
			['CIP', 'CPT', 'DAP', 'DDP', 'DPU', 'EXW', 'FCA'].sort()
		);
		expect(codes((o) => o.modes === 'sea')).toEqual(['CFR', 'CIF', 'FAS', 'FOB']);
		// Agrees with the flag the older table carries.
		for (const rule of INCOTERMS_2020)
			expect(incotermObligations(rule.code).modes === 'sea').toBe(rule.seaOnly);
	});

	it('puts the main carriage on the seller under C and D rules only', () => {
		// ICC, Incoterms® 2020, A4/B4 "Carriage" of each rule (from memory).
		expect(codes((o) => o.mainCarriage === 'seller')).toEqual(
			['CFR', 'CIF', 'CIP', 'CPT', 'DAP', 'DDP', 'DPU'].sort()
		);
		expect(codes((o) => o.family === 'E')).toEqual(['EXW']);
		expect(codes((o) => o.family === 'F')).toEqual(['FAS', 'FCA', 'FOB']);
	});

	it('leaves export clearance to the buyer only under EXW, import clearance to the seller only under DDP', () => {
		// ICC, Incoterms® 2020, EXW B7 and DDP A7 (from memory).
		expect(codes((o) => o.exportClearance === 'buyer')).toEqual(['EXW']);
		expect(codes((o) => o.importClearance === 'seller')).toEqual(['DDP']);
		expect(codes((o) => o.importDuty === 'seller')).toEqual(['DDP']);
	});

	it('asks CIF for Institute Cargo Clauses (C) and CIP for (A), both at 110 %', () => {
		// ICC, Incoterms® 2020, CIF A5 and CIP A5: cover of at least 110 % of the price; CIP
		// raised to Clauses (A) in the 2020 edition (from memory).
		expect(incotermObligations('CIF')).toMatchObject({
			insuranceDuty: 'icc_c',
			minimumCoverPercent: '110'
		});
		expect(incotermObligations('CIP')).toMatchObject({
			insuranceDuty: 'icc_a',
			minimumCoverPercent: '110'
		});
		expect(codes((o) => o.insuranceDuty !== 'none')).toEqual(['CIF', 'CIP']);
		for (const o of INCOTERM_OBLIGATIONS)
			if (o.insuranceDuty === 'none') expect(o.minimumCoverPercent).toBeNull();
	});

	it('passes the risk at the destination under D rules, with DPU the only one unloaded', () => {
		// ICC, Incoterms® 2020, A2/A3 of DAP, DPU, DDP (from memory).
		expect(codes((o) => o.riskPassesAtDestination)).toEqual(['DAP', 'DDP', 'DPU']);
		expect(codes((o) => o.unloadingAtDestination === 'seller')).toEqual(['DPU']);
		expect(incotermObligations('FOB').delivery).toMatch(/on board/i);
		expect(incotermObligations('FAS').delivery).toMatch(/alongside/i);
		expect(incotermObligations('CPT').delivery).toMatch(/first carrier/i);
		expect(incotermObligations('EXW').delivery).toMatch(/not loaded/i);
	});

	it('feeds the landed-cost bearer (one source of truth)', () => {
		// Same split as before the table existed (ICC, Incoterms® 2020, A9/B9; from memory).
		expect(bearer('freight', 'FOB')).toBe('buyer');
		expect(bearer('freight', 'CFR')).toBe('seller');
		expect(bearer('originCharges', 'EXW')).toBe('buyer');
		expect(bearer('originCharges', 'FCA')).toBe('seller');
		expect(bearer('insurance', 'CIP')).toBe('seller');
		expect(bearer('insurance', 'DAP')).toBe('seller');
		expect(bearer('insurance', 'CPT')).toBe('buyer');
		expect(bearer('duty', 'DDP')).toBe('seller');
		expect(bearer('brokerage', 'DAP')).toBe('buyer');
		expect(bearer('destinationCharges', 'DPU')).toBe('seller');
		expect(bearer('destinationCharges', 'CIF')).toBe('buyer');
	});

	it('gives the landed-cost bearer the same answers as its former hand-written rules', () => {
		// The rules bearer.ts held before this table (ICC, Incoterms® 2020, A9/B9; from memory).
		const EF = ['EXW', 'FCA', 'FAS', 'FOB'];
		const D = ['DAP', 'DPU', 'DDP'];
		const former = (key: string, rule: string) => {
			if (key === 'goods') return 'buyer';
			if (key === 'originCharges') return rule === 'EXW' ? 'buyer' : 'seller';
			if (key === 'freight') return EF.includes(rule) ? 'buyer' : 'seller';
			if (key === 'insurance')
				return rule === 'CIF' || rule === 'CIP' || D.includes(rule) ? 'seller' : 'buyer';
			if (key === 'destinationCharges') return D.includes(rule) ? 'seller' : 'buyer';
			return rule === 'DDP' ? 'seller' : 'buyer';
		};
		for (const rule of INCOTERM_CODES)
			for (const key of COST_KEYS)
				expect(bearer(key, rule), `${key} ${rule}`).toBe(former(key, rule));
	});
});
