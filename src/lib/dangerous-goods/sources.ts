/**
 * Where each dangerous-goods rule comes from. Every requirement the screening returns names one
 * of these, and says whether it was read or written from memory.
 *
 * Pure module: no framework imports.
 */

/** 'read': checked in the text; 'secondary source': a public page quoting it; else memory. */
export type SourceBasis = 'read' | 'secondary source' | 'from memory' | 'common practice';

export interface RuleSource {
	readonly issuer: string;
	readonly document: string;
	/** Section, packing instruction, special provision or edition. */
	readonly section: string;
	readonly basis: SourceBasis;
	/** Where a secondary source was found, or what to verify. */
	readonly note?: string;
}

function source(
	issuer: string,
	document: string,
	section: string,
	basis: SourceBasis = 'from memory',
	note?: string
): RuleSource {
	return Object.freeze(
		note ? { issuer, document, section, basis, note } : { issuer, document, section, basis }
	);
}

const IATA = 'International Air Transport Association (IATA)';
const DGR = 'Dangerous Goods Regulations (DGR), 66th edition 2025 and 67th edition 2026';
const UNECE = 'United Nations (UNECE)';
const IMO = 'International Maritime Organization (IMO)';

export const SOURCES = Object.freeze({
	unNumbers: source(
		UNECE,
		'Recommendations on the Transport of Dangerous Goods, Model Regulations',
		'3.2 Dangerous Goods List, UN 3090, 3091, 3480, 3481; 2.9.4'
	),
	un383: source(
		UNECE,
		'Manual of Tests and Criteria',
		'Part III, subsection 38.3 (tests T.1–T.8); 38.3.5 test summary'
	),
	un383Summary: source(
		UNECE,
		'Model Regulations, 21st revised edition (2019)',
		'2.9.4 (g): test summary to be made available from 1 January 2020'
	),
	airPackingInstruction: (pi: string) => source(IATA, DGR, `Packing Instruction ${pi}`),
	airSectionII: source(
		IATA,
		DGR,
		'PI 966, 967, 969, 970 Section II: Li-ion cell ≤ 20 Wh, battery ≤ 100 Wh; Li metal cell ≤ 1 g, battery ≤ 2 g lithium'
	),
	airSectionIIRemoved: source(
		IATA,
		'Dangerous Goods Regulations, 63rd edition 2022, addendum',
		'PI 965 and PI 968: Section II removed from 1 April 2022; small batteries moved to Section IB'
	),
	airSocStandalone: source(
		IATA,
		DGR,
		'PI 965: state of charge not exceeding 30 % of rated capacity'
	),
	airSocPackedWith: source(
		IATA,
		'Lithium Battery Guidance Document 2025/2026, after DGR 66th/67th edition',
		'PI 966 from 1 January 2026: state of charge not exceeding 30 %; PI 967: recommended',
		'secondary source',
		'Found through public pages quoting the IATA guidance (gomomo.co.za FAQ; redway-tech.com table); the IATA document itself was not read. One page says the 2026 requirement is for cells/batteries above 2.7 Wh: verify in the DGR 67th edition.'
	),
	airCargoOnly: source(
		IATA,
		DGR,
		'PI 965 and PI 968: forbidden on passenger aircraft (UN 3480 since 1 April 2016, UN 3090 since 1 January 2015); Cargo Aircraft Only label'
	),
	airMark: source(IATA, DGR, '7.1.5.5 lithium battery mark; 7.2.2.3 Class 9 lithium battery label'),
	airDeclaration: source(
		IATA,
		DGR,
		'8.1 Shipper’s Declaration for Dangerous Goods (not needed under Section II)'
	),
	courier: source(
		'Express carriers',
		'Carrier terms and dangerous-goods acceptance lists',
		'Acceptance of lithium batteries in the express network',
		'common practice'
	),
	imdgClass9: source(
		IMO,
		'IMDG Code, Amendment 42-24',
		'3.2 Dangerous Goods List, UN 3090, 3091, 3480, 3481: class 9, P903, EmS F-A, S-I'
	),
	imdgSp: (sp: string) => source(IMO, 'IMDG Code, Amendment 42-24', `3.3, special provision ${sp}`),
	imdgPacking: source(
		IMO,
		'IMDG Code, Amendment 42-24',
		'4.1.4.1 P903, P908, P909, P910, P911; LP903, LP904, LP905, LP906'
	),
	imdgDocuments: source(
		IMO,
		'IMDG Code, Amendment 42-24',
		'5.4.1 dangerous goods transport document; 5.4.2 container/vehicle packing certificate'
	),
	adr: (section: string) =>
		source(
			UNECE,
			'ADR 2025 (European Agreement concerning the International Carriage of Dangerous Goods by Road)',
			section
		)
});

/** "IATA, Dangerous Goods Regulations …, Packing Instruction 965 (from memory)". */
export function formatSource(s: RuleSource): string {
	return `${s.issuer}, ${s.document}, ${s.section} (${s.basis})`;
}
