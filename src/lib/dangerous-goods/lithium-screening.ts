/**
 * One product's lithium battery screened for one transport mode: its classification, the rules of
 * the mode (IATA DGR for air and courier, IMDG Code for sea, ADR for road), the UN38.3 test
 * summary, and one list of requirements, each with its source.
 *
 * Pure module: no framework imports.
 */
import type { TransportMode } from '../trade/shipment-status';
import { DANGEROUS_GOODS_CAUTION } from './caution';
import { screenAir, type AirScreening } from './lithium-air';
import {
	classifyLithiumBattery,
	type LithiumBatteryData,
	type LithiumClassification
} from './lithium-battery';
import { screenRoad, screenSea, type SurfaceScreening } from './lithium-sea-road';
import type { LithiumRequirement } from './requirements';
import { SOURCES } from './sources';

/** 'not_restricted': no battery; 'reduced': IATA Section II or SP 188; else fully regulated. */
export type LithiumRegime = 'not_restricted' | 'reduced' | 'fully_regulated';

export interface LithiumScreening {
	sku: string | null;
	mode: TransportMode;
	regime: LithiumRegime;
	/** Null when the product has no battery. */
	classification: LithiumClassification | null;
	/** Filled for air and courier. */
	air: AirScreening | null;
	/** Filled for sea (IMDG Code) and road (ADR). */
	surface: SurfaceScreening | null;
	/** True for every lithium cell or battery, whatever the mode. */
	un383SummaryRequired: boolean;
	/** UN 3480 and UN 3090 (batteries on their own), whatever the mode chosen. */
	forbiddenOnPassengerAircraft: boolean;
	requirements: LithiumRequirement[];
	caution: string;
}

export interface ScreeningOptions {
	/** ISO date (YYYY-MM-DD) the goods travel; rules that start on a date use it. Today by default. */
	onDate?: string;
}

const today = () => new Date().toISOString().slice(0, 10);

function un383Requirement(c: LithiumClassification): LithiumRequirement[] {
	return [
		{
			id: 'un383_tests',
			text: `Each cell and battery type must have passed the UN38.3 tests (T.1–T.8 as they apply to ${c.chemistry === 'lithium_ion' ? 'lithium-ion' : 'lithium-metal'} cells and batteries).`,
			source: SOURCES.un383,
			action: false
		},
		{
			id: 'un383_summary',
			text: 'Be able to make the UN38.3 test summary (38.3.5) available to the carrier and the consignee; keep a current copy on file.',
			source: SOURCES.un383Summary,
			action: true
		}
	];
}

function dataRequirements(c: LithiumClassification): LithiumRequirement[] {
	return c.dataIssues.map((issue) => ({
		id: `data_${issue.field}`,
		text: issue.message,
		source: {
			issuer: 'Landfall',
			document: 'Product master data',
			section: issue.field,
			basis: 'common practice'
		},
		action: true
	}));
}

/** Screens one product's battery for one mode. */
export function screenLithiumProduct(
	product: LithiumBatteryData,
	mode: TransportMode,
	options: ScreeningOptions = {}
): LithiumScreening {
	const c = classifyLithiumBattery(product);
	if (c === null)
		return {
			sku: product.sku ?? null,
			mode,
			regime: 'not_restricted',
			classification: null,
			air: null,
			surface: null,
			un383SummaryRequired: false,
			forbiddenOnPassengerAircraft: false,
			requirements: [],
			caution: DANGEROUS_GOODS_CAUTION
		};
	const byAir = mode === 'air' || mode === 'courier';
	const air = byAir ? screenAir(c, options.onDate ?? today(), mode === 'courier') : null;
	const surface = byAir ? null : mode === 'road' ? screenRoad(c) : screenSea(c);
	const reduced = air ? air.section === 'II' : surface?.regime === 'sp188';
	return {
		sku: c.sku,
		mode,
		regime: reduced ? 'reduced' : 'fully_regulated',
		classification: c,
		air,
		surface,
		un383SummaryRequired: true,
		forbiddenOnPassengerAircraft: c.config === 'standalone',
		requirements: [
			...dataRequirements(c),
			...(air?.requirements ?? surface?.requirements ?? []),
			...un383Requirement(c)
		],
		caution: DANGEROUS_GOODS_CAUTION
	};
}
