/**
 * Cartons for shipment lines: how many, what is in the last one, their masses and volume, and
 * carton numbers running on from line to line (the packing list prints these ranges).
 *
 * Pure module: no framework imports.
 */
import {
	MESSAGES,
	checkMillimetres,
	isDecimalString,
	isPositiveDecimalString,
	isPositiveInt,
	prefixProblems,
	type Problem
} from './problem';
import {
	mgOfKg,
	wholeFixed,
	wholeLessThan,
	wholeMinus,
	wholePlain,
	wholePlus,
	wholeProductOf,
	wholeTimes,
	type Whole
} from './whole-units';

export const ORIENTATIONS = ['any', 'this_way_up'] as const;
/** 'this_way_up': the carton's height stays vertical. 'any': it may stand on any face. */
export type Orientation = (typeof ORIENTATIONS)[number];

export interface Packaging {
	/** Units in a full carton. */
	unitsPerCarton: number;
	lengthMm: number;
	widthMm: number;
	heightMm: number;
	/** Gross mass of a FULL carton (units + carton + dunnage), kg. */
	cartonGrossKg: string;
	orientation: Orientation;
	/** Mass a carton may carry on top of it, kg; null = must not be stacked on. */
	maxLoadOnTopKg: string | null;
}

export interface CartonLineInput {
	quantity: number;
	netKgPerUnit: string;
	packaging: Packaging;
}

/** Consecutive cartons that are alike: the full ones, or the one remainder carton. */
export interface CartonGroup {
	fromCarton: number;
	toCarton: number;
	cartons: number;
	unitsPerCarton: number;
	netKgPerCarton: string;
	grossKgPerCarton: string;
}

export interface CartonLine {
	quantity: number;
	unitsPerCarton: number;
	fullCartons: number;
	/** Units in the last, part-filled carton; 0 when every carton is full. */
	remainderUnits: number;
	/** fullCartons, plus 1 when there is a remainder carton. */
	cartons: number;
	firstCarton: number;
	lastCarton: number;
	groups: CartonGroup[];
	carton: {
		lengthMm: number;
		widthMm: number;
		heightMm: number;
		volumeM3: string;
		/** Carton and dunnage without the units: full gross − unitsPerCarton × net. */
		tareKg: string;
		fullGrossKg: string;
	};
	netKg: string;
	grossKg: string;
	volumeM3: string;
}

export type CartonLineResult = { ok: true; line: CartonLine } | { ok: false; problems: Problem[] };

export interface CartonTotals {
	units: number;
	cartons: number;
	netKg: string;
	grossKg: string;
	volumeM3: string;
}

export type CartonLinesResult =
	{ ok: true; lines: CartonLine[]; totals: CartonTotals } | { ok: false; problems: Problem[] };

/** Full cartons and the units left over for a part-filled last carton. */
export function countCartons(
	quantity: number,
	unitsPerCarton: number
): { fullCartons: number; remainderUnits: number; cartons: number } {
	const fullCartons = Math.floor(quantity / unitsPerCarton);
	const remainderUnits = quantity - fullCartons * unitsPerCarton;
	return { fullCartons, remainderUnits, cartons: fullCartons + (remainderUnits > 0 ? 1 : 0) };
}

/** Exact masses of one line's cartons, in whole milligrams (see whole-units.ts). */
export interface CartonMasses {
	netPerUnitMg: Whole;
	tareMg: Whole;
	fullGrossMg: Whole;
	/** Gross of the remainder carton, or null when there is none. */
	remainderGrossMg: Whole | null;
	netMg: Whole;
	grossMg: Whole;
}

/** The exact masses for a line whose input is valid (see `checkCartonLine`). */
export function cartonMasses(input: CartonLineInput): CartonMasses {
	return packProductCartons(cartonProduct(input.netKgPerUnit, input.packaging), input.quantity, 1)
		.masses;
}

/** Problems with the packaging alone (paths relative to the packaging). */
export function checkPackaging(packaging: Packaging): Problem[] {
	const problems: Problem[] = [];
	if (!isPositiveInt(packaging.unitsPerCarton)) {
		problems.push({ path: 'unitsPerCarton', message: MESSAGES.positiveInt });
	}
	checkMillimetres({ ...packaging }, ['lengthMm', 'widthMm', 'heightMm'], problems);
	if (!isPositiveDecimalString(packaging.cartonGrossKg)) {
		problems.push({ path: 'cartonGrossKg', message: MESSAGES.positiveDecimal });
	}
	if (!(ORIENTATIONS as readonly string[]).includes(packaging.orientation)) {
		problems.push({ path: 'orientation', message: 'Choose "any" or "this_way_up".' });
	}
	if (packaging.maxLoadOnTopKg !== null && !isDecimalString(packaging.maxLoadOnTopKg)) {
		problems.push({
			path: 'maxLoadOnTopKg',
			message: `${MESSAGES.decimal} Leave empty (null) when cartons must not be stacked on.`
		});
	}
	return problems;
}

/**
 * The tare problem, when the full-carton gross is below the units' net mass (path relative to
 * the product: "packaging.cartonGrossKg"), or null. Inputs must be well-formed.
 */
export function tareProblem(netKgPerUnit: string, packaging: Packaging): Problem | null {
	// Whole milligrams: the schema runs this for every product of every request.
	const unitsMg = wholeTimes(mgOfKg(netKgPerUnit), packaging.unitsPerCarton);
	if (!wholeLessThan(mgOfKg(packaging.cartonGrossKg), unitsMg)) return null;
	return {
		path: 'packaging.cartonGrossKg',
		message:
			`A full carton’s gross (${packaging.cartonGrossKg} kg) must be at least the net mass of ` +
			`its ${packaging.unitsPerCarton} units (${wholePlain(unitsMg, 6)} kg).`
	};
}

/** Problems with one line's input; paths are relative to the line input. */
export function checkCartonLine(input: CartonLineInput): Problem[] {
	const problems: Problem[] = [];
	if (!isPositiveInt(input.quantity)) {
		problems.push({ path: 'quantity', message: MESSAGES.positiveInt });
	}
	const netOk = isPositiveDecimalString(input.netKgPerUnit);
	if (!netOk) problems.push({ path: 'netKgPerUnit', message: MESSAGES.positiveDecimal });
	const packagingProblems = checkPackaging(input.packaging);
	problems.push(...prefixProblems('packaging', packagingProblems));
	if (netOk && packagingProblems.length === 0) {
		const tare = tareProblem(input.netKgPerUnit, input.packaging);
		if (tare !== null) problems.push(tare);
	}
	return problems;
}

/**
 * What every line of one product shares: its exact masses per carton and their output strings.
 * Computed once per product, not per line (measure() of a 500-line shipment reuses them).
 * The input must be valid (see `checkCartonLine`).
 */
export interface CartonProduct {
	packaging: Packaging;
	/** Whole milligrams and mm³ (see whole-units.ts). */
	netPerUnitMg: Whole;
	fullGrossMg: Whole;
	tareMg: Whole;
	cartonMm3: Whole;
	carton: CartonLine['carton'];
	fullNetKg: string;
}

export function cartonProduct(netKgPerUnit: string, packaging: Packaging): CartonProduct {
	const { lengthMm, widthMm, heightMm } = packaging;
	const netPerUnitMg = mgOfKg(netKgPerUnit);
	const fullGrossMg = mgOfKg(packaging.cartonGrossKg);
	const fullNetMg = wholeTimes(netPerUnitMg, packaging.unitsPerCarton);
	const tareMg = wholeMinus(fullGrossMg, fullNetMg);
	const cartonMm3 = wholeProductOf(lengthMm, widthMm, heightMm);
	return {
		packaging,
		netPerUnitMg,
		fullGrossMg,
		tareMg,
		cartonMm3,
		carton: {
			lengthMm,
			widthMm,
			heightMm,
			volumeM3: wholeFixed(cartonMm3, 9, 6),
			tareKg: kgOfMg(tareMg),
			fullGrossKg: kgOfMg(fullGrossMg)
		},
		fullNetKg: kgOfMg(fullNetMg)
	};
}

/** Kilograms to 3 decimals from whole milligrams (as `kgOut`). */
function kgOfMg(mg: Whole): string {
	return wholeFixed(mg, 6, 3);
}

/**
 * One valid line's cartons and exact masses, from its product's shared figures. Called once per
 * line, so it works in whole milligrams and mm³ rather than decimal.js (see whole-units.ts).
 */
export function packProductCartons(
	product: CartonProduct,
	quantity: number,
	firstCarton: number
): { line: CartonLine; masses: CartonMasses } {
	const upc = product.packaging.unitsPerCarton;
	const count = countCartons(quantity, upc);
	const { netPerUnitMg, tareMg, fullGrossMg } = product;
	const netMg = wholeTimes(netPerUnitMg, quantity);
	const remainderNetMg = wholeTimes(netPerUnitMg, count.remainderUnits);
	const remainderGrossMg = count.remainderUnits > 0 ? wholePlus(tareMg, remainderNetMg) : null;
	const masses: CartonMasses = {
		netPerUnitMg,
		tareMg,
		fullGrossMg,
		remainderGrossMg,
		netMg,
		grossMg: wholePlus(wholeTimes(tareMg, count.cartons), netMg)
	};
	const lastCarton = firstCarton + count.cartons - 1;
	const groups: CartonGroup[] = [];
	if (count.fullCartons > 0) {
		groups.push({
			fromCarton: firstCarton,
			toCarton: firstCarton + count.fullCartons - 1,
			cartons: count.fullCartons,
			unitsPerCarton: upc,
			netKgPerCarton: product.fullNetKg,
			grossKgPerCarton: product.carton.fullGrossKg
		});
	}
	if (remainderGrossMg !== null) {
		groups.push({
			fromCarton: lastCarton,
			toCarton: lastCarton,
			cartons: 1,
			unitsPerCarton: count.remainderUnits,
			netKgPerCarton: kgOfMg(remainderNetMg),
			grossKgPerCarton: kgOfMg(remainderGrossMg)
		});
	}
	return {
		line: {
			quantity,
			unitsPerCarton: upc,
			// Spelt out rather than spread: a spread inside a literal is slow in V8.
			fullCartons: count.fullCartons,
			remainderUnits: count.remainderUnits,
			cartons: count.cartons,
			firstCarton,
			lastCarton,
			groups,
			carton: product.carton,
			netKg: kgOfMg(netMg),
			grossKg: kgOfMg(masses.grossMg),
			volumeM3: wholeFixed(wholeTimes(product.cartonMm3, count.cartons), 9, 6)
		},
		masses
	};
}

/** One line's cartons, numbered from `firstCarton`. */
export function packCartons(input: CartonLineInput, firstCarton = 1): CartonLineResult {
	const problems = checkCartonLine(input);
	if (!isPositiveInt(firstCarton)) {
		problems.push({ path: 'firstCarton', message: MESSAGES.positiveInt });
	}
	if (problems.length > 0) return { ok: false, problems };
	const product = cartonProduct(input.netKgPerUnit, input.packaging);
	return { ok: true, line: packProductCartons(product, input.quantity, firstCarton).line };
}

/**
 * Several lines' cartons, numbered consecutively across the lines in order (line 1 cartons
 * 1–40, line 2 cartons 41–55…), with shipment totals. Problem paths start with the line index.
 */
export function packCartonLines(inputs: readonly CartonLineInput[]): CartonLinesResult {
	const problems: Problem[] = [];
	inputs.forEach((input, index) => {
		problems.push(...prefixProblems(String(index), checkCartonLine(input)));
	});
	if (problems.length > 0) return { ok: false, problems };

	const lines: CartonLine[] = [];
	let next = 1;
	let units = 0;
	let net: Whole = 0;
	let gross: Whole = 0;
	let volume: Whole = 0;
	for (const input of inputs) {
		// Inputs were checked above: pack and weigh each line once.
		const product = cartonProduct(input.netKgPerUnit, input.packaging);
		const { line, masses } = packProductCartons(product, input.quantity, next);
		lines.push(line);
		next = line.lastCarton + 1;
		units += input.quantity;
		net = wholePlus(net, masses.netMg);
		gross = wholePlus(gross, masses.grossMg);
		volume = wholePlus(volume, wholeTimes(product.cartonMm3, line.cartons));
	}
	return {
		ok: true,
		lines,
		totals: {
			units,
			cartons: next - 1,
			netKg: kgOfMg(net),
			grossKg: kgOfMg(gross),
			volumeM3: wholeFixed(volume, 9, 6)
		}
	};
}
