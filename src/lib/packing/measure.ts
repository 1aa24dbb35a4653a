/**
 * Measure a shipment: cartons per line (numbered across lines), totals, optionally pallets, and
 * the chargeable weight per mode — of the cartons, or of the pallets when palletised.
 *
 * The input is validated with `measureInputSchema` here too (unless it is that schema's own frozen
 * output), so a caller that skipped it still gets field-path problems instead of a throw. Any
 * problem means no measurement (`ok: false`): a partial packing list or total would be worse than
 * none.
 *
 * Pure module: no framework imports.
 */
import {
	chargeableWeightsOfTotals,
	type ChargeablePiece,
	type ChargeableWeight
} from './chargeable';
import {
	cartonProduct,
	checkCartonLine,
	packProductCartons,
	type CartonLine,
	type CartonMasses,
	type CartonProduct,
	type CartonTotals,
	type Packaging
} from './cartons';
import { exact, kgOut, m3Out } from './exact';
import {
	palletStowage,
	planPalletsOfMasses,
	type PalletCarton,
	type PalletPlan,
	type PalletSpec
} from './pallets';
import { MESSAGES, isPositiveInt, type Problem } from './problem';
import { isValidatedMeasureInput, measureInputSchema, type MeasureInput } from './schema';
import {
	mgOfKg,
	wholeFixed,
	wholePlain,
	wholePlus,
	wholeTimes,
	wholeToDecimal,
	type Whole
} from './whole-units';

export interface MeasuredLine extends CartonLine {
	/** Index of the line in the input (0-based). */
	lineIndex: number;
	sku: string;
}

export interface MeasuredPallets {
	pallet: PalletSpec;
	lines: { lineIndex: number; sku: string; plan: PalletPlan }[];
	/** Pallets for the whole shipment, numbered 1… across lines. */
	pallets: number;
	tareKg: string;
	/** Cartons plus pallet tares. */
	grossKg: string;
	/** Pallet footprint × loaded height, summed. */
	volumeM3: string;
}

export type MeasureResult =
	| {
			ok: true;
			lines: MeasuredLine[];
			/** The cartons (pallets not included). */
			totals: CartonTotals;
			pallets: MeasuredPallets | null;
			chargeable: ChargeableWeight[];
			/** Always empty here. */
			problems: Problem[];
	  }
	| { ok: false; problems: Problem[] };

function range(noun: string, from: number, to: number): string {
	return from === to ? `${noun} ${from}` : `${noun}s ${from}–${to}`;
}

/**
 * A chargeable piece for a run of one line's cartons or pallets. Its label and gross string are
 * spelt out only when read: the steps name three pieces per size and the totals are already
 * known, so most of the thousand or so pieces of a large shipment never need them.
 */
class LinePiece implements ChargeablePiece {
	constructor(
		readonly lengthMm: number,
		readonly widthMm: number,
		readonly heightMm: number,
		readonly count: number,
		private readonly grossMg: Whole,
		private readonly lineIndex: number,
		private readonly noun: 'carton' | 'pallet',
		private readonly from: number,
		private readonly to: number,
		private readonly note = ''
	) {}

	get grossKg(): string {
		return wholePlain(this.grossMg, 6);
	}

	get label(): string {
		return `Line ${this.lineIndex + 1}, ${range(this.noun, this.from, this.to)}${this.note}`;
	}
}

/** Measure a shipment; see the module comment. */
export function measure(input: MeasureInput): MeasureResult {
	const parsed = isValidatedMeasureInput(input)
		? { success: true as const, data: input }
		: measureInputSchema.safeParse(input);
	if (!parsed.success) {
		return {
			ok: false,
			problems: parsed.error.issues.map((issue) => ({
				path: issue.path.map(String).join('.'),
				message: issue.message
			}))
		};
	}
	const { products, lines, pallet } = parsed.data;
	const bySku = new Map(products.map((product) => [product.sku, product]));

	const measured: MeasuredLine[] = [];
	const cartonPieces: ChargeablePiece[] = [];
	const problems: Problem[] = [];
	let nextCarton = 1;
	let units = 0;
	const sumsBySku = new Map<string, { facts: CartonProduct; quantity: number; cartons: number }>();
	const masses: CartonMasses[] = [];

	// Per product, once: its problems (reported on every line that uses it) or its shared figures.
	const perProduct = new Map<string, { problems: Problem[] } | { facts: CartonProduct }>();
	const productFacts = (sku: string, netKgPerUnit: string, packaging: Packaging) => {
		let entry = perProduct.get(sku);
		if (entry === undefined) {
			const found = checkCartonLine({ quantity: 1, netKgPerUnit, packaging });
			entry =
				found.length > 0 ? { problems: found } : { facts: cartonProduct(netKgPerUnit, packaging) };
			perProduct.set(sku, entry);
		}
		return entry;
	};

	lines.forEach((line, lineIndex) => {
		const product = bySku.get(line.sku);
		const packaging = product?.packaging;
		// The schema has already reported these; the guard keeps the types honest.
		if (product === undefined || packaging === undefined || packaging === null) return;
		const entry = productFacts(line.sku, product.netKgPerUnit, packaging);
		if ('problems' in entry || !isPositiveInt(line.quantity)) {
			const found = [
				...(isPositiveInt(line.quantity)
					? []
					: [{ path: 'quantity', message: MESSAGES.positiveInt }]),
				...('problems' in entry ? entry.problems : [])
			];
			problems.push(
				...found.map((p) => ({ path: `lines.${lineIndex}.${p.path}`, message: p.message }))
			);
			return;
		}
		const { facts } = entry;
		const { line: c, masses: m } = packProductCartons(facts, line.quantity, nextCarton);
		measured.push(Object.assign({ lineIndex, sku: line.sku }, c));
		nextCarton = c.lastCarton + 1;
		masses.push(m);
		units += line.quantity;
		// Totals per product in whole numbers; the decimals are multiplied once per product below.
		const sums = sumsBySku.get(line.sku);
		if (sums) {
			sums.quantity += line.quantity;
			sums.cartons += c.cartons;
		} else {
			sumsBySku.set(line.sku, { facts, quantity: line.quantity, cartons: c.cartons });
		}
		// Properties spelt out: an object spread here cost V8 microseconds per piece (measured).
		const { lengthMm, widthMm, heightMm } = packaging;
		if (c.fullCartons > 0) {
			const last = c.firstCarton + c.fullCartons - 1;
			cartonPieces.push(
				new LinePiece(
					lengthMm,
					widthMm,
					heightMm,
					c.fullCartons,
					m.fullGrossMg,
					lineIndex,
					'carton',
					c.firstCarton,
					last
				)
			);
		}
		if (m.remainderGrossMg !== null) {
			cartonPieces.push(
				new LinePiece(
					lengthMm,
					widthMm,
					heightMm,
					1,
					m.remainderGrossMg,
					lineIndex,
					'carton',
					c.lastCarton,
					c.lastCarton,
					' (part-filled)'
				)
			);
		}
	});
	if (problems.length > 0) return { ok: false, problems };
	let netMg: Whole = 0;
	let grossMg: Whole = 0;
	let mm3: Whole = 0;
	for (const { facts, quantity, cartons } of sumsBySku.values()) {
		const productNet = wholeTimes(facts.netPerUnitMg, quantity);
		netMg = wholePlus(netMg, productNet);
		grossMg = wholePlus(wholePlus(grossMg, wholeTimes(facts.tareMg, cartons)), productNet);
		mm3 = wholePlus(mm3, wholeTimes(facts.cartonMm3, cartons));
	}
	const gross = wholeToDecimal(grossMg, 6);
	const volume = wholeToDecimal(mm3, 9);

	let pallets: MeasuredPallets | null = null;
	let pieces = cartonPieces;
	let pieceTotals = { grossKg: gross, volumeM3: volume };
	if (pallet !== undefined) {
		const palletPieces: ChargeablePiece[] = [];
		const planned: MeasuredPallets['lines'] = [];
		let nextPallet = 1;
		let palletGrossMg: Whole = 0;
		let palletMm3: Whole = 0;
		const stowageBySku = new Map<
			string,
			{ carton: PalletCarton; stowage: ReturnType<typeof palletStowage> }
		>();
		const palletTareMg = mgOfKg(pallet.tareKg);
		measured.forEach((line, i) => {
			const m = masses[i];
			if (m === undefined) return;
			// The carton and its stowage depend on the product only: worked out once per product.
			let known = stowageBySku.get(line.sku);
			if (known === undefined) {
				const packaging = bySku.get(line.sku)?.packaging;
				if (packaging === undefined || packaging === null) return;
				const carton: PalletCarton = {
					lengthMm: packaging.lengthMm,
					widthMm: packaging.widthMm,
					heightMm: packaging.heightMm,
					grossKg: packaging.cartonGrossKg,
					orientation: packaging.orientation,
					maxLoadOnTopKg: packaging.maxLoadOnTopKg
				};
				known = { carton, stowage: palletStowage(pallet, carton) };
				stowageBySku.set(line.sku, known);
			}
			const { carton, stowage } = known;
			if (!stowage.ok) {
				problems.push({
					path: 'pallet',
					message: `Line ${line.lineIndex + 1} (SKU “${line.sku}”): ${stowage.message}`
				});
				return;
			}
			const result = planPalletsOfMasses(
				{
					pallet,
					carton,
					cartons: line.cartons,
					firstCarton: line.firstCarton,
					firstPallet: nextPallet
				},
				stowage.stowage,
				{
					cartonGrossMg: m.fullGrossMg,
					lastCartonGrossMg: m.remainderGrossMg ?? m.fullGrossMg,
					palletTareMg
				}
			);
			planned.push({ lineIndex: line.lineIndex, sku: line.sku, plan: result.plan });
			nextPallet = result.plan.lastPallet + 1;
			palletGrossMg = wholePlus(palletGrossMg, result.exact.grossMg);
			palletMm3 = wholePlus(palletMm3, result.exact.volumeMm3);
			result.plan.groups.forEach((g, k) => {
				palletPieces.push(
					new LinePiece(
						pallet.lengthMm,
						pallet.widthMm,
						g.loadedHeightMm,
						g.pallets,
						result.exact.groupGrossMg[k] ?? 0,
						line.lineIndex,
						'pallet',
						g.fromPallet,
						g.toPallet
					)
				);
			});
		});
		if (problems.length > 0) return { ok: false, problems };
		const count = nextPallet - 1;
		const palletGross = wholeToDecimal(palletGrossMg, 6);
		const palletVolume = wholeToDecimal(palletMm3, 9);
		pallets = {
			pallet,
			lines: planned,
			pallets: count,
			tareKg: kgOut(exact(pallet.tareKg).times(count)),
			grossKg: kgOut(palletGross),
			volumeM3: m3Out(palletVolume)
		};
		pieces = palletPieces;
		pieceTotals = { grossKg: palletGross, volumeM3: palletVolume };
	}

	return {
		ok: true,
		lines: measured,
		totals: {
			units,
			cartons: nextCarton - 1,
			netKg: wholeFixed(netMg, 6, 3),
			grossKg: wholeFixed(grossMg, 6, 3),
			volumeM3: wholeFixed(mm3, 9, 6)
		},
		pallets,
		chargeable: chargeableWeightsOfTotals(pieces, pieceTotals),
		problems: []
	};
}
