import Decimal from 'decimal.js';
import { z } from 'zod';
import { decimalString } from './fields';

// Pallet and container types as the equipment forms send them. Millimetres stay strings in the
// form (what was typed is kept on an error) and must be whole, positive numbers.

const wholeMm = (label: string, max: number) =>
	z
		.string()
		.trim()
		.regex(/^\d{1,6}$/, `${label}: whole millimetres, e.g. 1200.`)
		.refine((v) => Number(v) >= 1, `${label} must be more than 0 mm.`)
		.refine((v) => Number(v) <= max, `${label} can be at most ${max.toLocaleString('en')} mm.`);

const kg = (label: string) => decimalString(label, 3);
const code = z
	.string()
	.trim()
	.toUpperCase()
	.regex(/^[A-Z0-9]{2,12}$/, 'Code: 2 to 12 letters and digits, e.g. P1208X.');
const name = z
	.string()
	.trim()
	.min(1, 'Name the type.')
	.max(120, 'Keep the name under 120 characters.');
const version = z.number().int().min(0).default(0);

/** Adds an issue at `path` unless `low` < `high` (decimal strings, compared exactly). */
function requireBelow(
	ctx: z.RefinementCtx,
	low: string,
	high: string,
	path: string,
	message: string
) {
	try {
		if (!new Decimal(low).lessThan(high)) ctx.addIssue({ code: 'custom', path: [path], message });
	} catch {
		// One side is not a number: its own field error says so.
	}
}

export const palletTypeInputSchema = z
	.object({
		code,
		name,
		lengthMm: wholeMm('Length', 3000),
		widthMm: wholeMm('Width', 3000),
		deckHeightMm: wholeMm('Pallet height', 500),
		tareKg: kg('Tare'),
		maxGrossKg: kg('Maximum gross weight'),
		maxLoadedHeightMm: wholeMm('Maximum loaded height', 3500),
		version
	})
	.superRefine((p, ctx) => {
		if (Number(p.lengthMm) < Number(p.widthMm))
			ctx.addIssue({
				code: 'custom',
				path: ['widthMm'],
				message: 'Give the longer side as the length: the width cannot exceed it.'
			});
		if (Number(p.maxLoadedHeightMm) <= Number(p.deckHeightMm))
			ctx.addIssue({
				code: 'custom',
				path: ['maxLoadedHeightMm'],
				message: `The loaded height must be more than the empty pallet (${p.deckHeightMm} mm).`
			});
		requireBelow(
			ctx,
			p.tareKg,
			p.maxGrossKg,
			'maxGrossKg',
			'The maximum gross weight includes the pallet itself, so it must be more than the tare.'
		);
	});
export type PalletTypeInput = z.infer<typeof palletTypeInputSchema>;

export const containerTypeInputSchema = z
	.object({
		code,
		name,
		iso668Designation: z
			.string()
			.trim()
			.toUpperCase()
			.regex(/^(1[A-F]{1,3}X?)?$/, 'ISO 668 designation such as 1CC, 1AA or 1AAA, or empty.')
			.default(''),
		iso6346SizeType: z
			.string()
			.trim()
			.toUpperCase()
			.regex(/^[0-9A-Z]{2}[A-Z][0-9A-Z]$/, 'ISO 6346 size-type code: 4 characters, e.g. 22G1.'),
		internalLengthMm: wholeMm('Internal length', 16_000),
		internalWidthMm: wholeMm('Internal width', 2_600),
		internalHeightMm: wholeMm('Internal height', 3_000),
		doorWidthMm: wholeMm('Door width', 2_600),
		doorHeightMm: wholeMm('Door height', 3_000),
		tareKg: kg('Tare'),
		maxGrossKg: kg('Maximum gross weight'),
		version
	})
	.superRefine((c, ctx) => {
		const within = (door: 'doorWidthMm' | 'doorHeightMm', inner: string, what: string) => {
			if (Number(c[door]) > Number(inner))
				ctx.addIssue({
					code: 'custom',
					path: [door],
					message: `The door opening cannot be ${what} than the inside (${inner} mm).`
				});
		};
		within('doorWidthMm', c.internalWidthMm, 'wider');
		within('doorHeightMm', c.internalHeightMm, 'higher');
		requireBelow(
			ctx,
			c.tareKg,
			c.maxGrossKg,
			'maxGrossKg',
			'The maximum gross weight includes the container itself, so it must be more than the tare.'
		);
	});
export type ContainerTypeInput = z.infer<typeof containerTypeInputSchema>;

/** Maximum payload = maximum gross − tare, exactly; null while either is not a number. */
export function payloadKg(tareKg: string, maxGrossKg: string): string | null {
	try {
		const payload = new Decimal(maxGrossKg).minus(tareKg);
		return payload.isFinite() ? payload.toFixed() : null;
	} catch {
		return null;
	}
}
