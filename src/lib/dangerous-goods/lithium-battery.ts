/**
 * A product's lithium battery as stored (decimal strings from PostgreSQL numerics), turned into
 * exact ratings, its UN number and proper shipping name, and the small-battery limits that
 * decide whether reduced requirements may apply (IATA Section II, IMDG/ADR special provision
 * 188). All arithmetic in decimal.js.
 *
 * Pure module: no framework imports.
 */
import Decimal from 'decimal.js';
import type { BATTERY_CHEMISTRY_VALUES, BATTERY_CONFIG_VALUES } from '../products';
import { SOURCES, type RuleSource } from './sources';

export type BatteryConfig = (typeof BATTERY_CONFIG_VALUES)[number];
export type BatteryChemistry = (typeof BATTERY_CHEMISTRY_VALUES)[number];
export type LithiumUnNumber = 'UN3480' | 'UN3481' | 'UN3090' | 'UN3091';

/** The product's battery columns, camel-cased; decimals as strings, blanks as null or ''. */
export interface LithiumBatteryData {
	sku?: string;
	batteryConfig: BatteryConfig;
	batteryChemistry?: BatteryChemistry | '' | null;
	cellWh?: string | null;
	batteryWh?: string | null;
	cellLithiumG?: string | null;
	batteryLithiumG?: string | null;
	nominalVoltage?: string | null;
	capacityAh?: string | null;
	cellsPerBattery?: number | null;
	batteriesPerUnit?: number | null;
}

export interface DataIssue {
	field: keyof LithiumBatteryData;
	message: string;
}

/** The published small-battery limits, as exact decimal strings. */
export const LITHIUM_LIMITS = Object.freeze({
	/** Wh per lithium-ion cell (IATA DGR Section II; IMDG/ADR SP 188). */
	ionCellWh: '20',
	/** Wh per lithium-ion battery. */
	ionBatteryWh: '100',
	/** Grams of lithium per lithium-metal cell. */
	metalCellG: '1',
	/** Grams of lithium per lithium-metal battery. */
	metalBatteryG: '2',
	/** Highest state of charge, % of rated capacity, where the air rules ask for a limit. */
	stateOfChargePercent: '30'
});

export interface BatteryRatings {
	/** Exact decimal strings, or null when unknown. */
	cellWh: string | null;
	batteryWh: string | null;
	cellLithiumG: string | null;
	batteryLithiumG: string | null;
	/** True when batteryWh is nominal voltage × capacity (none stored, or the stored one lower). */
	batteryWhFromVoltage: boolean;
	/** True when the battery is a single cell, so the cell limit applies to it. */
	singleCell: boolean;
}

export interface LimitCheck {
	quantity: 'cellWh' | 'batteryWh' | 'cellLithiumG' | 'batteryLithiumG';
	/** The product's value, or null when unknown. */
	value: string | null;
	limit: string;
	unit: 'Wh' | 'g';
	/** "Not exceeding": exactly at the limit is within. Null when the value is unknown. */
	within: boolean | null;
	source: RuleSource;
}

export interface LithiumClassification {
	sku: string | null;
	config: Exclude<BatteryConfig, 'none'>;
	chemistry: BatteryChemistry;
	unNumber: LithiumUnNumber;
	properShippingName: string;
	hazardClass: '9';
	ratings: BatteryRatings;
	limitChecks: LimitCheck[];
	/** All limits met (true), one exceeded (false), or not known from the data (null). */
	withinSmallLimits: boolean | null;
	dataIssues: DataIssue[];
	source: RuleSource;
}

const DECIMAL = /^\d{1,12}(\.\d{1,6})?$/;

function readDecimal(
	data: LithiumBatteryData,
	field: keyof LithiumBatteryData,
	label: string,
	issues: DataIssue[]
): Decimal | null {
	const raw = data[field];
	if (raw === null || raw === undefined || raw === '') return null;
	const text = String(raw).trim();
	if (!DECIMAL.test(text) || new Decimal(text).lte(0)) {
		issues.push({ field, message: `${label} must be a positive decimal number, not "${text}".` });
		return null;
	}
	return new Decimal(text);
}

/** Watt-hours = nominal voltage (V) × rated capacity (Ah), exactly (UN Model Regulations, 2.9.4 note, and IATA DGR Appendix A "Watt-hour rating"; from memory). */
export function wattHours(nominalVoltage: string, capacityAh: string): string {
	const v = new Decimal(nominalVoltage);
	const ah = new Decimal(capacityAh);
	if (!v.isFinite() || !ah.isFinite() || v.lte(0) || ah.lte(0))
		throw new RangeError('wattHours: voltage and capacity must be positive numbers.');
	return v.times(ah).toString();
}

/** Memory of which UN number fits which chemistry and configuration (UN Model Regulations 3.2). */
const UN: Readonly<
	Record<BatteryChemistry, Record<Exclude<BatteryConfig, 'none'>, [LithiumUnNumber, string]>>
> = Object.freeze({
	lithium_ion: {
		standalone: ['UN3480', 'LITHIUM ION BATTERIES (including lithium ion polymer batteries)'],
		packed_with: [
			'UN3481',
			'LITHIUM ION BATTERIES PACKED WITH EQUIPMENT (including lithium ion polymer batteries)'
		],
		contained: [
			'UN3481',
			'LITHIUM ION BATTERIES CONTAINED IN EQUIPMENT (including lithium ion polymer batteries)'
		]
	},
	lithium_metal: {
		standalone: ['UN3090', 'LITHIUM METAL BATTERIES (including lithium alloy batteries)'],
		packed_with: [
			'UN3091',
			'LITHIUM METAL BATTERIES PACKED WITH EQUIPMENT (including lithium alloy batteries)'
		],
		contained: [
			'UN3091',
			'LITHIUM METAL BATTERIES CONTAINED IN EQUIPMENT (including lithium alloy batteries)'
		]
	}
});

function check(
	quantity: LimitCheck['quantity'],
	value: Decimal | null,
	limit: string,
	unit: LimitCheck['unit']
): LimitCheck {
	return {
		quantity,
		value: value === null ? null : value.toString(),
		limit,
		unit,
		within: value === null ? null : value.lte(limit),
		source: SOURCES.airSectionII
	};
}

function ratingsOf(data: LithiumBatteryData, issues: DataIssue[]): BatteryRatings {
	const singleCell = data.cellsPerBattery === 1;
	let cellWh = readDecimal(data, 'cellWh', 'Watt-hours per cell', issues);
	let batteryWh = readDecimal(data, 'batteryWh', 'Watt-hours per battery', issues);
	let cellG = readDecimal(data, 'cellLithiumG', 'Lithium per cell', issues);
	let batteryG = readDecimal(data, 'batteryLithiumG', 'Lithium per battery', issues);
	const volts = readDecimal(data, 'nominalVoltage', 'Nominal voltage', issues);
	const ah = readDecimal(data, 'capacityAh', 'Capacity', issues);
	let fromVoltage = false;
	if (volts !== null && ah !== null) {
		// The product service stores V × Ah rounded to 0.01 Wh, which can round 100.0036 down to
		// the limit: when voltage and capacity are known, the exact product wins if it is higher.
		const exact = new Decimal(wattHours(volts.toString(), ah.toString()));
		if (batteryWh === null || exact.gt(batteryWh)) {
			batteryWh = exact;
			fromVoltage = true;
		}
	}
	// A single-cell battery is a cell for these limits (UN Manual of Tests and Criteria,
	// 38.3.2.3 definitions; IATA DGR Appendix A; from memory).
	if (singleCell) {
		cellWh ??= batteryWh;
		batteryWh ??= cellWh;
		cellG ??= batteryG;
		batteryG ??= cellG;
	}
	const s = (d: Decimal | null) => (d === null ? null : d.toString());
	return {
		cellWh: s(cellWh),
		batteryWh: s(batteryWh),
		cellLithiumG: s(cellG),
		batteryLithiumG: s(batteryG),
		batteryWhFromVoltage: fromVoltage,
		singleCell
	};
}

function limitChecksOf(chemistry: BatteryChemistry, r: BatteryRatings): LimitCheck[] {
	const d = (v: string | null) => (v === null ? null : new Decimal(v));
	if (chemistry === 'lithium_ion') {
		const cell = check('cellWh', d(r.cellWh), LITHIUM_LIMITS.ionCellWh, 'Wh');
		// A single-cell battery must meet the cell limit; the battery limit adds nothing.
		return r.singleCell
			? [cell]
			: [cell, check('batteryWh', d(r.batteryWh), LITHIUM_LIMITS.ionBatteryWh, 'Wh')];
	}
	const cell = check('cellLithiumG', d(r.cellLithiumG), LITHIUM_LIMITS.metalCellG, 'g');
	return r.singleCell
		? [cell]
		: [cell, check('batteryLithiumG', d(r.batteryLithiumG), LITHIUM_LIMITS.metalBatteryG, 'g')];
}

/**
 * Classifies a product's battery, or returns null when the product has none. A battery without
 * chemistry cannot be classified: that is a data issue, and lithium-ion is assumed (the stricter
 * air rules) so the screening still warns.
 */
export function classifyLithiumBattery(data: LithiumBatteryData): LithiumClassification | null {
	if (data.batteryConfig === 'none') return null;
	const issues: DataIssue[] = [];
	let chemistry = data.batteryChemistry;
	if (chemistry !== 'lithium_ion' && chemistry !== 'lithium_metal') {
		issues.push({
			field: 'batteryChemistry',
			message: 'Battery chemistry unknown: lithium-ion assumed until it is recorded.'
		});
		chemistry = 'lithium_ion';
	}
	const ratings = ratingsOf(data, issues);
	const limitChecks = limitChecksOf(chemistry, ratings);
	for (const c of limitChecks)
		if (c.value === null)
			issues.push({
				field: c.quantity,
				message: `${c.quantity === 'cellWh' || c.quantity === 'cellLithiumG' ? 'Per-cell' : 'Per-battery'} ${c.unit === 'Wh' ? 'watt-hours' : 'lithium content'} unknown: the small-battery limits cannot be confirmed, so full regulation is assumed.`
			});
	const withinSmallLimits = limitChecks.some((c) => c.within === false)
		? false
		: limitChecks.every((c) => c.within === true)
			? true
			: null;
	const [unNumber, properShippingName] = UN[chemistry][data.batteryConfig];
	return {
		sku: data.sku ?? null,
		config: data.batteryConfig,
		chemistry,
		unNumber,
		properShippingName,
		hazardClass: '9',
		ratings,
		limitChecks,
		withinSmallLimits,
		dataIssues: issues,
		source: SOURCES.unNumbers
	};
}
