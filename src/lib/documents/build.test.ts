import Decimal from 'decimal.js';
import { describe, expect, it } from 'vitest';
import { measure } from '../packing';
import { buildInvoice } from './build-invoice';
import { buildPackingList } from './build-packing-list';
import { measureInput, sampleSource } from './fixtures';
import { readiness } from './readiness';

const stamp = {
	number: 'CI-2026-00001',
	revision: 'A',
	revisionReason: null,
	issuedOn: '2026-12-02'
};

describe('buildInvoice', () => {
	it('prices each line exactly and adds freight and insurance under CIF', () => {
		const s = buildInvoice(sampleSource(), stamp);
		// 162 × 48.3350 = 7830.27 exactly; 1220 × 7.1250 = 8692.50.
		expect(s.lines.map((l) => l.amount)).toEqual(['7830.27', '8692.50']);
		expect(s.subtotal).toBe('16522.77');
		expect(s.freight).toMatchObject({ included: true, amount: '1850.00' });
		expect(s.insurance).toMatchObject({ included: true, amount: '96.35' });
		expect(s.total).toBe('18469.12');
		expect(s.lines[0]!.hsCode).toBe('8518.22');
		expect(s.lines[1]!.hsCode).toBe('9025.19.80.00');
	});

	it('leaves freight and insurance off an FOB invoice even when amounts are on record', () => {
		const s = buildInvoice(sampleSource({ incoterm: 'FOB', incotermPlace: 'Penang' }), stamp);
		expect(s.freight).toMatchObject({ included: false, amount: null });
		expect(s.insurance.included).toBe(false);
		expect(s.total).toBe(s.subtotal);
		expect(s.incoterm.text).toBe('FOB Penang Incoterms® 2020');
	});

	it('prints JPY without and KWD with three decimals (ISO 4217 minor units)', () => {
		const jpy = buildInvoice(sampleSource({ currency: 'JPY' }), stamp);
		expect(jpy.minorUnits).toBe(0);
		expect(jpy.lines.map((l) => l.amount)).toEqual(['7830', '8693']);
		expect(jpy.freight.amount).toBe('1850');
		const kwd = buildInvoice(sampleSource({ currency: 'KWD' }), stamp);
		expect(kwd.lines.map((l) => l.amount)).toEqual(['7830.270', '8692.500']);
		expect(kwd.total).toBe('18469.120');
	});

	it('counts pallets as the packages when the cartons travel on pallets', () => {
		const s = buildInvoice(sampleSource(), stamp);
		const m = measure(measureInput(true));
		if (!m.ok) throw new Error('fixture');
		expect(s.packages).toMatchObject({ kind: 'pallets', count: m.pallets!.pallets });
		expect(s.grossKg).toBe(m.pallets!.grossKg);
		const loose = buildInvoice(sampleSource({ measure: measure(measureInput(false)) }), stamp);
		expect(loose.packages).toMatchObject({ kind: 'cartons', count: m.totals.cartons });
	});
});

describe('buildPackingList', () => {
	it('has rows that add up to the packing computation, every carton once', () => {
		const s = buildPackingList(sampleSource(), stamp);
		const m = measure(measureInput(true));
		if (!m.ok) throw new Error('fixture');
		const sum = (f: (r: (typeof s.rows)[number]) => Decimal.Value) =>
			s.rows.reduce((a, r) => a.plus(f(r)), new Decimal(0));
		expect(sum((r) => r.cartons).toNumber()).toBe(m.totals.cartons);
		expect(sum((r) => r.units).toNumber()).toBe(m.totals.units);
		expect(sum((r) => r.netKg).toFixed(3)).toBe(m.totals.netKg);
		expect(sum((r) => r.grossKg).toFixed(3)).toBe(m.totals.grossKg);
		const numbers = s.rows.flatMap((r) =>
			Array.from({ length: r.cartons }, (_, i) => r.fromCarton + i)
		);
		expect(numbers).toEqual(Array.from({ length: m.totals.cartons }, (_, i) => i + 1));
		expect(s.totals.pallets?.count).toBe(m.pallets!.pallets);
		expect(s.rows.every((r) => r.pallets?.startsWith('P'))).toBe(true);
	});

	it('prints the lots recorded for a row’s cartons', () => {
		const s = buildPackingList(sampleSource(), stamp);
		const row = s.rows.find((r) => r.sku === 'SNS-10' && r.fromCarton <= 42 && r.toCarton >= 42);
		expect(row?.lots[0]).toBe('Lot L2611 (cartons 42–51, serials S000001–S000500)');
	});

	it('makes default shipping marks when none are given', () => {
		const s = buildPackingList(sampleSource(), stamp);
		expect(s.marks).toContain('REF SHP-2026-00042');
		expect(s.marks).toMatch(/C\/NO\. 1–\d+/);
	});
});

describe('readiness', () => {
	it('passes a complete shipment', () => {
		expect(readiness(sampleSource())).toEqual([]);
	});

	it('lists what is missing, each with its field', () => {
		const src = sampleSource({ status: 'draft', consignee: null });
		src.details = { ...src.details, signatoryName: ' ', insuranceAmount: null };
		src.lines = [{ ...src.lines[0]!, hsCode: null, originCountry: null }];
		const fields = readiness(src).map((i) => i.field);
		expect(fields).toEqual(
			expect.arrayContaining([
				'status',
				'consigneeId',
				'signatoryName',
				'insuranceAmount',
				'hsCode',
				'originCountry'
			])
		);
	});

	it('asks for freight under C and D rules only', () => {
		const noFreight = (incoterm: string) => {
			const src = sampleSource({ incoterm });
			src.details = { ...src.details, freightAmount: null, insuranceAmount: null };
			return readiness(src).map((i) => i.field);
		};
		expect(noFreight('FCA')).toEqual([]);
		expect(noFreight('DAP')).toEqual(['freightAmount']);
		expect(noFreight('CIP')).toEqual(['freightAmount', 'insuranceAmount']);
	});
});

describe('documentContent', () => {
	it('ignores the stamp and notices a changed figure', async () => {
		const { documentContent } = await import('./content');
		const a = buildInvoice(sampleSource(), stamp);
		const b = buildInvoice(sampleSource(), {
			number: 'CI-2026-00002',
			revision: 'B',
			revisionReason: 'Seal number corrected',
			issuedOn: '2026-12-24'
		});
		expect(documentContent(a)).toBe(documentContent(b));
		const src = sampleSource();
		src.lines = [{ ...src.lines[0]!, unitPrice: '48.3400' }, src.lines[1]!];
		expect(documentContent(buildInvoice(src, stamp))).not.toBe(documentContent(a));
	});

	it('does not count a load plan that arrived after the issue as a change', async () => {
		const { documentContent } = await import('./content');
		const before = buildPackingList(sampleSource({ loadPlan: null }), stamp);
		const plan = {
			containers: [
				{
					label: 'Container 1',
					type: '40 ft',
					pieces: 12,
					volumeUsedPercent: '61.0',
					payloadKg: '812.400'
				}
			],
			unplaced: 0
		};
		const after = buildPackingList(sampleSource({ loadPlan: plan }), stamp);
		expect(documentContent(after)).toBe(documentContent(before));
	});
});

describe('statement on origin', () => {
	it('is printed only when preferential origin is claimed, with its caution', () => {
		const plain = buildInvoice(sampleSource(), stamp);
		expect(plain.originStatement).toBeUndefined();
		const base = sampleSource();
		const claimed = buildInvoice(
			sampleSource({
				details: {
					...base.details,
					preferentialOriginClaimed: true,
					preferentialAgreement: 'Example agreement',
					originStatement: 'Statement as written by the exporter.'
				}
			}),
			stamp
		);
		expect(claimed.originStatement).toEqual({
			agreement: 'Example agreement',
			text: 'Statement as written by the exporter.'
		});
		expect(claimed.cautions.some((c) => /licensed customs broker/.test(c))).toBe(true);
	});
});
