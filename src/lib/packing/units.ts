/**
 * Exact metric ↔ imperial conversions and display formatting.
 *
 * Factors are exact by definition (international yard and pound, 1959; NIST SP 811, 2008,
 * Appendix B): 1 in = 25.4 mm, 1 ft = 0.3048 m, 1 lb = 0.45359237 kg. Multiplying by them is
 * exact; dividing by them (mm → in, kg → lb, m³ → ft³) does not terminate in decimal, so those
 * results carry 60 significant digits and are rounded only for display.
 *
 * Pure module: no framework imports.
 */
import Decimal from 'decimal.js';
import { exact, type DecimalInput } from './exact';

export type { DecimalInput } from './exact';

export type UnitSystem = 'metric' | 'imperial';
export const UNIT_SYSTEMS: readonly UnitSystem[] = ['metric', 'imperial'];

/** Millimetres in one inch, exactly. */
export const MM_PER_INCH = '25.4';
/** Metres in one foot, exactly. */
export const M_PER_FOOT = '0.3048';
/** Kilograms in one avoirdupois pound, exactly. */
export const KG_PER_POUND = '0.45359237';

const mmPerInch = exact(MM_PER_INCH);
const kgPerPound = exact(KG_PER_POUND);
/** 0.3048³ = 0.028316846592 m³ per cubic foot, exactly. */
const m3PerCubicFoot = exact(M_PER_FOOT).pow(3);

export function inchesToMm(inches: DecimalInput): Decimal {
	return exact(inches).times(mmPerInch);
}

export function mmToInches(mm: DecimalInput): Decimal {
	return exact(mm).dividedBy(mmPerInch);
}

export function lbToKg(pounds: DecimalInput): Decimal {
	return exact(pounds).times(kgPerPound);
}

export function kgToLb(kg: DecimalInput): Decimal {
	return exact(kg).dividedBy(kgPerPound);
}

export function ft3ToM3(cubicFeet: DecimalInput): Decimal {
	return exact(cubicFeet).times(m3PerCubicFoot);
}

export function m3ToFt3(m3: DecimalInput): Decimal {
	return exact(m3).dividedBy(m3PerCubicFoot);
}

export interface FormatOptions {
	/** Decimals to show instead of the default for the unit. */
	decimals?: number;
}

/** Default decimals per display unit (display only; computations never round this way). */
export const DISPLAY_DECIMALS = {
	mm: 0,
	in: 2,
	kg: 3,
	lb: 2,
	m3: 3,
	ft3: 2
} as const;

function fixed(value: Decimal, decimals: number): string {
	return value.toFixed(decimals, Decimal.ROUND_HALF_UP);
}

/**
 * A length for display: "1200 mm" or "47.24 in". Plain digits with a "." decimal point and no
 * thousands separators; the screen may localise them.
 */
export function formatLength(
	mm: DecimalInput,
	system: UnitSystem,
	options: FormatOptions = {}
): string {
	return system === 'metric'
		? `${fixed(exact(mm), options.decimals ?? DISPLAY_DECIMALS.mm)} mm`
		: `${fixed(mmToInches(mm), options.decimals ?? DISPLAY_DECIMALS.in)} in`;
}

/** A mass for display: "12.500 kg" or "27.56 lb". */
export function formatMass(
	kg: DecimalInput,
	system: UnitSystem,
	options: FormatOptions = {}
): string {
	return system === 'metric'
		? `${fixed(exact(kg), options.decimals ?? DISPLAY_DECIMALS.kg)} kg`
		: `${fixed(kgToLb(kg), options.decimals ?? DISPLAY_DECIMALS.lb)} lb`;
}

/** A volume for display: "1.728 m³" or "61.02 ft³". */
export function formatVolume(
	m3: DecimalInput,
	system: UnitSystem,
	options: FormatOptions = {}
): string {
	return system === 'metric'
		? `${fixed(exact(m3), options.decimals ?? DISPLAY_DECIMALS.m3)} m³`
		: `${fixed(m3ToFt3(m3), options.decimals ?? DISPLAY_DECIMALS.ft3)} ft³`;
}
