import type { SupportingKind } from '../src/lib/uploads/document-kinds';

// Demo supporting documents: every supplier, laboratory, chamber and person here is invented, and
// each PDF says on its face that it is a demo and no real test summary, declaration or
// certificate. `expiresInDays` is counted from the day the demo is first seeded, so one document
// is always about to lapse (and is picked by the expiry reminders, 30 days ahead).

export interface DemoSupportingDocument {
	owner: { sku: string } | { shipmentReference: string };
	kind: SupportingKind;
	title: string;
	fileName: string;
	issuedOn: string | null;
	expiresInDays: number | null;
	/** The PDF's heading, then its lines of text. */
	heading: string;
	lines: string[];
}

export const DEMO_SUPPORTING_DOCUMENTS: DemoSupportingDocument[] = [
	{
		owner: { sku: 'SLV-PBL-20' },
		kind: 'un38_3_summary',
		title: 'UN38.3 test summary, Pebble 20 battery pack (TCW-1S1P-2600), 2026',
		fileName: 'pebble-20-un38.3-test-summary.pdf',
		issuedOn: '2026-02-17',
		expiresInDays: null,
		heading: 'Lithium battery test summary (demo)',
		// The elements the UN Manual of Tests and Criteria, 38.3.5, asks of a test summary (from memory).
		lines: [
			'Cell/battery manufacturer: Tanjung Cell Works Sdn. Bhd., Lot 12, Jalan Perindustrian 4, Kulim, Malaysia (invented)',
			'Test laboratory: Serambi Battery Test Laboratory (invented), report SBTL-2026-0412, 2026-02-10',
			'Battery: TCW-1S1P-2600, lithium-ion, 1 cell, 3.7 V, 2.6 Ah, 9.62 Wh, 48 g',
			'Tests: T.1 altitude, T.2 thermal, T.3 vibration, T.4 shock, T.5 external short circuit,',
			'T.6 impact/crush (cell), T.7 overcharge, T.8 forced discharge (cell): passed',
			'Reference: UN Manual of Tests and Criteria, Part III, subsection 38.3, as amended',
			'Signed for the manufacturer: Lim Hui Shan, Quality manager (invented)'
		]
	},
	{
		owner: { sku: 'SLV-SNS-TH1' },
		kind: 'safety_data_sheet',
		title: 'Safety data sheet, CR2032 lithium metal coin cell (supplier edition 3)',
		fileName: 'cr2032-coin-cell-sds.pdf',
		issuedOn: '2024-06-01',
		expiresInDays: 20,
		heading: 'Safety data sheet (demo)',
		lines: [
			'Product: CR2032 lithium manganese dioxide coin cell, 3 V, 0.07 g lithium',
			'Supplier: Kestrelmoor Cells Ltd., Unit 4, Harbour Road, Taichung (invented)',
			'Edition 3; the supplier reviews it every two years, next review due as on file in Landfall',
			'Sections 1-16 as the supplier publishes them (demo text only)'
		]
	},
	{
		owner: { sku: 'SLV-HUB-01' },
		kind: 'restricted_substances',
		title: 'RoHS and REACH declaration, Hub One main board, 2026',
		fileName: 'hub-one-rohs-reach-declaration.pdf',
		issuedOn: '2026-01-15',
		expiresInDays: 365,
		heading: 'Supplier declaration on restricted substances (demo)',
		// EU Directive 2011/65/EU (RoHS), Annex II; Regulation (EC) No 1907/2006 (REACH), Art. 33 (from memory).
		lines: [
			'Supplier: Brightwater Circuit Assembly Co., Ltd., Binh Duong (invented)',
			'Part: Hub One main board assembly HB1-MB rev. C',
			'Declares conformity with Directive 2011/65/EU (RoHS) as amended, Annex II limits,',
			'and no SVHC above 0.1 % w/w under Regulation (EC) No 1907/2006 (REACH), Art. 33',
			'Signed: Tran Minh Chau, Compliance officer (invented)'
		]
	},
	{
		owner: { shipmentReference: 'SHP-2026-00003' },
		kind: 'proof_of_origin',
		title: 'Certificate of origin (non-preferential), SHP-2026-00003',
		fileName: 'certificate-of-origin-shp-2026-00003.pdf',
		issuedOn: '2026-11-20',
		expiresInDays: null,
		heading: 'Certificate of origin (demo)',
		lines: [
			'Issued by: Northern Straits Chamber of Trade (invented)',
			'Exporter: Solvrae Electronics Sdn. Bhd. (invented)',
			'Consignee: Cedarpoint Living Inc. (invented)',
			'Goods: portable speakers and power banks, country of origin Malaysia',
			'Demo only: no chamber issued this certificate'
		]
	}
];
