/**
 * Chargeable weight per transport mode. The rules are data (`CHARGEABLE_RULES`), each with the
 * note saying where it comes from; carriers' own tariffs override them.
 *
 * Pure module: no framework imports.
 */
import type Decimal from 'decimal.js';
import {
	M3_PER_MM3,
	ZERO,
	ceilToStep,
	exact,
	group,
	kgOut,
	m3Out,
	maxOf,
	show,
	wholeProduct,
	Exact
} from './exact';
import { showWhole, wholePlus, wholeProductOf, wholeTimes, type Whole } from './whole-units';

export const CHARGE_MODES = ['air', 'courier', 'sea_lcl', 'road', 'sea_fcl'] as const;
export type ChargeMode = (typeof CHARGE_MODES)[number];

export const CHARGE_BASES = ['gross', 'volume', 'revenue_tonnes', 'per_container'] as const;
export type ChargeBasis = (typeof CHARGE_BASES)[number];

/** Volume weight = Σ piece volumes (dimensions rounded to whole cm) ÷ divisor. */
export interface VolumetricDivisorRule {
	readonly mode: ChargeMode;
	readonly kind: 'cm3_per_kg';
	readonly name: string;
	/** Cubic centimetres that count as one kilogram. */
	readonly cm3PerKg: string;
	/** Each piece dimension to the nearest whole centimetre, 0.5 cm and above up. */
	readonly dimensionRounding: 'nearest_cm_half_up';
	/** The chargeable weight is rounded up to a multiple of this. */
	readonly roundUpToKg: string;
	readonly source: string;
}

/** Volume weight = volume in m³ (exact, from mm) × kg per m³. */
export interface DensityFactorRule {
	readonly mode: ChargeMode;
	readonly kind: 'kg_per_m3';
	readonly name: string;
	readonly kgPerM3: string;
	/** The chargeable weight is rounded up to a multiple of this. */
	readonly roundUpToKg: string;
	readonly source: string;
}

/** Weight or measure: revenue tonnes = max(m³ ÷ m3PerRevenueTonne, kg ÷ kgPerRevenueTonne, min). */
export interface WeightOrMeasureRule {
	readonly mode: ChargeMode;
	readonly kind: 'weight_or_measure';
	readonly name: string;
	readonly m3PerRevenueTonne: string;
	readonly kgPerRevenueTonne: string;
	readonly minimumRevenueTonnes: string;
	/** Revenue tonnes are rounded up to a multiple of this. */
	readonly roundUpTo: string;
	readonly source: string;
}

/** Charged per container; no chargeable weight. */
export interface PerContainerRule {
	readonly mode: ChargeMode;
	readonly kind: 'per_container';
	readonly name: string;
	readonly source: string;
}

export type ChargeableRule =
	VolumetricDivisorRule | DensityFactorRule | WeightOrMeasureRule | PerContainerRule;

export const CHARGEABLE_RULES: readonly ChargeableRule[] = Object.freeze([
	{
		mode: 'air',
		kind: 'cm3_per_kg',
		name: 'Air cargo',
		cm3PerKg: '6000',
		dimensionRounding: 'nearest_cm_half_up',
		roundUpToKg: '0.5',
		source:
			'IATA volumetric rule: 6000 cm³ = 1 kg; each dimension to the nearest whole cm (0.5 up); ' +
			'chargeable weight = greater of gross and volume weight, rounded up to the next 0.5 kg. ' +
			'IATA, The Air Cargo Tariff and Rules (TACT Rules), chargeable weight rules (section ' +
			'number from memory), as taught in IATA cargo training. Carriers may use other divisors.'
	},
	{
		mode: 'courier',
		kind: 'cm3_per_kg',
		name: 'Express courier',
		cm3PerKg: '5000',
		dimensionRounding: 'nearest_cm_half_up',
		roundUpToKg: '0.5',
		source:
			'common practice: express carriers commonly use 5000 cm³ = 1 kg with the air rounding ' +
			'(nearest cm, next 0.5 kg); check the carrier’s service guide.'
	},
	{
		mode: 'sea_lcl',
		kind: 'weight_or_measure',
		name: 'Sea freight, less than container load',
		m3PerRevenueTonne: '1',
		kgPerRevenueTonne: '1000',
		minimumRevenueTonnes: '1',
		roundUpTo: '0.000001',
		source:
			'common practice: weight or measure (W/M): 1 revenue tonne = 1 m³ or 1000 kg, whichever ' +
			'gives more; minimum 1 revenue tonne. Volume exact from millimetres; consolidators may ' +
			'round further.'
	},
	{
		mode: 'road',
		kind: 'kg_per_m3',
		name: 'Road groupage',
		kgPerM3: '333',
		roundUpToKg: '0.001',
		source:
			'common practice: 1 m³ = 333 kg (3 m³ per tonne) in road groupage; volume exact from ' +
			'millimetres. Loading-metre and pallet-space rules are not modelled.'
	},
	{
		mode: 'sea_fcl',
		kind: 'per_container',
		name: 'Sea freight, full container load',
		source:
			'common practice: a full container is charged per container (box rate), not by weight ' +
			'or volume; only the container’s payload and cubic capacity limit the cargo.'
	}
] satisfies ChargeableRule[]);

/** One kind of piece (carton or pallet), `count` times. */
export interface ChargeablePiece {
	lengthMm: number;
	widthMm: number;
	heightMm: number;
	/** Gross mass of one piece, kg (decimal string). */
	grossKg: string;
	count: number;
	/** How the steps name this piece, e.g. "Line 1, cartons 1–40". */
	label?: string;
}

export interface ChargeableWeight {
	mode: ChargeMode;
	/** What the charge is based on: the gross or volume weight, revenue tonnes, or the container. */
	basis: ChargeBasis;
	/** Total gross mass, kg, 3 decimals. */
	grossKg: string;
	/** Total volume, m³, 6 decimals, exact from millimetres (no centimetre rounding). */
	volumeM3: string;
	/**
	 * Weight the volume counts as, kg, 3 decimals (air/courier: from the rounded cm dimensions;
	 * LCL: m³ × 1000). Null for FCL.
	 */
	volumeWeightKg: string | null;
	/** Chargeable weight, kg (air, courier, road). Null for LCL and FCL. */
	chargeableKg: string | null;
	/** Revenue tonnes (LCL only), 6 decimals, rounded up. */
	revenueTonnes: string | null;
	/** The computation in words, with its numbers. */
	steps: string[];
	source: string;
}

function checkPieces(pieces: readonly ChargeablePiece[]): void {
	pieces.forEach((piece, index) => {
		for (const side of ['lengthMm', 'widthMm', 'heightMm', 'count'] as const) {
			const value = piece[side];
			if (!Number.isSafeInteger(value) || value <= 0) {
				throw new RangeError(`pieces[${index}].${side} must be a positive whole number`);
			}
		}
		if (!/^(0|[1-9][0-9]*)(\.[0-9]+)?$/.test(piece.grossKg)) {
			throw new RangeError(`pieces[${index}].grossKg must be a non-negative decimal string`);
		}
	});
}

function pieceName(piece: ChargeablePiece, index: number): string {
	const label = piece.label ?? `Piece ${index + 1}`;
	return piece.count === 1 ? label : `${label} (${group(String(piece.count))} pieces)`;
}

/** A whole-millimetre length to whole centimetres, 0.5 cm and above rounding up. */
export function mmToNearestCm(mm: number): number {
	return Math.floor((mm + 5) / 10);
}

function cm(mm: number): string {
	// Whole millimetres are tenths of a centimetre: the digits, no division (as show(mm ÷ 10, 1)).
	if (Number.isSafeInteger(mm) && mm >= 0) {
		const tenths = mm % 10;
		return group(String((mm - tenths) / 10)) + (tenths === 0 ? '' : `.${tenths}`);
	}
	return show(exact(mm).dividedBy(10), 1);
}

interface Totals {
	grossKg: Decimal;
	volumeM3: Decimal;
}

function totals(pieces: readonly ChargeablePiece[]): Totals {
	let grossKg = ZERO;
	let mm3 = ZERO;
	for (const piece of pieces) {
		grossKg = grossKg.plus(exact(piece.grossKg).times(piece.count));
		mm3 = mm3.plus(wholeProduct(piece.lengthMm, piece.widthMm, piece.heightMm, piece.count));
	}
	return { grossKg, volumeM3: mm3.times(M3_PER_MM3) };
}

/** Up to this many pieces each get their own step line; more are grouped by their size. */
export const PIECE_DETAIL_LIMIT = 40;

interface VolumeSteps {
	cm3: Decimal;
	steps: string[];
}

// The rounded-cm volume does not depend on the divisor: air and courier share one computation.
const volumeCache = new WeakMap<readonly ChargeablePiece[], VolumeSteps>();

function roundedCm3(piece: ChargeablePiece) {
	const l = mmToNearestCm(piece.lengthMm);
	const w = mmToNearestCm(piece.widthMm);
	const h = mmToNearestCm(piece.heightMm);
	return { l, w, h, each: wholeProductOf(l, w, h) };
}

function volumeSteps(pieces: readonly ChargeablePiece[]): VolumeSteps {
	const cached = volumeCache.get(pieces);
	if (cached) return cached;
	const steps: string[] = [];
	// Whole cm³, as JS numbers while safe (see whole-units.ts): one step line per piece or size.
	let cm3: Whole = 0;
	const line = (name: string, piece: ChargeablePiece, count: number) => {
		const { l, w, h, each } = roundedCm3(piece);
		const all = wholeTimes(each, count);
		cm3 = wholePlus(cm3, all);
		steps.push(
			`${name}: ${cm(piece.lengthMm)} × ${cm(piece.widthMm)} × ` +
				`${cm(piece.heightMm)} cm, to the nearest whole cm ${l} × ${w} × ${h} cm = ` +
				`${showWhole(each)} cm³` +
				(count === 1 ? '' : ` each, ${showWhole(all)} cm³ in all`)
		);
	};
	if (pieces.length <= PIECE_DETAIL_LIMIT) {
		pieces.forEach((piece, index) => line(pieceName(piece, index), piece, piece.count));
	} else {
		// Many pieces: one line per size (the volume depends on the size only), naming a few.
		type SizeGroup = { piece: ChargeablePiece; count: number; kinds: number; names: string[] };
		const groups = new Map<number | string, SizeGroup>();
		pieces.forEach((piece, index) => {
			const { lengthMm: l, widthMm: w, heightMm: h } = piece;
			// A number key while the sides fit in 5 digits (all of measure's do), cheaper than text.
			const key = l < 1e5 && w < 1e5 && h < 1e5 ? (l * 1e5 + w) * 1e5 + h : `${l}×${w}×${h}`;
			let size = groups.get(key);
			if (size === undefined) {
				size = { piece, count: 0, kinds: 0, names: [] };
				groups.set(key, size);
			}
			size.count += piece.count;
			size.kinds += 1;
			// Only three are named in the step.
			if (size.names.length < 3) size.names.push(piece.label ?? `Piece ${index + 1}`);
		});
		for (const { piece, count, kinds, names } of groups.values()) {
			const shown = names.join('; ');
			const more = kinds > 3 ? `; and ${group(String(kinds - 3))} more` : '';
			line(
				`${group(String(count))} piece${count === 1 ? '' : 's'} (${shown}${more})`,
				piece,
				count
			);
		}
	}
	const result = { cm3: new Exact(cm3), steps };
	volumeCache.set(pieces, result);
	return result;
}

function byDivisor(
	rule: VolumetricDivisorRule,
	pieces: readonly ChargeablePiece[],
	t: Totals
): ChargeableWeight {
	const volume = volumeSteps(pieces);
	const steps = [...volume.steps];
	const cm3 = volume.cm3;
	const divisor = exact(rule.cm3PerKg);
	const volumeWeight = cm3.dividedBy(divisor);
	steps.push(
		`Volume weight: ${show(cm3)} cm³ ÷ ${show(divisor)} cm³ per kg = ${show(volumeWeight)} kg`
	);
	steps.push(`Gross weight: ${show(t.grossKg)} kg`);
	const volumeGoverns = volumeWeight.greaterThan(t.grossKg);
	const greater = maxOf(t.grossKg, volumeWeight);
	steps.push(
		volumeGoverns
			? `The volume weight is the greater: ${show(greater)} kg`
			: `The gross weight is the greater (or equal): ${show(greater)} kg`
	);
	const step = exact(rule.roundUpToKg);
	const chargeable = ceilToStep(greater, step);
	steps.push(`Rounded up to the next ${show(step)} kg: ${show(chargeable)} kg chargeable`);
	return {
		mode: rule.mode,
		basis: volumeGoverns ? 'volume' : 'gross',
		grossKg: kgOut(t.grossKg),
		volumeM3: m3Out(t.volumeM3),
		volumeWeightKg: kgOut(volumeWeight),
		chargeableKg: kgOut(chargeable),
		revenueTonnes: null,
		steps,
		source: rule.source
	};
}

function byDensity(rule: DensityFactorRule, t: Totals): ChargeableWeight {
	const factor = exact(rule.kgPerM3);
	const volumeWeight = t.volumeM3.times(factor);
	const volumeGoverns = volumeWeight.greaterThan(t.grossKg);
	const greater = maxOf(t.grossKg, volumeWeight);
	const step = exact(rule.roundUpToKg);
	const chargeable = ceilToStep(greater, step);
	return {
		mode: rule.mode,
		basis: volumeGoverns ? 'volume' : 'gross',
		grossKg: kgOut(t.grossKg),
		volumeM3: m3Out(t.volumeM3),
		volumeWeightKg: kgOut(volumeWeight),
		chargeableKg: kgOut(chargeable),
		revenueTonnes: null,
		steps: [
			`Volume: ${show(t.volumeM3, 6)} m³ (from the dimensions in mm)`,
			`Volume weight: ${show(t.volumeM3, 6)} m³ × ${show(factor)} kg per m³ = ` +
				`${show(volumeWeight)} kg`,
			`Gross weight: ${show(t.grossKg)} kg`,
			volumeGoverns
				? `The volume weight is the greater: ${show(chargeable)} kg chargeable`
				: `The gross weight is the greater (or equal): ${show(chargeable)} kg chargeable`
		],
		source: rule.source
	};
}

function byWeightOrMeasure(rule: WeightOrMeasureRule, t: Totals): ChargeableWeight {
	const byMeasure = t.volumeM3.dividedBy(exact(rule.m3PerRevenueTonne));
	const kgPerTonne = exact(rule.kgPerRevenueTonne);
	const byWeight = t.grossKg.dividedBy(kgPerTonne);
	const minimum = exact(rule.minimumRevenueTonnes);
	const greater = maxOf(byWeight, byMeasure);
	const revenue = ceilToStep(maxOf(greater, minimum), exact(rule.roundUpTo));
	const minimumApplies = minimum.greaterThan(greater);
	return {
		mode: rule.mode,
		basis: 'revenue_tonnes',
		grossKg: kgOut(t.grossKg),
		volumeM3: m3Out(t.volumeM3),
		volumeWeightKg: kgOut(byMeasure.times(kgPerTonne)),
		chargeableKg: null,
		revenueTonnes: revenue.toFixed(6),
		steps: [
			`Measure: ${show(t.volumeM3, 6)} m³ = ${show(byMeasure, 6)} revenue tonnes ` +
				`(${show(exact(rule.m3PerRevenueTonne))} m³ each)`,
			`Weight: ${show(t.grossKg)} kg = ${show(byWeight, 6)} revenue tonnes ` +
				`(${show(kgPerTonne)} kg each)`,
			`The ${byMeasure.greaterThan(byWeight) ? 'measure' : 'weight'} is the greater: ` +
				`${show(greater, 6)} revenue tonnes`,
			minimumApplies
				? `Below the minimum of ${show(minimum)}: ${show(revenue, 6)} revenue tonnes charged`
				: `At least the minimum of ${show(minimum)}: ${show(revenue, 6)} revenue tonnes charged`
		],
		source: rule.source
	};
}

function perContainer(rule: PerContainerRule, t: Totals): ChargeableWeight {
	return {
		mode: rule.mode,
		basis: 'per_container',
		grossKg: kgOut(t.grossKg),
		volumeM3: m3Out(t.volumeM3),
		volumeWeightKg: null,
		chargeableKg: null,
		revenueTonnes: null,
		steps: [
			'Charged per container, not by weight or volume: there is no chargeable weight.',
			`For the container choice: gross ${show(t.grossKg)} kg, volume ${show(t.volumeM3, 6)} m³.`
		],
		source: rule.source
	};
}

/** The chargeable weight of the pieces under one rule. Throws RangeError on malformed pieces. */
export function chargeableWeight(
	pieces: readonly ChargeablePiece[],
	rule: ChargeableRule
): ChargeableWeight {
	checkPieces(pieces);
	return weigh(pieces, rule, totals(pieces));
}

function weigh(
	pieces: readonly ChargeablePiece[],
	rule: ChargeableRule,
	t: Totals
): ChargeableWeight {
	switch (rule.kind) {
		case 'cm3_per_kg':
			return byDivisor(rule, pieces, t);
		case 'kg_per_m3':
			return byDensity(rule, t);
		case 'weight_or_measure':
			return byWeightOrMeasure(rule, t);
		case 'per_container':
			return perContainer(rule, t);
	}
}

/**
 * The chargeable weight of the pieces under each rule (by default every mode, in
 * `CHARGEABLE_RULES` order). Throws RangeError on malformed pieces.
 */
export function chargeableWeights(
	pieces: readonly ChargeablePiece[],
	rules: readonly ChargeableRule[] = CHARGEABLE_RULES
): ChargeableWeight[] {
	checkPieces(pieces);
	const t = totals(pieces);
	return rules.map((rule) => weigh(pieces, rule, t));
}

/**
 * As `chargeableWeights`, for a caller that already holds the pieces' exact totals (measure()
 * sums them as it builds the pieces): the pieces are neither checked nor summed again.
 */
export function chargeableWeightsOfTotals(
	pieces: readonly ChargeablePiece[],
	t: { grossKg: Decimal; volumeM3: Decimal },
	rules: readonly ChargeableRule[] = CHARGEABLE_RULES
): ChargeableWeight[] {
	return rules.map((rule) => weigh(pieces, rule, t));
}

/** The built-in rule for a mode. */
export function chargeableRule(mode: ChargeMode): ChargeableRule {
	const rule = CHARGEABLE_RULES.find((r) => r.mode === mode);
	if (rule === undefined) throw new RangeError(`no chargeable rule for ${mode}`);
	return rule;
}
