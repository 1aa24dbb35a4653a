/**
 * Types of tax / customs identifier a party may carry
 * (data/tax-identifier-types.json), validated with zod when this module loads.
 *
 * Deliberately no format validation of the identifiers themselves: Landfall
 * only claims what a cited source states (see data/README.md).
 *
 * Pure module: no framework imports.
 */
import { z } from 'zod';
import taxIdentifierData from '../../../data/tax-identifier-types.json' with { type: 'json' };
import { isCountryCode } from './countries';

export const TAX_IDENTIFIER_CODES = [
	'EORI',
	'VAT',
	'UK_VAT',
	'EIN',
	'ABN',
	'GST_HST',
	'SST',
	'MST',
	'TIN',
	'OTHER'
] as const;
export type TaxIdentifierCode = (typeof TAX_IDENTIFIER_CODES)[number];

/** Regions an identifier type may belong to instead of a single country. */
export const TAX_IDENTIFIER_REGIONS = ['EU'] as const;
export type TaxIdentifierRegion = (typeof TAX_IDENTIFIER_REGIONS)[number];

/**
 * How a source was used:
 * - "checked": the cited provision's text was read when the entry was written;
 * - "from memory": cited from memory, not re-read;
 * - "common practice": no legal source; a convention of the trade or of Landfall.
 */
const citedSourceSchema = z
	.strictObject({
		basis: z.enum(['checked', 'from memory']),
		issuer: z.string().min(1),
		document: z.string().min(1),
		section: z.string().min(1).optional(),
		year: z.number().int().min(1900).max(2100).optional()
	})
	.readonly();

const commonPracticeSourceSchema = z
	.strictObject({ basis: z.literal('common practice') })
	.readonly();

export const taxIdentifierSourceSchema = z.discriminatedUnion('basis', [
	citedSourceSchema,
	commonPracticeSourceSchema
]);

export type TaxIdentifierSource = z.infer<typeof taxIdentifierSourceSchema>;

export const taxIdentifierTypeSchema = z
	.strictObject({
		code: z.enum(TAX_IDENTIFIER_CODES),
		label: z.string().min(1),
		/** ISO 3166-1 alpha-2 code of the issuing country, when the type belongs to one country. */
		country: z
			.string()
			.refine((code) => isCountryCode(code), 'expected an ISO 3166-1 alpha-2 code')
			.optional(),
		/** Region (e.g. the EU) when the type is issued by several countries under one law. */
		region: z.enum(TAX_IDENTIFIER_REGIONS).optional(),
		note: z.string().min(1),
		source: taxIdentifierSourceSchema
	})
	.refine((t) => t.country === undefined || t.region === undefined, {
		message: 'give a country or a region, not both',
		path: ['region']
	})
	.readonly();

export type TaxIdentifierType = z.infer<typeof taxIdentifierTypeSchema>;

function parseTaxIdentifierTypes(data: unknown): readonly TaxIdentifierType[] {
	const list = z.array(taxIdentifierTypeSchema).parse(data);
	const seen = new Set<string>();
	for (const item of list) {
		if (seen.has(item.code)) {
			throw new Error(`data/tax-identifier-types.json: duplicate code ${item.code}`);
		}
		seen.add(item.code);
	}
	const missing = TAX_IDENTIFIER_CODES.filter((code) => !seen.has(code));
	if (missing.length > 0) {
		throw new Error(`data/tax-identifier-types.json: missing codes ${missing.join(', ')}`);
	}
	return Object.freeze(list);
}

/** All identifier types, in data-file order (specific types first, TIN and OTHER last). */
export const taxIdentifierTypes: readonly TaxIdentifierType[] =
	parseTaxIdentifierTypes(taxIdentifierData);

const byCode: ReadonlyMap<string, TaxIdentifierType> = new Map(
	taxIdentifierTypes.map((t) => [t.code, t])
);

/** The identifier type with this code, or undefined. */
export function taxIdentifierType(code: string): TaxIdentifierType | undefined {
	return byCode.get(code);
}

/** True when `code` is a known identifier type code. */
export function isTaxIdentifierCode(code: unknown): code is TaxIdentifierCode {
	return typeof code === 'string' && byCode.has(code);
}

/** Display label for a stored identifier type; falls back to the code itself when unknown. */
export function taxIdentifierLabel(code: string): string {
	return byCode.get(code)?.label ?? code;
}

export interface TaxIdentifierOption {
	readonly code: TaxIdentifierCode;
	readonly label: string;
}

const options: readonly TaxIdentifierOption[] = Object.freeze(
	taxIdentifierTypes.map((t) => Object.freeze({ code: t.code, label: t.label }))
);

/** `{ code, label }` for form selects, in data-file order (TIN and OTHER last). */
export function taxIdentifierOptions(): readonly TaxIdentifierOption[] {
	return options;
}
