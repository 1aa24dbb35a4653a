/**
 * Palletising the cartons of one shipment line on one pallet type: cartons per layer (see
 * layer-pattern.ts), layers, cartons per pallet, and the pallets needed.
 *
 * Limits, all applied (common practice):
 * - height: deck height + layers × carton height ≤ maximum loaded height;
 * - mass: pallet tare + cartons × full-carton gross ≤ maximum gross (so a pallet limited by
 *   mass may have a part-filled top layer);
 * - stacking: the bottom carton carries (layers − 1) × full-carton gross, which must not exceed
 *   the carton's maxLoadOnTopKg (columns stacked carton on carton); not stackable → one layer.
 *   The same limit is used whichever face the carton stands on.
 *
 * Lines are not mixed on a pallet; each line ends with at most one part-filled pallet.
 *
 * Pure module: no framework imports.
 */
import type { PalletType } from '../reference/equipment';
import { ORIENTATIONS, type Orientation } from './cartons';
import { exact, show } from './exact';
import { layerPattern, type LayerPattern } from './layer-pattern';
import {
	MESSAGES,
	checkMillimetres,
	isDecimalString,
	isPositiveDecimalString,
	isPositiveInt,
	type Problem
} from './problem';
import {
	mgOfKg,
	wholeEquals,
	wholeFixed,
	wholeFloorDiv,
	wholeMinus,
	wholePlus,
	wholeTimes,
	type Whole
} from './whole-units';

export interface PalletSpec {
	lengthMm: number;
	widthMm: number;
	/** Height of the empty pallet, mm. */
	deckHeightMm: number;
	tareKg: string;
	/** Pallet plus load, kg. */
	maxGrossKg: string;
	/** Pallet plus load, mm. */
	maxLoadedHeightMm: number;
}

/** The plain pallet input for a reference pallet type (its `heightMm` is the deck height). */
export function palletSpecFromType(
	type: Pick<PalletType, 'lengthMm' | 'widthMm' | 'heightMm' | 'tareKg' | 'maxGrossKg'> & {
		maxLoadedHeightMm: number;
	}
): PalletSpec {
	return {
		lengthMm: type.lengthMm,
		widthMm: type.widthMm,
		deckHeightMm: type.heightMm,
		tareKg: type.tareKg,
		maxGrossKg: type.maxGrossKg,
		maxLoadedHeightMm: type.maxLoadedHeightMm
	};
}

export interface PalletCarton {
	lengthMm: number;
	widthMm: number;
	heightMm: number;
	/** Gross of a full carton, kg. */
	grossKg: string;
	orientation: Orientation;
	/** Mass the carton may carry on top, kg; null = must not be stacked on. */
	maxLoadOnTopKg: string | null;
}

/** Which of the carton's own dimensions stands vertical on the pallet. */
export type VerticalSide = 'height' | 'length' | 'width';

export type PalletLimit = 'height' | 'weight' | 'stacking';

/** How a carton type sits on the pallet, for a full pallet. */
export interface PalletStowage {
	verticalSide: VerticalSide;
	/** The carton dimension standing vertical, mm. */
	layerHeightMm: number;
	pattern: LayerPattern;
	perLayer: number;
	/** Layers the maximum loaded height allows. */
	layersByHeight: number;
	/** Layers the stacking limit allows (1 when not stackable). */
	layersByStacking: number;
	/** Cartons the maximum gross allows. */
	cartonsByWeight: number;
	cartonsPerPallet: number;
	layersPerPallet: number;
	/** Loaded height of a full pallet, mm. */
	loadedHeightMm: number;
	/** The limit that sets cartonsPerPallet. */
	limitedBy: PalletLimit;
	/** Every orientation tried (one for 'this_way_up'), with the result of each. */
	tried: { verticalSide: VerticalSide; perLayer: number; cartonsPerPallet: number }[];
}

export type PalletFailure = 'invalid_input' | 'footprint' | 'height' | 'weight';

export interface PalletError {
	ok: false;
	reason: PalletFailure;
	message: string;
	/** Field problems (reason 'invalid_input'); paths relative to the call's input. */
	problems: Problem[];
}

/** Consecutive pallets that are alike. */
export interface PalletGroup {
	fromPallet: number;
	toPallet: number;
	pallets: number;
	cartonsPerPallet: number;
	layers: number;
	loadedHeightMm: number;
	grossKgPerPallet: string;
	/** Cartons on these pallets, numbered as on the packing list; pallet by pallet in order. */
	firstCarton: number;
	lastCarton: number;
}

export interface PalletPlan {
	stowage: PalletStowage;
	cartons: number;
	pallets: number;
	fullPallets: number;
	/** 1 when the last pallet holds fewer cartons than a full one. */
	partPallets: number;
	firstPallet: number;
	lastPallet: number;
	groups: PalletGroup[];
	/** Cartons plus pallet tares, kg. */
	grossKg: string;
	/** Pallet footprint × loaded height, summed, m³. */
	volumeM3: string;
}

export interface PalletPlanInput {
	pallet: PalletSpec;
	carton: PalletCarton;
	/** Cartons of the line to palletise (≥ 1). */
	cartons: number;
	/** Gross of the line's last carton when it is a part-filled one (≤ grossKg). */
	lastCartonGrossKg?: string;
	/** Number of the line's first carton on the packing list. Default 1. */
	firstCarton?: number;
	/** Number of the line's first pallet. Default 1. */
	firstPallet?: number;
}

export type PalletPlanResult = { ok: true; plan: PalletPlan } | PalletError;

/** Exact figures behind a plan, for callers that go on computing (measure): mg and mm³. */
export interface PalletPlanExact {
	grossMg: Whole;
	volumeMm3: Whole;
	/** Gross of one pallet of each of the plan's groups, in the same order. */
	groupGrossMg: Whole[];
}

function invalid(problems: Problem[]): PalletError {
	return {
		ok: false,
		reason: 'invalid_input',
		message: problems.map((p) => `${p.path}: ${p.message}`).join(' '),
		problems
	};
}

export function checkPallet(pallet: PalletSpec, prefix = 'pallet'): Problem[] {
	const problems: Problem[] = [];
	checkMillimetres(
		{ ...pallet },
		['lengthMm', 'widthMm', 'deckHeightMm', 'maxLoadedHeightMm'],
		problems,
		prefix
	);
	if (!isDecimalString(pallet.tareKg)) {
		problems.push({ path: `${prefix}.tareKg`, message: MESSAGES.decimal });
	}
	if (!isPositiveDecimalString(pallet.maxGrossKg)) {
		problems.push({ path: `${prefix}.maxGrossKg`, message: MESSAGES.positiveDecimal });
	}
	if (problems.length === 0) {
		if (pallet.maxLoadedHeightMm <= pallet.deckHeightMm) {
			problems.push({
				path: `${prefix}.maxLoadedHeightMm`,
				message: 'The maximum loaded height must be above the pallet’s own height.'
			});
		}
		if (!exact(pallet.maxGrossKg).greaterThan(pallet.tareKg)) {
			problems.push({
				path: `${prefix}.maxGrossKg`,
				message: 'The maximum gross must be above the pallet’s tare.'
			});
		}
	}
	return problems;
}

function checkCarton(carton: PalletCarton, prefix = 'carton'): Problem[] {
	const problems: Problem[] = [];
	checkMillimetres({ ...carton }, ['lengthMm', 'widthMm', 'heightMm'], problems, prefix);
	if (!isPositiveDecimalString(carton.grossKg)) {
		problems.push({ path: `${prefix}.grossKg`, message: MESSAGES.positiveDecimal });
	}
	if (!(ORIENTATIONS as readonly string[]).includes(carton.orientation)) {
		problems.push({ path: `${prefix}.orientation`, message: 'Choose "any" or "this_way_up".' });
	}
	if (carton.maxLoadOnTopKg !== null && !isDecimalString(carton.maxLoadOnTopKg)) {
		problems.push({ path: `${prefix}.maxLoadOnTopKg`, message: MESSAGES.decimal });
	}
	return problems;
}

interface Upright {
	verticalSide: VerticalSide;
	first: number;
	second: number;
	height: number;
}

function uprights(carton: PalletCarton): Upright[] {
	const { lengthMm: l, widthMm: w, heightMm: h } = carton;
	const all: Upright[] = [{ verticalSide: 'height', first: l, second: w, height: h }];
	if (carton.orientation === 'any') {
		all.push({ verticalSide: 'length', first: w, second: h, height: l });
		all.push({ verticalSide: 'width', first: l, second: h, height: w });
	}
	// A face already tried (same footprint sides and height) adds nothing.
	const seen = new Set<string>();
	return all.filter((u) => {
		const key = `${Math.max(u.first, u.second)}×${Math.min(u.first, u.second)}×${u.height}`;
		if (seen.has(key)) return false;
		seen.add(key);
		return true;
	});
}

function mm(value: number): string {
	return String(value);
}

/**
 * How the carton sits on a full pallet: the orientation that fits the most cartons per pallet
 * (ties: the carton's height vertical if that is among them, else the lower load). An error result, not a throw, when the
 * carton cannot go on this pallet at all.
 */
export function palletStowage(
	pallet: PalletSpec,
	carton: PalletCarton
): { ok: true; stowage: PalletStowage } | PalletError {
	const problems = [...checkPallet(pallet), ...checkCarton(carton)];
	if (problems.length > 0) return invalid(problems);

	const grossMg = mgOfKg(carton.grossKg);
	const roomMg = wholeMinus(mgOfKg(pallet.maxGrossKg), mgOfKg(pallet.tareKg));
	const cartonsByWeight = wholeFloorDiv(roomMg, grossMg);
	if (cartonsByWeight < 1) {
		const gross = exact(carton.grossKg);
		return {
			ok: false,
			reason: 'weight',
			message:
				`One carton (${show(gross)} kg) on this pallet (${show(exact(pallet.tareKg))} kg tare) ` +
				`is above its maximum gross of ${show(exact(pallet.maxGrossKg))} kg.`,
			problems: []
		};
	}
	const layersByStacking =
		carton.maxLoadOnTopKg === null ? 1 : wholeFloorDiv(mgOfKg(carton.maxLoadOnTopKg), grossMg) + 1;
	const clearance = pallet.maxLoadedHeightMm - pallet.deckHeightMm;

	const tried: PalletStowage['tried'] = [];
	let best: PalletStowage | null = null;
	let fitsFootprint = false;
	for (const u of uprights(carton)) {
		const pattern = layerPattern(pallet.lengthMm, pallet.widthMm, u.first, u.second);
		const perLayer = pattern.count;
		const layersByHeight = Math.floor(clearance / u.height);
		if (perLayer > 0) fitsFootprint = true;
		const maxLayers = Math.min(layersByHeight, layersByStacking);
		const byLayers = perLayer * maxLayers;
		const cartonsPerPallet = Math.min(byLayers, cartonsByWeight);
		tried.push({ verticalSide: u.verticalSide, perLayer, cartonsPerPallet });
		if (cartonsPerPallet === 0) continue;
		const layersPerPallet = Math.ceil(cartonsPerPallet / perLayer);
		const candidate: PalletStowage = {
			verticalSide: u.verticalSide,
			layerHeightMm: u.height,
			pattern,
			perLayer,
			layersByHeight,
			layersByStacking,
			cartonsByWeight,
			cartonsPerPallet,
			layersPerPallet,
			loadedHeightMm: pallet.deckHeightMm + layersPerPallet * u.height,
			limitedBy:
				cartonsByWeight < byLayers
					? 'weight'
					: layersByStacking < layersByHeight
						? 'stacking'
						: 'height',
			tried
		};
		// The carton's own height stays vertical on a tie; other faces tie-break on the lower load.
		if (
			best === null ||
			candidate.cartonsPerPallet > best.cartonsPerPallet ||
			(candidate.cartonsPerPallet === best.cartonsPerPallet &&
				best.verticalSide !== 'height' &&
				candidate.loadedHeightMm < best.loadedHeightMm)
		) {
			best = candidate;
		}
	}
	if (best !== null) return { ok: true, stowage: best };

	const footprint = `${mm(carton.lengthMm)} × ${mm(carton.widthMm)} × ${mm(carton.heightMm)} mm`;
	const palletSize = `${mm(pallet.lengthMm)} × ${mm(pallet.widthMm)} mm`;
	const faces = carton.orientation === 'any' ? 'on any face' : 'upright (this way up)';
	if (!fitsFootprint) {
		return {
			ok: false,
			reason: 'footprint',
			message: `A ${footprint} carton does not fit within the ${palletSize} pallet ${faces} (no overhang).`,
			problems: []
		};
	}
	return {
		ok: false,
		reason: 'height',
		message:
			`A ${footprint} carton standing ${faces} does not fit under the ` +
			`${mm(pallet.maxLoadedHeightMm)} mm maximum loaded height on a ` +
			`${mm(pallet.deckHeightMm)} mm pallet.`,
		problems: []
	};
}

/** The masses a plan multiplies, already exact, in whole milligrams (see whole-units.ts). */
export interface PalletPlanMasses {
	cartonGrossMg: Whole;
	lastCartonGrossMg: Whole;
	palletTareMg: Whole;
}

function planExact(
	input: Omit<PalletPlanInput, 'lastCartonGrossKg'>,
	stowage: PalletStowage,
	masses: PalletPlanMasses
): { plan: PalletPlan; exact: PalletPlanExact } {
	const { pallet, cartons } = input;
	const firstCarton = input.firstCarton ?? 1;
	const firstPallet = input.firstPallet ?? 1;
	const { cartonsPerPallet: perPallet, perLayer, layerHeightMm } = stowage;
	// Once per line: whole milligrams and mm³, not decimal.js (see whole-units.ts), and each
	// group's figures worked out once, as measure() calls this for every line.
	const gross = masses.cartonGrossMg;
	const lastGross = masses.lastCartonGrossMg;
	const tare = masses.palletTareMg;
	const pallets = Math.ceil(cartons / perPallet);
	const lastCount = cartons - (pallets - 1) * perPallet;
	const footprintMm2 = wholeTimes(pallet.lengthMm, pallet.widthMm);

	const groups: PalletGroup[] = [];
	const groupGrossMg: Whole[] = [];
	let total: Whole = 0;
	let volume: Whole = 0;
	const add = (from: number, count: number, each: number, grossEach: Whole): void => {
		const firstOfGroup = firstCarton + (from - firstPallet) * perPallet;
		const layers = Math.ceil(each / perLayer);
		const loadedHeightMm = pallet.deckHeightMm + layers * layerHeightMm;
		groups.push({
			fromPallet: from,
			toPallet: from + count - 1,
			pallets: count,
			cartonsPerPallet: each,
			layers,
			loadedHeightMm,
			grossKgPerPallet: wholeFixed(grossEach, 6, 3),
			firstCarton: firstOfGroup,
			lastCarton: firstOfGroup + count * each - 1
		});
		groupGrossMg.push(grossEach);
		total = wholePlus(total, wholeTimes(grossEach, count));
		volume = wholePlus(volume, wholeTimes(wholeTimes(footprintMm2, loadedHeightMm), count));
	};
	const fullGross = wholePlus(tare, wholeTimes(gross, perPallet));
	if (lastCount === perPallet && wholeEquals(lastGross, gross)) {
		add(firstPallet, pallets, perPallet, fullGross);
	} else {
		if (pallets > 1) add(firstPallet, pallets - 1, perPallet, fullGross);
		const lastPalletGross = wholePlus(wholePlus(tare, wholeTimes(gross, lastCount - 1)), lastGross);
		add(firstPallet + pallets - 1, 1, lastCount, lastPalletGross);
	}

	const partPallets = lastCount < perPallet ? 1 : 0;
	return {
		plan: {
			stowage,
			cartons,
			pallets,
			fullPallets: pallets - partPallets,
			partPallets,
			firstPallet,
			lastPallet: firstPallet + pallets - 1,
			groups,
			grossKg: wholeFixed(total, 6, 3),
			volumeM3: wholeFixed(volume, 9, 6)
		},
		exact: { grossMg: total, volumeMm3: volume, groupGrossMg }
	};
}

function checkPlanInput(input: PalletPlanInput): Problem[] {
	const problems: Problem[] = [];
	if (!isPositiveInt(input.cartons))
		problems.push({ path: 'cartons', message: MESSAGES.positiveInt });
	for (const field of ['firstCarton', 'firstPallet'] as const) {
		const value = input[field];
		if (value !== undefined && !isPositiveInt(value)) {
			problems.push({ path: field, message: MESSAGES.positiveInt });
		}
	}
	const last = input.lastCartonGrossKg;
	if (last !== undefined) {
		if (!isPositiveDecimalString(last)) {
			problems.push({ path: 'lastCartonGrossKg', message: MESSAGES.positiveDecimal });
		} else if (
			isPositiveDecimalString(input.carton.grossKg) &&
			exact(last).greaterThan(input.carton.grossKg)
		) {
			problems.push({
				path: 'lastCartonGrossKg',
				message: 'The last carton cannot be heavier than a full one.'
			});
		}
	}
	return problems;
}

/** Pallets for `cartons` cartons of one line, with exact totals (for measure). */
export function planPalletsExact(
	input: PalletPlanInput
): { ok: true; plan: PalletPlan; exact: PalletPlanExact } | PalletError {
	return planPalletsWithStowage(input, palletStowage(input.pallet, input.carton));
}

/**
 * As `planPalletsExact`, with the stowage already worked out by `palletStowage` for this pallet
 * and carton (measure() does that once per product, not once per line).
 */
export function planPalletsWithStowage(
	input: PalletPlanInput,
	stowage: ReturnType<typeof palletStowage>
): { ok: true; plan: PalletPlan; exact: PalletPlanExact } | PalletError {
	const problems = [...(stowage.ok ? [] : stowage.problems), ...checkPlanInput(input)];
	if (problems.length > 0) return invalid(problems);
	if (!stowage.ok) return stowage;
	const masses = {
		cartonGrossMg: mgOfKg(input.carton.grossKg),
		lastCartonGrossMg: mgOfKg(input.lastCartonGrossKg ?? input.carton.grossKg),
		palletTareMg: mgOfKg(input.pallet.tareKg)
	};
	return { ok: true, ...planExact(input, stowage.stowage, masses) };
}

/**
 * For measure(), whose cartons are valid by construction: the stowage found once per product
 * and the masses already exact, so nothing is checked or parsed again per line.
 */
export function planPalletsOfMasses(
	input: Omit<PalletPlanInput, 'lastCartonGrossKg'>,
	stowage: PalletStowage,
	masses: PalletPlanMasses
): { plan: PalletPlan; exact: PalletPlanExact } {
	return planExact(input, stowage, masses);
}

/** Pallets for `cartons` cartons of one line: full pallets and at most one part pallet. */
export function planPallets(input: PalletPlanInput): PalletPlanResult {
	const result = planPalletsExact(input);
	return result.ok ? { ok: true, plan: result.plan } : result;
}
