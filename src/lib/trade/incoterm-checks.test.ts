import { describe, expect, it } from 'vitest';
import { incotermChecks } from './incoterm-checks';
import type { TransportMode } from './shipment-status';

const ids = (input: Parameters<typeof incotermChecks>[0]) => incotermChecks(input).map((c) => c.id);

describe('incotermChecks', () => {
	it('suggests the any-mode rule for a sea-only rule by air, road or courier', () => {
		// ICC, Incoterms® 2020, Explanatory Notes to FOB and CIF: not for goods handed to the
		// carrier before they are on board, e.g. at a container terminal; use FCA / CIP instead
		// (from memory). FAS → FCA and CFR → CPT follow the same reasoning.
		const expected = { FAS: 'FCA', FOB: 'FCA', CFR: 'CPT', CIF: 'CIP' } as const;
		for (const [code, instead] of Object.entries(expected)) {
			for (const mode of ['air', 'road', 'courier'] as TransportMode[]) {
				const checks = incotermChecks({ code, namedPlace: 'Port Klang', mode });
				const sea = checks.find((c) => c.id === `sea_rule_with_${mode}`);
				expect(sea?.severity).toBe('warning');
				expect(sea?.suggestion).toBe(instead);
				expect(sea?.message).toContain(instead);
				expect(sea?.source).toMatch(/ICC, Incoterms® 2020/);
			}
		}
	});

	it('warns for containerised sea freight, not for break-bulk', () => {
		expect(ids({ code: 'FOB', namedPlace: 'Port Klang', mode: 'sea_fcl' })).toContain(
			'sea_rule_with_container'
		);
		expect(ids({ code: 'CIF', namedPlace: 'Rotterdam', mode: 'sea_lcl' })).toContain(
			'sea_rule_with_container'
		);
		expect(
			ids({ code: 'FOB', namedPlace: 'Port Klang', mode: 'sea_fcl', containerised: false })
		).not.toContain('sea_rule_with_container');
		// No mode chosen yet: nothing to compare against.
		expect(ids({ code: 'FOB', namedPlace: 'Port Klang', mode: null })).toEqual([]);
	});

	it('leaves the any-mode rules alone by any mode', () => {
		for (const mode of ['air', 'sea_fcl', 'road', 'courier'] as TransportMode[])
			for (const code of ['FCA', 'CPT', 'DAP', 'DPU'])
				expect(incotermChecks({ code, namedPlace: 'Lyon', mode })).toEqual([]);
	});

	it('requires a named place (error)', () => {
		// ICC, Incoterms® 2020, Introduction: name the place or port as precisely as possible
		// (from memory).
		for (const namedPlace of ['', '   ', null, undefined]) {
			const first = incotermChecks({ code: 'FCA', namedPlace, mode: 'air' })[0];
			expect(first).toMatchObject({
				severity: 'error',
				id: 'named_place_missing',
				field: 'incotermPlace'
			});
			expect(first?.message).toContain('named place of delivery');
		}
	});

	it('refuses a missing or unknown rule', () => {
		expect(incotermChecks({ code: '', namedPlace: 'Lyon' })[0]?.id).toBe('rule_missing');
		const dat = incotermChecks({ code: 'DAT', namedPlace: 'Lyon' })[0];
		expect(dat).toMatchObject({ severity: 'error', id: 'rule_unknown' });
		expect(dat?.message).toContain('DAT');
	});

	it('notes the duties EXW and DDP put on one party, and the CIF/CIP insurance', () => {
		// ICC, Incoterms® 2020, EXW B7, DDP A7/A9, CIF/CIP A5 (from memory); exporter and
		// importer of record: common practice.
		const exw = incotermChecks({ code: 'EXW', namedPlace: 'Penang', mode: 'air' });
		expect(exw).toMatchObject([
			{ severity: 'warning', id: 'exw_export_clearance', suggestion: 'FCA' }
		]);
		const ddp = incotermChecks({ code: 'DDP', namedPlace: 'Lyon', mode: 'road' });
		expect(ddp).toMatchObject([
			{ severity: 'warning', id: 'ddp_import_clearance', suggestion: 'DAP' }
		]);
		expect(ddp[0]?.message).toMatch(/customs broker/);
		const cip = incotermChecks({ code: 'CIP', namedPlace: 'Lyon', mode: 'air' });
		expect(cip).toMatchObject([{ severity: 'info', id: 'seller_insures' }]);
		expect(cip[0]?.message).toMatch(/Clauses \(A\).*110 %/);
	});

	it('puts errors before warnings', () => {
		const checks = incotermChecks({ code: 'CIF', namedPlace: '', mode: 'air' });
		expect(checks.map((c) => c.severity)).toEqual(['error', 'warning', 'info']);
	});
});
