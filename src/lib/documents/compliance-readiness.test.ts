import { describe, expect, it } from 'vitest';
import { complianceAdvice, complianceBlocking } from './compliance-readiness';
import { sampleSource } from './fixtures';
import { readiness } from './readiness';
import type { DocumentSource, SourceLine } from './source';

function withPowerBanks(mode: string, onFile: boolean): DocumentSource {
	const base = sampleSource({ chosenMode: mode });
	const bank: SourceLine = {
		...base.lines[0]!,
		position: 3,
		sku: 'PWR-10K',
		description: 'Power bank 10,000 mAh',
		battery: 'standalone',
		batteryChemistry: 'lithium_ion',
		un383OnFile: onFile
	};
	return { ...base, lines: [...base.lines, bank] };
}

describe('lithium batteries before issue', () => {
	// Source: UN Recommendations on the Transport of Dangerous Goods, Model Regulations, 21st
	// revised edition (2019), 2.9.4 (g): the test summary must be made available (from memory).
	it('stops the papers of an air shipment of lithium-ion batteries without a UN38.3 summary', () => {
		const items = complianceBlocking(withPowerBanks('air', false));
		expect(items).toEqual([
			expect.objectContaining({ area: 'product', field: 'un383Summary', sku: 'PWR-10K' })
		]);
		expect(items[0]!.message).toMatch(/UN38\.3/);
		expect(readiness(withPowerBanks('air', false)).map((i) => i.field)).toContain('un383Summary');
	});

	it('treats courier as air, and lets a summary on file through', () => {
		expect(complianceBlocking(withPowerBanks('courier', false))).toHaveLength(1);
		expect(complianceBlocking(withPowerBanks('air', true))).toEqual([]);
		expect(complianceAdvice(withPowerBanks('air', true))).toEqual([]);
	});

	it('only advises by sea and road (common practice: carriers ask, the papers are not stopped)', () => {
		for (const mode of ['sea_fcl', 'sea_lcl', 'road']) {
			expect(complianceBlocking(withPowerBanks(mode, false))).toEqual([]);
			expect(complianceAdvice(withPowerBanks(mode, false))).toHaveLength(1);
		}
	});

	it('says nothing of products without batteries', () => {
		expect(complianceBlocking(sampleSource({ chosenMode: 'air' }))).toEqual([]);
		expect(complianceAdvice(sampleSource({ chosenMode: 'air' }))).toEqual([]);
	});
});

describe('preferential origin before issue', () => {
	const claimed = (over: Partial<DocumentSource['details']>, proof: boolean) => {
		const base = sampleSource();
		return sampleSource({
			proofOfOriginOnFile: proof,
			details: {
				...base.details,
				preferentialOriginClaimed: true,
				preferentialAgreement: 'Example agreement',
				originStatement: 'The exporter of the products covered by this document declares…',
				...over
			}
		});
	};

	it('needs the agreement, the statement and a proof on file', () => {
		expect(complianceBlocking(claimed({}, true))).toEqual([]);
		const fields = complianceBlocking(
			claimed({ preferentialAgreement: ' ', originStatement: null }, false)
		).map((i) => i.field);
		expect(fields).toEqual(['preferentialAgreement', 'originStatement', 'proofOfOrigin']);
	});

	it('asks nothing when no preference is claimed', () => {
		expect(complianceBlocking(sampleSource())).toEqual([]);
	});
});
