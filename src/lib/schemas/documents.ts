import { z } from 'zod';
import { DOCUMENT_KINDS } from '../documents/types';
import { optionalDecimalString } from './fields';

// The papers' own fields on a shipment, and the issue request; shared by forms and the API.

const text = (label: string, max: number) =>
	z.string().trim().max(max, `${label}: at most ${max} characters.`).optional().default('');

/** Reasons for export printed on the invoice (free text is accepted too). */
export const EXPORT_REASONS = [
	'Sale',
	'Sample, no commercial value',
	'Warranty replacement',
	'Return after repair',
	'Temporary export for exhibition'
] as const;

export const paperDetailsSchema = z.object({
	paymentTerms: text('Payment terms', 200),
	exportReason: text('Reason for export', 100),
	freightAmount: optionalDecimalString('Freight', 4),
	insuranceAmount: optionalDecimalString('Insurance', 4),
	marks: text('Marks and numbers', 500),
	signatoryName: text('Signatory', 100),
	signatoryTitle: text('Title', 100),
	signingPlace: text('Place of signing', 100),
	preferentialOriginClaimed: z.boolean().default(false),
	preferentialAgreement: text('Trade agreement', 200),
	originStatement: text('Origin statement', 2000),
	version: z.number().int().min(0)
});
export type PaperDetailsInput = z.infer<typeof paperDetailsSchema>;

export const issuePapersSchema = z.object({
	kinds: z
		.array(z.enum(DOCUMENT_KINDS, { error: 'Choose the commercial invoice or the packing list.' }))
		.min(1, 'Choose at least one paper.')
		.max(2),
	reason: z.string().trim().max(500, 'Keep the reason to 500 characters.').optional().default('')
});
export type IssuePapersInput = z.infer<typeof issuePapersSchema>;
