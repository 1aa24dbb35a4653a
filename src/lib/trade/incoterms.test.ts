import { describe, it, expect } from 'vitest';
import {
	INCOTERMS_2020,
	INCOTERMS_EDITION,
	INCOTERM_CODES,
	formatIncotermWithPlace,
	incoterm,
	isIncoterm
} from './incoterms';

describe('Incoterms 2020', () => {
	it('has the 11 rules, once each', () => {
		// ICC, Incoterms® 2020, Introduction: eleven rules (from memory).
		expect(INCOTERMS_2020).toHaveLength(11);
		expect(INCOTERMS_2020.map((r) => r.code)).toEqual([...INCOTERM_CODES]);
		expect(new Set(INCOTERM_CODES).size).toBe(11);
	});

	it('marks exactly FAS, FOB, CFR and CIF as sea and inland waterway only', () => {
		// ICC, Incoterms® 2020, Introduction, "Rules for sea and inland waterway transport":
		// FAS, FOB, CFR, CIF; the other seven are for any mode or modes of transport (from memory).
		expect(INCOTERMS_2020.filter((r) => r.seaOnly).map((r) => r.code)).toEqual([
			'FAS',
			'FOB',
			'CFR',
			'CIF'
		]);
	});

	it('has DPU, which replaced DAT in the 2020 edition', () => {
		// ICC, Incoterms® 2020, Introduction: DAT renamed DPU, Delivered at Place Unloaded
		// (from memory).
		expect(incoterm('DPU')?.name).toBe('Delivered at Place Unloaded');
		expect(isIncoterm('DAT')).toBe(false);
	});

	it('describes the named place for each rule', () => {
		// ICC, Incoterms® 2020, rule headings, e.g. "FOB (insert named port of shipment)",
		// "DAP (insert named place of destination)" (from memory).
		expect(incoterm('FOB')?.namedPlaceHint).toBe('named port of shipment');
		expect(incoterm('FAS')?.namedPlaceHint).toBe('named port of shipment');
		expect(incoterm('CIF')?.namedPlaceHint).toBe('named port of destination');
		expect(incoterm('DAP')?.namedPlaceHint).toBe('named place of destination');
		expect(incoterm('EXW')?.namedPlaceHint).toBe('named place of delivery');
		expect(incoterm('FCA')?.namedPlaceHint).toBe('named place of delivery');
		for (const rule of INCOTERMS_2020)
			expect(rule.namedPlaceHint).toMatch(/^named (place|port) of /);
	});

	it('recognises codes exactly', () => {
		expect(isIncoterm('CIP')).toBe(true);
		expect(isIncoterm('cip')).toBe(false);
		expect(isIncoterm(' CIP')).toBe(false);
		expect(isIncoterm(42)).toBe(false);
		expect(incoterm('XYZ')).toBeUndefined();
	});

	it('writes the term with its place and edition', () => {
		// ICC, Incoterms® 2020, Introduction: name the place and the edition, e.g.
		// "FCA 38 Cours Albert 1er, Paris, France Incoterms® 2020" (from memory).
		expect(INCOTERMS_EDITION).toBe('Incoterms® 2020');
		expect(formatIncotermWithPlace('FOB', ' Port Klang ')).toBe('FOB Port Klang Incoterms® 2020');
		expect(formatIncotermWithPlace('EXW', '')).toBe('EXW Incoterms® 2020');
	});
});
