import { z } from 'zod';
import { PLACE_KINDS, validateLocationCode } from '../trade/unlocode';
import { countryCode } from './fields';

const text = (label: string, max: number) =>
	z
		.string()
		.trim()
		.min(1, `Enter the ${label}.`)
		.max(max, `Keep the ${label} under ${max} characters.`);
const optional = (max: number) => z.string().trim().max(max).default('');
/** The row version the editor saw (optimistic locking); ignored when adding. */
const version = z.number().int().min(0).default(0);

/** A port, airport or inland point, with its UN/LOCODE-style code. */
export const placeSchema = z
	.object({
		code: z.string().trim(),
		name: text('name', 120),
		kind: z.enum(PLACE_KINDS, { error: 'Choose the kind of place.' }),
		countryCode,
		version
	})
	.superRefine((place, ctx) => {
		const result = validateLocationCode(place.code);
		if (!result.ok) {
			ctx.addIssue({ code: 'custom', path: ['code'], message: result.message });
		} else if (result.countryCode !== place.countryCode) {
			ctx.addIssue({
				code: 'custom',
				path: ['code'],
				message: `The code starts with ${result.countryCode}, but the country chosen is ${place.countryCode}.`
			});
		}
	});
export type PlaceInput = z.infer<typeof placeSchema>;

const TAX_ID_LINE = /^([A-Za-z0-9_ ]{2,20}):\s*(\S.{0,63})$/;

/** "EORI: DE123…", one per line → [{ type, value }] (free text with a type, as papers print it). */
export function parseTaxIdLines(text: string): { type: string; value: string }[] {
	return text
		.split('\n')
		.map((line) => line.trim())
		.filter(Boolean)
		.map((line) => {
			const match = TAX_ID_LINE.exec(line)!;
			return { type: match[1]!.trim().toUpperCase().replace(/ /g, '_'), value: match[2]!.trim() };
		});
}

/** A consignee, notify party or other party named on shipments and papers. */
export const partySchema = z.object({
	name: text('name', 200),
	line1: text('street address', 200),
	line2: optional(200),
	city: text('city', 100),
	postalCode: optional(20),
	region: optional(60),
	countryCode,
	contactName: optional(120),
	email: z
		.union([z.literal(''), z.email({ error: 'Enter an e-mail address, or leave it empty.' })])
		.default(''),
	phone: optional(40),
	taxIds: z
		.string()
		.max(2000)
		.default('')
		.refine(
			(value) => value.split('\n').every((l) => !l.trim() || TAX_ID_LINE.test(l.trim())),
			'Write one identifier per line as “TYPE: value”, e.g. “EORI: DE123456789012345”.'
		),
	version
});
export type PartyInput = z.infer<typeof partySchema>;

/** Retire, reinstate or remove a place or party: only the version the editor saw. */
export const versionSchema = z.object({ version });
