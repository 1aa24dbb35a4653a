/**
 * zod schemas for the packing computation: the input `measure()` takes (also the API body,
 * and the source of the OpenAPI document, hence the descriptions), and the result it returns.
 *
 * Cross-field checks (unknown SKU, product without packaging, carton gross below the units' net
 * mass, duplicate SKU) are in the input schema too, so an API body that passes it can be
 * measured. They run alongside the field checks when every field has the right JSON type (a
 * value out of range or in the wrong format does not stop them); a wrong type, or a fraction where
 * a whole number belongs, is reported alone first.
 *
 * Pure module: no framework imports.
 */
import { z } from 'zod';
import { CHARGE_BASES, CHARGE_MODES } from './chargeable';
import { ORIENTATIONS, tareProblem, type Packaging } from './cartons';
import { exact } from './exact';
import {
	DECIMAL_PATTERN,
	MAX_COUNT,
	MAX_MM,
	MESSAGES,
	isDecimalString,
	isPositiveDecimalString,
	isPositiveInt
} from './problem';

/** Most products or lines in one measurement. */
export const MAX_ENTRIES = 1000;

function millimetres(description: string) {
	return z
		.number({ error: MESSAGES.positiveMm })
		.int({ error: MESSAGES.positiveMm })
		.min(1, { error: MESSAGES.positiveMm })
		.max(MAX_MM, { error: MESSAGES.positiveMm })
		.describe(`${description} Whole millimetres, 1 to ${MAX_MM}.`);
}

function count(description: string) {
	return z
		.number({ error: MESSAGES.positiveInt })
		.int({ error: MESSAGES.positiveInt })
		.min(1, { error: MESSAGES.positiveInt })
		.max(MAX_COUNT, { error: MESSAGES.positiveInt })
		.describe(description);
}

const KG_FORMAT =
	'Kilograms as a decimal string, e.g. "12.5": no sign or exponent, up to 6 decimals.';

function kilograms(description: string) {
	return z
		.string({ error: MESSAGES.decimal })
		.regex(DECIMAL_PATTERN, { error: MESSAGES.decimal })
		.describe(`${description} ${KG_FORMAT}`);
}

function positiveKilograms(description: string) {
	return z
		.string({ error: MESSAGES.positiveDecimal })
		.regex(DECIMAL_PATTERN, { error: MESSAGES.positiveDecimal })
		.refine((value) => /[1-9]/.test(value), { error: MESSAGES.positiveDecimal })
		.describe(`${description} ${KG_FORMAT} Above 0.`);
}

const sku = z
	.string({ error: 'Enter the SKU.' })
	.min(1, { error: 'Enter the SKU.' })
	.max(100, { error: 'Keep the SKU to 100 characters.' })
	.describe('Stock-keeping unit: the product’s code, matched exactly (case and spaces count).');

export const packagingSchema = z
	.object({
		unitsPerCarton: count('Units in one full carton.'),
		lengthMm: millimetres('Carton outside length.'),
		widthMm: millimetres('Carton outside width.'),
		heightMm: millimetres('Carton outside height (vertical when the carton stands this way up).'),
		cartonGrossKg: positiveKilograms(
			'Gross mass of one FULL carton: the units plus carton and dunnage.'
		),
		orientation: z
			.enum(ORIENTATIONS, { error: 'Choose "any" or "this_way_up".' })
			.describe(
				'"this_way_up": the carton’s height stays vertical on a pallet. "any": it may stand on any face.'
			),
		maxLoadOnTopKg: kilograms('Mass a carton may carry stacked on top of it.')
			.nullable()
			.describe(
				`Mass a carton may carry stacked on top of it; null when nothing may be stacked on it. ${KG_FORMAT}`
			)
	})
	.describe('How a product is packed for export: its standard carton.');

export const productSchema = z
	.object({
		sku,
		netKgPerUnit: positiveKilograms('Net mass of one unit (without carton).'),
		packaging: packagingSchema
			.nullish()
			.describe('The product’s standard carton; missing or null when not yet recorded.')
	})
	.describe('A product the shipment lines refer to by SKU.');

export const shipmentLineSchema = z
	.object({
		sku,
		quantity: count('Units shipped on this line: a whole number, 1 or more.')
	})
	.describe('One shipment line: a product and how many units.');

export const palletSpecSchema = z
	.object({
		lengthMm: millimetres('Pallet footprint, length.'),
		widthMm: millimetres('Pallet footprint, width.'),
		deckHeightMm: millimetres('Height of the empty pallet.'),
		tareKg: kilograms('Mass of the empty pallet.'),
		maxGrossKg: positiveKilograms('Largest mass of pallet plus load.'),
		maxLoadedHeightMm: millimetres('Largest height of pallet plus load.')
	})
	.superRefine((pallet, ctx) => {
		if (pallet.maxLoadedHeightMm <= pallet.deckHeightMm) {
			ctx.addIssue({
				code: 'custom',
				path: ['maxLoadedHeightMm'],
				message: 'The maximum loaded height must be above the pallet’s own height.'
			});
		}
		if (
			isDecimalString(pallet.tareKg) &&
			isDecimalString(pallet.maxGrossKg) &&
			!exact(pallet.maxGrossKg).greaterThan(pallet.tareKg)
		) {
			ctx.addIssue({
				code: 'custom',
				path: ['maxGrossKg'],
				message: 'The maximum gross must be above the pallet’s tare.'
			});
		}
	})
	.describe(
		'The pallet type to load the cartons on, as plain figures (no overhang; lines are not mixed on a pallet).'
	);

function isRecord(value: unknown): value is Record<string, unknown> {
	return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function isWellFormedPackaging(value: unknown): value is Packaging {
	return (
		isRecord(value) &&
		isPositiveInt(value.unitsPerCarton) &&
		isPositiveDecimalString(value.cartonGrossKg)
	);
}

/** Checks across products and lines; written for input that may be malformed anywhere. */
function crossCheck(value: unknown, ctx: z.RefinementCtx): void {
	if (!isRecord(value)) return;
	const products = Array.isArray(value.products) ? (value.products as unknown[]) : [];
	const lines = Array.isArray(value.lines) ? (value.lines as unknown[]) : [];

	const bySku = new Map<string, number>();
	products.forEach((product, index) => {
		if (!isRecord(product)) return;
		if (typeof product.sku === 'string') {
			const first = bySku.get(product.sku);
			if (first === undefined) {
				bySku.set(product.sku, index);
			} else {
				ctx.addIssue({
					code: 'custom',
					path: ['products', index, 'sku'],
					message: `SKU “${product.sku}” is listed twice (also products.${first}).`
				});
			}
		}
		const packaging = product.packaging;
		if (isPositiveDecimalString(product.netKgPerUnit) && isWellFormedPackaging(packaging)) {
			const problem = tareProblem(product.netKgPerUnit, packaging);
			if (problem !== null) {
				ctx.addIssue({
					code: 'custom',
					path: ['products', index, 'packaging', 'cartonGrossKg'],
					message: problem.message
				});
			}
		}
	});

	const needingPackaging = new Map<number, number[]>();
	lines.forEach((line, index) => {
		if (!isRecord(line) || typeof line.sku !== 'string') return;
		const productIndex = bySku.get(line.sku);
		if (productIndex === undefined) {
			ctx.addIssue({
				code: 'custom',
				path: ['lines', index, 'sku'],
				message: `No product with SKU “${line.sku}” in products.`
			});
			return;
		}
		const product = products[productIndex];
		if (isRecord(product) && (product.packaging === null || product.packaging === undefined)) {
			needingPackaging.set(productIndex, [...(needingPackaging.get(productIndex) ?? []), index]);
		}
	});
	for (const [productIndex, lineIndexes] of needingPackaging) {
		const product = products[productIndex];
		const name = isRecord(product) ? String(product.sku) : '';
		const which = lineIndexes.map((i) => i + 1).join(', ');
		ctx.addIssue({
			code: 'custom',
			path: ['products', productIndex, 'packaging'],
			message:
				`Product “${name}” has no packaging (units per carton, carton size and gross), ` +
				`needed by line${lineIndexes.length === 1 ? '' : 's'} ${which}.`
		});
	}
}

export const measureInputSchema = z
	.object({
		products: z
			.array(productSchema)
			.max(MAX_ENTRIES, { error: `At most ${MAX_ENTRIES} products.` })
			.describe('Products the lines refer to, each SKU once.'),
		lines: z
			.array(shipmentLineSchema)
			.min(1, { error: 'Add at least one line.' })
			.max(MAX_ENTRIES, { error: `At most ${MAX_ENTRIES} lines.` })
			.describe('Shipment lines in packing-list order; carton numbers run on across them.'),
		pallet: palletSpecSchema
			.optional()
			.describe('Pallet to load on; omit to measure loose cartons.')
	})
	.superRefine(crossCheck)
	.check((payload) => {
		if (payload.issues.length === 0) markValidated(payload.value);
	})
	.describe('A shipment to measure: its products, lines and, optionally, the pallet type.');

export type MeasureInput = z.infer<typeof measureInputSchema>;

// What measureInputSchema has just accepted, frozen so it cannot change afterwards: measure()
// need not validate it again (the API route parses the body, then measures it; a second parse
// of 500 lines cost about a millisecond). Anything else measure() still validates itself.
const validated = new WeakSet<object>();

function deepFreeze(value: unknown): void {
	if (typeof value !== 'object' || value === null || Object.isFrozen(value)) return;
	Object.freeze(value);
	for (const child of Object.values(value)) deepFreeze(child);
}

function markValidated(value: object): void {
	deepFreeze(value);
	validated.add(value);
}

/** True for a value measureInputSchema produced (frozen, so still exactly what it checked). */
export function isValidatedMeasureInput(value: unknown): value is MeasureInput {
	return typeof value === 'object' && value !== null && validated.has(value);
}
export type ProductInput = z.infer<typeof productSchema>;
export type ShipmentLineInput = z.infer<typeof shipmentLineSchema>;
export type PackagingInput = z.infer<typeof packagingSchema>;
export type PalletSpecInput = z.infer<typeof palletSpecSchema>;

// ——— Result (for the API's response and the OpenAPI document) ———

const kgOut = z.string().describe('Kilograms, 3 decimals (gram precision).');
const m3Out = z.string().describe('Cubic metres, 6 decimals, exact from millimetres, half up.');
const int = z.number().int();

export const problemSchema = z
	.object({
		path: z.string().describe('Dotted path of the field, e.g. "lines.2.quantity".'),
		message: z.string()
	})
	.describe('Something wrong with the input, and where.');

const cartonGroupSchema = z
	.object({
		fromCarton: int,
		toCarton: int,
		cartons: int,
		unitsPerCarton: int,
		netKgPerCarton: kgOut,
		grossKgPerCarton: kgOut
	})
	.describe('Consecutive cartons that are alike: the full ones, or the one remainder carton.');

export const measuredLineSchema = z
	.object({
		lineIndex: int.describe('Index of the line in the input (0-based).'),
		sku: z.string(),
		quantity: int,
		unitsPerCarton: int,
		fullCartons: int,
		remainderUnits: int.describe('Units in the part-filled last carton; 0 when none.'),
		cartons: int,
		firstCarton: int.describe('Carton numbers run on across lines, from 1.'),
		lastCarton: int,
		groups: z.array(cartonGroupSchema),
		carton: z.object({
			lengthMm: int,
			widthMm: int,
			heightMm: int,
			volumeM3: m3Out,
			tareKg: kgOut.describe('Full-carton gross − units per carton × net per unit, kg.'),
			fullGrossKg: kgOut
		}),
		netKg: kgOut,
		grossKg: kgOut,
		volumeM3: m3Out
	})
	.describe('One line’s cartons.');

export const cartonTotalsSchema = z
	.object({ units: int, cartons: int, netKg: kgOut, grossKg: kgOut, volumeM3: m3Out })
	.describe('Totals over all lines’ cartons (without pallets).');

const layerBlockSchema = z.object({
	xMm: int,
	yMm: int,
	turned: z.boolean(),
	cartonAlongLengthMm: int,
	cartonAlongWidthMm: int,
	columns: int,
	rows: int,
	count: int
});

export const layerPatternSchema = z
	.object({
		palletLengthMm: int,
		palletWidthMm: int,
		footprintMm: z.tuple([int, int]),
		count: int.describe('Cartons per layer.'),
		blocks: z.array(layerBlockSchema),
		areaBound: int.describe('floor(pallet area ÷ carton footprint): no layer can hold more.'),
		blockCounts: z.object({ lengthwise: int, turned: int }),
		method: z.enum(['guillotine', 'two_block'])
	})
	.describe('Cartons in one layer, block by block.');

const verticalSide = z.enum(['height', 'length', 'width']);

export const palletStowageSchema = z.object({
	verticalSide: verticalSide.describe('Which carton dimension stands vertical.'),
	layerHeightMm: int,
	pattern: layerPatternSchema,
	perLayer: int,
	layersByHeight: int,
	layersByStacking: int,
	cartonsByWeight: int,
	cartonsPerPallet: int,
	layersPerPallet: int,
	loadedHeightMm: int,
	limitedBy: z.enum(['height', 'weight', 'stacking']),
	tried: z.array(z.object({ verticalSide, perLayer: int, cartonsPerPallet: int }))
});

const palletGroupSchema = z.object({
	fromPallet: int,
	toPallet: int,
	pallets: int,
	cartonsPerPallet: int,
	layers: int,
	loadedHeightMm: int,
	grossKgPerPallet: kgOut,
	firstCarton: int,
	lastCarton: int
});

export const palletPlanSchema = z.object({
	stowage: palletStowageSchema,
	cartons: int,
	pallets: int,
	fullPallets: int,
	partPallets: int,
	firstPallet: int,
	lastPallet: int,
	groups: z.array(palletGroupSchema),
	grossKg: kgOut.describe('Cartons plus pallet tares, kg.'),
	volumeM3: m3Out.describe('Pallet footprint × loaded height, summed.')
});

export const measuredPalletsSchema = z
	.object({
		pallet: palletSpecSchema,
		lines: z.array(z.object({ lineIndex: int, sku: z.string(), plan: palletPlanSchema })),
		pallets: int.describe('Pallets for the whole shipment.'),
		tareKg: kgOut.describe('Pallet tares, summed.'),
		grossKg: kgOut.describe('Cartons plus pallet tares.'),
		volumeM3: m3Out
	})
	.describe('The shipment palletised, line by line.');

export const chargeableWeightSchema = z
	.object({
		mode: z.enum(CHARGE_MODES),
		basis: z.enum(CHARGE_BASES),
		grossKg: kgOut,
		volumeM3: m3Out,
		volumeWeightKg: kgOut.nullable(),
		chargeableKg: kgOut.nullable().describe('Air, courier, road; null for sea LCL and FCL.'),
		revenueTonnes: z
			.string()
			.nullable()
			.describe('Sea LCL only: revenue tonnes, 6 decimals, rounded up.'),
		steps: z.array(z.string()).describe('The computation in words.'),
		source: z.string().describe('Where the rule comes from.')
	})
	.describe('Chargeable weight for one mode.');

export const measureResultSchema = z
	.discriminatedUnion('ok', [
		z.object({
			ok: z.literal(true),
			lines: z.array(measuredLineSchema),
			totals: cartonTotalsSchema,
			pallets: measuredPalletsSchema.nullable(),
			chargeable: z
				.array(chargeableWeightSchema)
				.describe('Per mode, from the cartons, or the pallets when palletised.'),
			problems: z.array(problemSchema).describe('Empty.')
		}),
		z.object({ ok: z.literal(false), problems: z.array(problemSchema).min(1) })
	])
	.describe('The measured shipment, or the problems that stopped it.');
