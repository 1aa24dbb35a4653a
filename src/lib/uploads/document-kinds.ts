/**
 * The kinds of supporting document Landfall keeps, per shipment or per product. Pure module.
 */

export const SUPPORTING_KINDS = [
	'un38_3_summary',
	'safety_data_sheet',
	'restricted_substances',
	'conflict_minerals',
	'proof_of_origin',
	'other'
] as const;
export type SupportingKind = (typeof SUPPORTING_KINDS)[number];

export interface SupportingKindInfo {
	label: string;
	hint: string;
}

export const SUPPORTING_KIND_INFO: Readonly<Record<SupportingKind, SupportingKindInfo>> =
	Object.freeze({
		un38_3_summary: {
			label: 'UN38.3 test summary',
			// UN Manual of Tests and Criteria, Part III, 38.3.5 lists what the summary states (from memory).
			hint: 'The lithium cell or battery test summary (UN Manual of Tests and Criteria, 38.3.5), from the battery maker.'
		},
		safety_data_sheet: {
			label: 'Safety data sheet',
			hint: 'The maker’s SDS for the battery or a chemical in the product.'
		},
		restricted_substances: {
			label: 'Restricted substances declaration',
			// EU Directive 2011/65/EU (RoHS) and Regulation (EC) No 1907/2006 (REACH) (from memory).
			hint: 'A supplier declaration on restricted substances, e.g. RoHS (Directive 2011/65/EU) or REACH.'
		},
		conflict_minerals: {
			label: 'Conflict-minerals report',
			hint: 'The supplier’s report on tin, tantalum, tungsten and gold in the supply chain.'
		},
		proof_of_origin: {
			label: 'Proof of origin',
			hint: 'A certificate of origin, or the supplier declarations a preferential origin claim rests on.'
		},
		other: { label: 'Other', hint: 'Anything else customs, the carrier or the buyer asked for.' }
	});

export function isSupportingKind(value: unknown): value is SupportingKind {
	return typeof value === 'string' && (SUPPORTING_KINDS as readonly string[]).includes(value);
}
