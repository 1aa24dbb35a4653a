import { describe, expect, it } from 'vitest';
import { incotermCosts } from './incoterm-costs';
import { INCOTERM_CODES } from './incoterms';

// Expected values: ICC, Incoterms® 2020, A4 "Carriage" and A5 "Insurance" of each rule (from
// memory): only CIF and CIP oblige the seller to insure; C and D rules put the main carriage
// in the seller's price; E and F rules leave it to the buyer.
describe('incotermCosts', () => {
	it('puts neither freight nor insurance in E and F prices', () => {
		for (const code of ['EXW', 'FCA', 'FAS', 'FOB'] as const) {
			expect(incotermCosts(code)).toMatchObject({ freight: 'excluded', insurance: 'excluded' });
		}
	});

	it('puts freight in every C and D price', () => {
		for (const code of ['CPT', 'CFR', 'CIF', 'CIP', 'DAP', 'DPU', 'DDP'] as const) {
			expect(incotermCosts(code).freight).toBe('included');
		}
	});

	it('obliges the seller to insure only under CIF and CIP, with the 2020 covers', () => {
		const insuring = INCOTERM_CODES.filter((c) => incotermCosts(c).sellerMustInsure);
		expect(insuring.sort()).toEqual(['CIF', 'CIP']);
		expect(incotermCosts('CIF').minimumCover).toMatch(/Clauses \(C\)/);
		expect(incotermCosts('CIP').minimumCover).toMatch(/Clauses \(A\)/);
	});

	it('leaves insurance optional under the D rules and out under CPT and CFR', () => {
		for (const code of ['DAP', 'DPU', 'DDP'] as const) {
			expect(incotermCosts(code).insurance).toBe('optional');
		}
		expect(incotermCosts('CPT').insurance).toBe('excluded');
		expect(incotermCosts('CFR').insurance).toBe('excluded');
	});
});
