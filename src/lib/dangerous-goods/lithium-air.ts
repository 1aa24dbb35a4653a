/**
 * Lithium batteries by air (and by express courier, which flies): the IATA packing instruction,
 * whether Section II may apply, cargo-aircraft-only, state of charge, marks and labels.
 * Source: IATA Dangerous Goods Regulations, 66th (2025) and 67th (2026) editions, PI 965–970
 * (from memory, except where a source says otherwise).
 *
 * Pure module: no framework imports.
 */
import Decimal from 'decimal.js';
import type { LithiumClassification } from './lithium-battery';
import { LITHIUM_LIMITS } from './lithium-battery';
import type { LithiumRequirement } from './requirements';
import { SOURCES } from './sources';

export type AirPackingInstruction = '965' | '966' | '967' | '968' | '969' | '970';

/** I/IA/IB: fully regulated (Shipper's Declaration); II: reduced requirements. */
export type AirSection = 'IA' | 'IB' | 'I' | 'II';

export type StateOfChargeRule = 'required' | 'recommended' | 'none';

export interface AirScreening {
	packingInstruction: AirPackingInstruction;
	/** The section that applies; I (or IA) when the data cannot confirm the small limits. */
	section: AirSection;
	/** True for PI 965 and PI 968, where Section II no longer exists (since 1 April 2022). */
	sectionIIRemoved: boolean;
	/** Standalone batteries (UN 3480, UN 3090) are forbidden on passenger aircraft. */
	cargoAircraftOnly: boolean;
	stateOfCharge: StateOfChargeRule;
	/** '30' when a state-of-charge limit is required or recommended. */
	stateOfChargeLimitPercent: string | null;
	lithiumBatteryMark: boolean;
	class9LithiumLabel: boolean;
	dangerousGoodsDeclaration: boolean;
	requirements: LithiumRequirement[];
}

/** From this day the 30 % state of charge also applies to PI 966 (IATA DGR 67th edition). */
export const PI966_SOC_FROM = '2026-01-01';

const PI: Readonly<
	Record<
		LithiumClassification['chemistry'],
		Record<LithiumClassification['config'], AirPackingInstruction>
	>
> = Object.freeze({
	lithium_ion: { standalone: '965', packed_with: '966', contained: '967' },
	lithium_metal: { standalone: '968', packed_with: '969', contained: '970' }
});

function stateOfCharge(c: LithiumClassification, onDate: string): StateOfChargeRule {
	if (c.chemistry !== 'lithium_ion') return 'none';
	if (c.config === 'standalone') return 'required';
	if (onDate < PI966_SOC_FROM) return 'recommended';
	if (c.config !== 'packed_with') return 'recommended';
	// From 2026 the 30 % binds PI 966 cells and batteries over 2.7 Wh; at or below, it stays a
	// recommendation (IATA DGR 66th ed. as summarised by Lion Technology Inc., "Lithium Battery
	// 30% State of Charge Recommendations for 2025", 21 Oct 2024: secondary source). Unknown
	// ratings are treated as over.
	const wh = c.ratings.batteryWh ?? c.ratings.cellWh;
	return wh !== null && new Decimal(wh).lte(PI966_SOC_ABOVE_WH) ? 'recommended' : 'required';
}

/** PI 966 batteries above this many watt-hours must be at 30 % state of charge from 2026. */
export const PI966_SOC_ABOVE_WH = '2.7';

/**
 * @param courier true for express courier: the same air rules, and the carrier's own acceptance
 * conditions on top.
 */
export function screenAir(c: LithiumClassification, onDate: string, courier = false): AirScreening {
	const pi = PI[c.chemistry][c.config];
	const standalone = c.config === 'standalone';
	const small = c.withinSmallLimits === true;
	const section: AirSection = standalone ? (small ? 'IB' : 'IA') : small ? 'II' : 'I';
	const soc = stateOfCharge(c, onDate);
	const req: LithiumRequirement[] = [];
	const add = (
		id: string,
		text: string,
		source = SOURCES.airPackingInstruction(pi),
		action = true
	) => req.push({ id, text, source, action });

	add(
		'air_pi',
		`${c.unNumber}, ${c.properShippingName}, class 9: IATA Packing Instruction ${pi}, Section ${section}.`,
		SOURCES.airPackingInstruction(pi),
		false
	);
	if (standalone) {
		add(
			'air_section_ii_removed',
			`Section II no longer exists for PI ${pi}: batteries on their own are always fully regulated by air${small ? ' (these small ones fall under Section IB, with its quantity limits per package)' : ''}.`,
			SOURCES.airSectionIIRemoved,
			false
		);
		add(
			'air_cargo_aircraft_only',
			`${c.unNumber} is forbidden on passenger aircraft: book cargo aircraft only and apply the Cargo Aircraft Only label.`,
			SOURCES.airCargoOnly
		);
	} else if (small) {
		add(
			'air_section_ii',
			`Section II of PI ${pi} may apply: within the cell and battery limits. Its conditions per package (net quantity, number of batteries, packaging, 1.2 m drop test where asked) still have to be checked by trained staff.`,
			SOURCES.airSectionII,
			false
		);
	}
	if (soc !== 'none') {
		const source = c.config === 'standalone' ? SOURCES.airSocStandalone : SOURCES.airSocPackedWith;
		add(
			soc === 'required' ? 'air_soc_required' : 'air_soc_recommended',
			soc === 'required'
				? `PI ${pi}: ship the lithium-ion cells and batteries at a state of charge not exceeding ${LITHIUM_LIMITS.stateOfChargePercent} % of rated capacity.`
				: `PI ${pi}: a state of charge not exceeding ${LITHIUM_LIMITS.stateOfChargePercent} % of rated capacity is recommended.`,
			source,
			soc === 'required'
		);
	}
	const mark = section === 'II' || section === 'IB';
	const label = section !== 'II';
	if (mark)
		add(
			'air_mark',
			c.config === 'contained'
				? 'Lithium battery mark on each package (not needed for packages with at most 4 cells or 2 batteries installed in equipment, or button cells installed in equipment).'
				: 'Lithium battery mark on each package.',
			SOURCES.airMark
		);
	if (label) {
		add('air_label', 'Class 9 lithium battery hazard label on each package.', SOURCES.airMark);
		add(
			'air_declaration',
			'A Shipper’s Declaration for Dangerous Goods is needed, prepared and signed by trained staff.',
			SOURCES.airDeclaration
		);
	} else {
		add(
			'air_awb_statement',
			`Section II of PI ${pi} needs no Shipper’s Declaration; follow the carrier’s instructions for the air waybill wording.`,
			SOURCES.airDeclaration
		);
	}
	if (courier)
		add(
			'courier_acceptance',
			'Express carriers accept lithium batteries only under their own conditions, and many refuse fully regulated ones or batteries on their own: check with the carrier before booking.',
			SOURCES.courier
		);
	return {
		packingInstruction: pi,
		section,
		sectionIIRemoved: standalone,
		cargoAircraftOnly: standalone,
		stateOfCharge: soc,
		stateOfChargeLimitPercent: soc === 'none' ? null : LITHIUM_LIMITS.stateOfChargePercent,
		lithiumBatteryMark: mark,
		class9LithiumLabel: label,
		dangerousGoodsDeclaration: label,
		requirements: req
	};
}
