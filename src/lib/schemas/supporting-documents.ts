import { z } from 'zod';
import { MAX_UPLOAD_BYTES, tooLargeMessage } from '../uploads/file-check';
import { SUPPORTING_KINDS } from '../uploads/document-kinds';

// The upload form of a supporting document. The file's size is checked here for a quick field
// error; its type is checked by content on the server (uploads/file-check.ts), never by name.

const optionalDate = (label: string) =>
	z.union([z.literal(''), z.iso.date(`${label}: a date as YYYY-MM-DD.`)]).default('');

export const supportingUploadSchema = z
	.object({
		kind: z.enum(SUPPORTING_KINDS, { error: 'Choose what kind of document this is.' }),
		title: z
			.string()
			.trim()
			.min(1, 'Give the document a title, e.g. "UN38.3 summary, cell model X, 2026".')
			.max(200, 'Title: at most 200 characters.'),
		issuedOn: optionalDate('Date of issue'),
		expiresOn: optionalDate('Valid until'),
		file: z
			.instanceof(File, { message: 'Choose a PDF, PNG or JPEG file.' })
			.refine((f) => f.size > 0, 'Choose a PDF, PNG or JPEG file; this one is empty.')
			.refine((f) => f.size <= MAX_UPLOAD_BYTES, tooLargeMessage(MAX_UPLOAD_BYTES + 1))
	})
	.superRefine((v, ctx) => {
		if (v.issuedOn && v.expiresOn && v.expiresOn < v.issuedOn)
			ctx.addIssue({
				code: 'custom',
				path: ['expiresOn'],
				message: 'The expiry date is before the date of issue.'
			});
	});
export type SupportingUploadInput = z.infer<typeof supportingUploadSchema>;

export const supportingRetireSchema = z.object({ documentId: z.uuid('No such document.') });
