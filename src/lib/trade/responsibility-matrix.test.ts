import { describe, expect, it } from 'vitest';
import { INCOTERM_CODES } from './incoterms';
import { responsibilityMatrix, type ResponsibilityKey } from './responsibility-matrix';

const parties = (code: Parameters<typeof responsibilityMatrix>[0]) =>
	Object.fromEntries(responsibilityMatrix(code).map((r) => [r.key, r.party])) as Record<
		ResponsibilityKey,
		string
	>;

// Expected values: ICC, Incoterms® 2020, A2/B2, A4/B4, A5/B5, A7/B7 and A9/B9 of each rule
// (from memory); the insurance row names who carries the risk when no party must insure.
describe('responsibilityMatrix', () => {
	it('has the eight rows in travel order for every rule', () => {
		for (const code of INCOTERM_CODES) {
			expect(responsibilityMatrix(code).map((r) => r.key)).toEqual([
				'exportClearance',
				'loadingAtOrigin',
				'preCarriage',
				'mainCarriage',
				'insurance',
				'unloadingAtDestination',
				'importClearance',
				'importDuty'
			]);
		}
	});

	it('puts everything but the goods on the buyer under EXW', () => {
		expect(Object.values(parties('EXW')).every((p) => p === 'buyer')).toBe(true);
	});

	it('puts everything but unloading on the seller under DDP', () => {
		expect(parties('DDP')).toEqual({
			exportClearance: 'seller',
			loadingAtOrigin: 'seller',
			preCarriage: 'seller',
			mainCarriage: 'seller',
			insurance: 'seller',
			unloadingAtDestination: 'buyer',
			importClearance: 'seller',
			importDuty: 'seller'
		});
		expect(parties('DPU').unloadingAtDestination).toBe('seller');
	});

	it('splits FOB at the ship and CIF with the seller insuring', () => {
		expect(parties('FOB')).toMatchObject({
			exportClearance: 'seller',
			mainCarriage: 'buyer',
			insurance: 'buyer',
			importClearance: 'buyer'
		});
		const cif = responsibilityMatrix('CIF');
		expect(parties('CIF')).toMatchObject({ mainCarriage: 'seller', insurance: 'seller' });
		expect(cif.find((r) => r.key === 'insurance')?.note).toMatch(/Clauses \(C\).*110 %/);
		expect(responsibilityMatrix('CIP').find((r) => r.key === 'insurance')?.note).toMatch(
			/Clauses \(A\).*110 %/
		);
	});

	it('gives each row its label and articles', () => {
		for (const r of responsibilityMatrix('FCA')) {
			expect(r.label.length).toBeGreaterThan(3);
			expect(r.articles).toMatch(/^A\d\/B\d/);
		}
	});
});
