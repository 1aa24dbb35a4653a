/**
 * Lithium batteries by sea (IMDG Code, Amendment 42-24) and by road (ADR 2025), summarised for
 * guidance. Both follow the UN Model Regulations: the same UN numbers, class 9, and special
 * provision 188 for small cells and batteries (from memory).
 *
 * Pure module: no framework imports.
 */
import type { LithiumClassification } from './lithium-battery';
import type { LithiumRequirement } from './requirements';
import { SOURCES } from './sources';

export interface SpecialProvision {
	number: string;
	summary: string;
}

/** The IMDG Code special provisions on UN 3090, 3091, 3480 and 3481 (3.3; from memory). */
export const IMDG_LITHIUM_SPECIAL_PROVISIONS: readonly SpecialProvision[] = Object.freeze([
	{
		number: '188',
		summary:
			'Small cells and batteries (Li-ion cell ≤ 20 Wh, battery ≤ 100 Wh; Li metal cell ≤ 1 g, battery ≤ 2 g) are not subject to the other provisions of the Code when protected against short circuit, in strong packaging (1.2 m drop test, at most 30 kg gross, unless in equipment) and marked with the lithium battery mark.'
	},
	{
		number: '230',
		summary:
			'Cells and batteries may be carried under these entries only if each type has passed the UN38.3 tests and meets 2.9.4.'
	},
	{
		number: '310',
		summary:
			'The UN38.3 testing does not apply to production runs of at most 100 cells or batteries, or pre-production prototypes carried for testing, packed to P910 or LP905.'
	},
	{
		number: '348',
		summary: 'Batteries made after 31 December 2011 carry their watt-hour rating on the case.'
	},
	{
		number: '360',
		summary: 'Vehicles powered only by lithium batteries go under UN 3171, not these entries.'
	},
	{
		number: '376',
		summary:
			'Damaged or defective cells and batteries: P908 or LP904, or P911 or LP906 if liable to react dangerously, with the competent authority’s approval where required.'
	},
	{
		number: '377',
		summary: 'Cells and batteries carried for disposal or recycling: P909 or LP904.'
	}
]);

export type SurfaceRegime = 'sp188' | 'class9';

export interface SurfaceScreening {
	code: 'IMDG' | 'ADR';
	/** 'sp188': small-battery exemption may apply; 'class9': fully regulated. */
	regime: SurfaceRegime;
	packingInstruction: 'P903';
	specialProvisions: readonly SpecialProvision[];
	requirements: LithiumRequirement[];
}

function mark188(c: LithiumClassification): string {
	return c.config === 'contained'
		? 'Lithium battery mark on each package, except packages of button cells installed in equipment, or with at most 4 cells or 2 batteries installed in equipment and at most 2 such packages in the consignment.'
		: 'Lithium battery mark on each package.';
}

/** IMDG Code screening for FCL and LCL sea freight. */
export function screenSea(c: LithiumClassification): SurfaceScreening {
	const small = c.withinSmallLimits === true;
	const sp = (n: string) => SOURCES.imdgSp(n);
	const req: LithiumRequirement[] = [];
	if (small) {
		req.push(
			{
				id: 'sea_sp188',
				text: `Special provision 188 may apply to ${c.unNumber}: within the small-battery limits, the other provisions of the IMDG Code do not apply if its conditions are met.`,
				source: sp('188'),
				action: false
			},
			{ id: 'sea_mark', text: mark188(c), source: sp('188'), action: true }
		);
	} else {
		req.push(
			{
				id: 'sea_class9',
				text: `${c.unNumber}, ${c.properShippingName}, class 9, fully regulated: packing instruction P903 (LP903 for a large single battery), class 9 lithium battery label, UN number and proper shipping name on each package; stowage and segregation per the Dangerous Goods List (EmS F-A, S-I).`,
				source: SOURCES.imdgClass9,
				action: true
			},
			{
				id: 'sea_documents',
				text: 'A dangerous goods transport document, and for a container a container packing certificate, signed by trained staff.',
				source: SOURCES.imdgDocuments,
				action: true
			}
		);
	}
	req.push({
		id: 'sea_damaged',
		text: 'Damaged, defective or waste batteries, and prototypes, follow other instructions (SP 376, 377, 310: P908, P909, P910, P911).',
		source: SOURCES.imdgPacking,
		action: false
	});
	return {
		code: 'IMDG',
		regime: small ? 'sp188' : 'class9',
		packingInstruction: 'P903',
		specialProvisions: IMDG_LITHIUM_SPECIAL_PROVISIONS,
		requirements: req
	};
}

/** ADR screening for road freight, briefly: same split as the IMDG Code. */
export function screenRoad(c: LithiumClassification): SurfaceScreening {
	const small = c.withinSmallLimits === true;
	const req: LithiumRequirement[] = small
		? [
				{
					id: 'road_sp188',
					text: `ADR special provision 188 may apply to ${c.unNumber}: small cells and batteries, protected against short circuit, in strong packaging. ${mark188(c)}`,
					source: SOURCES.adr('3.3.1, special provision 188'),
					action: true
				}
			]
		: [
				{
					id: 'road_class9',
					text: `${c.unNumber}, class 9, fully regulated: P903, class 9 lithium battery label, transport document, tunnel restriction code E, transport category 2; the carrier needs the ADR equipment and trained driver.`,
					source: SOURCES.adr('3.2 Table A, UN 3090, 3091, 3480, 3481; 4.1.4.1 P903; 5.4.1'),
					action: true
				}
			];
	return {
		code: 'ADR',
		regime: small ? 'sp188' : 'class9',
		packingInstruction: 'P903',
		specialProvisions: IMDG_LITHIUM_SPECIAL_PROVISIONS.filter((p) =>
			['188', '230', '310', '348', '376', '377'].includes(p.number)
		),
		requirements: req
	};
}
