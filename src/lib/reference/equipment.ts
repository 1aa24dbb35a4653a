/**
 * Pallet and container reference data (data/pallet-types.json,
 * data/container-types.json), validated with zod when this module loads.
 *
 * Units: dimensions are integer millimetres; masses are decimal strings in
 * kilograms, to be parsed with decimal.js, never as JS floats.
 * Where each figure comes from: data/README.md and each record's `sources`.
 *
 * Pure module: no framework imports.
 */
import Decimal from 'decimal.js';
import { z } from 'zod';
import palletData from '../../../data/pallet-types.json' with { type: 'json' };
import containerData from '../../../data/container-types.json' with { type: 'json' };

/** Landfall's own stable pallet codes (not an external standard's codes). */
export const PALLET_CODES = ['P1208', 'P1210', 'P4840', 'P1165', 'P1111', 'P4242'] as const;
export type PalletCode = (typeof PALLET_CODES)[number];

/** Landfall's own stable container codes (not ISO 6346 codes; those are in `iso6346SizeType`). */
export const CONTAINER_CODES = ['C20GP', 'C40GP', 'C40HC'] as const;
export type ContainerCode = (typeof CONTAINER_CODES)[number];

/** A non-negative decimal number written as a string: "25", "1500", "0.5". No sign, exponent or spaces. */
export const decimalStringSchema = z
	.string()
	.regex(
		/^(0|[1-9][0-9]*)(\.[0-9]+)?$/,
		'expected a non-negative decimal string such as "25" or "0.5"'
	);

/** A length in whole millimetres. */
export const millimetresSchema = z.number().int().positive();

const sourceNoteSchema = z.string().min(1);

const dimensionsSchema = z
	.strictObject({
		lengthMm: millimetresSchema,
		widthMm: millimetresSchema,
		heightMm: millimetresSchema
	})
	.readonly();

export type Dimensions = z.infer<typeof dimensionsSchema>;

function decimal(value: string): Decimal {
	return new Decimal(value);
}

export const palletTypeSchema = z
	.strictObject({
		code: z.enum(PALLET_CODES),
		name: z.string().min(1),
		/** Footprint, longer side (mm). */
		lengthMm: millimetresSchema,
		/** Footprint, shorter side (mm). */
		widthMm: millimetresSchema,
		/** Height of the empty pallet (mm). */
		heightMm: millimetresSchema,
		tareKg: decimalStringSchema,
		/** Load the pallet may carry, excluding its own mass. */
		safeWorkingLoadKg: decimalStringSchema,
		/** tareKg + safeWorkingLoadKg. */
		maxGrossKg: decimalStringSchema,
		/** Height of pallet plus load (mm), planning default. */
		maxLoadedHeightMm: millimetresSchema,
		note: z.string(),
		sources: z
			.strictObject({
				footprint: sourceNoteSchema,
				height: sourceNoteSchema,
				tare: sourceNoteSchema,
				load: sourceNoteSchema,
				maxLoadedHeight: sourceNoteSchema
			})
			.readonly()
	})
	.superRefine((pallet, ctx) => {
		if (pallet.lengthMm < pallet.widthMm) {
			ctx.addIssue({
				code: 'custom',
				path: ['widthMm'],
				message: 'lengthMm must be the longer side'
			});
		}
		if (pallet.maxLoadedHeightMm <= pallet.heightMm) {
			ctx.addIssue({
				code: 'custom',
				path: ['maxLoadedHeightMm'],
				message: 'maxLoadedHeightMm must exceed the empty pallet height'
			});
		}
		const expected = decimal(pallet.tareKg).plus(decimal(pallet.safeWorkingLoadKg));
		if (!decimal(pallet.maxGrossKg).equals(expected)) {
			ctx.addIssue({
				code: 'custom',
				path: ['maxGrossKg'],
				message: `maxGrossKg must equal tareKg + safeWorkingLoadKg (${expected.toString()})`
			});
		}
	})
	.readonly();

export type PalletType = z.infer<typeof palletTypeSchema>;

export const containerTypeSchema = z
	.strictObject({
		code: z.enum(CONTAINER_CODES),
		name: z.string().min(1),
		/** ISO 668 type designation, e.g. "1CC", "1AA", "1AAA". */
		iso668Designation: z.string().regex(/^1[A-F]{1,3}X?$/),
		/** ISO 6346 size-type code, e.g. "22G1". */
		iso6346SizeType: z.string().regex(/^[0-9A-Z]{2}[A-Z][0-9A-Z]$/),
		external: dimensionsSchema,
		internal: dimensionsSchema,
		doorOpening: z
			.strictObject({ widthMm: millimetresSchema, heightMm: millimetresSchema })
			.readonly(),
		tareKg: decimalStringSchema,
		/** Rating: maximum mass of container plus cargo. */
		maxGrossKg: decimalStringSchema,
		/** maxGrossKg − tareKg. */
		maxPayloadKg: decimalStringSchema,
		sources: z
			.strictObject({
				designation: sourceNoteSchema,
				sizeType: sourceNoteSchema,
				external: sourceNoteSchema,
				internal: sourceNoteSchema,
				doorOpening: sourceNoteSchema,
				tare: sourceNoteSchema,
				maxGross: sourceNoteSchema,
				maxPayload: sourceNoteSchema
			})
			.readonly()
	})
	.superRefine((container, ctx) => {
		for (const side of ['lengthMm', 'widthMm', 'heightMm'] as const) {
			if (container.internal[side] >= container.external[side]) {
				ctx.addIssue({
					code: 'custom',
					path: ['internal', side],
					message: `internal ${side} must be less than external ${side}`
				});
			}
		}
		if (container.doorOpening.widthMm > container.internal.widthMm) {
			ctx.addIssue({
				code: 'custom',
				path: ['doorOpening', 'widthMm'],
				message: 'door opening width must not exceed internal width'
			});
		}
		if (container.doorOpening.heightMm > container.internal.heightMm) {
			ctx.addIssue({
				code: 'custom',
				path: ['doorOpening', 'heightMm'],
				message: 'door opening height must not exceed internal height'
			});
		}
		const tare = decimal(container.tareKg);
		const gross = decimal(container.maxGrossKg);
		if (!tare.lessThan(gross)) {
			ctx.addIssue({
				code: 'custom',
				path: ['tareKg'],
				message: 'tareKg must be less than maxGrossKg'
			});
		}
		const expected = gross.minus(tare);
		if (!decimal(container.maxPayloadKg).equals(expected)) {
			ctx.addIssue({
				code: 'custom',
				path: ['maxPayloadKg'],
				message: `maxPayloadKg must equal maxGrossKg − tareKg (${expected.toString()})`
			});
		}
	})
	.readonly();

export type ContainerType = z.infer<typeof containerTypeSchema>;

/** Parse a list of records and require each of `codes` exactly once. */
function parseList<T extends { readonly code: string }>(
	label: string,
	schema: z.ZodType<T>,
	codes: readonly string[],
	data: unknown
): readonly T[] {
	const list = z.array(schema).parse(data);
	const seen = new Set<string>();
	for (const item of list) {
		if (seen.has(item.code)) throw new Error(`${label}: duplicate code ${item.code}`);
		seen.add(item.code);
	}
	const missing = codes.filter((code) => !seen.has(code));
	if (missing.length > 0) throw new Error(`${label}: missing codes ${missing.join(', ')}`);
	return Object.freeze(list);
}

/** All pallet types, in data-file order. */
export const palletTypes: readonly PalletType[] = parseList(
	'data/pallet-types.json',
	palletTypeSchema,
	PALLET_CODES,
	palletData
);

/** All container types, in data-file order. */
export const containerTypes: readonly ContainerType[] = parseList(
	'data/container-types.json',
	containerTypeSchema,
	CONTAINER_CODES,
	containerData
);

const palletsByCode: ReadonlyMap<string, PalletType> = new Map(palletTypes.map((p) => [p.code, p]));
const containersByCode: ReadonlyMap<string, ContainerType> = new Map(
	containerTypes.map((c) => [c.code, c])
);

/** The pallet type with this code, or undefined. */
export function palletType(code: string): PalletType | undefined {
	return palletsByCode.get(code);
}

/** The container type with this code, or undefined. */
export function containerType(code: string): ContainerType | undefined {
	return containersByCode.get(code);
}

/** True when `code` is a known pallet type code. */
export function isPalletCode(code: unknown): code is PalletCode {
	return typeof code === 'string' && palletsByCode.has(code);
}

/** True when `code` is a known container type code. */
export function isContainerCode(code: unknown): code is ContainerCode {
	return typeof code === 'string' && containersByCode.has(code);
}

const Exact = Decimal.clone({ precision: 40 });
const MM3_PER_M3 = new Exact('1e9');

/** Exact volume in cubic metres of a box given in integer millimetres. */
export function volumeM3(dimensions: Dimensions): Decimal {
	return new Exact(dimensions.lengthMm)
		.times(dimensions.widthMm)
		.times(dimensions.heightMm)
		.dividedBy(MM3_PER_M3);
}
