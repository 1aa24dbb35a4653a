import { error, fail, type RequestEvent } from '@sveltejs/kit';
import { message, setError, superValidate, withFiles } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { supportingRetireSchema, supportingUploadSchema } from '../schemas/supporting-documents';
import { requireRole, requireUser } from './auth/guard';
import { readForm, refuse, validateForm } from './forms';
import {
	downloadSupportingDocument,
	listSupportingDocuments,
	retireSupportingDocument,
	uploadSupportingDocument,
	type DocumentOwner
} from './services/supporting-documents';
import { canEditShipments } from './services/shipment-scope';
import { MAX_UPLOAD_BYTES, tooLargeMessage } from '../uploads/file-check';
import type { SupportingKind } from '../uploads/document-kinds';

/**
 * The largest upload request read: the 10 MiB file plus the form's other fields and multipart
 * boundaries. BODY_SIZE_LIMIT (adapter-node; scripts/start.sh, playwright.config.ts) is 11M, so
 * the server reads such a body at all; anything larger is refused here with a field error.
 */
const MAX_UPLOAD_REQUEST_BYTES = MAX_UPLOAD_BYTES + 512 * 1024;

/** A 413 with the error on the file field, for a body too large to read. */
async function tooLarge() {
	const form = await superValidate(zod4(supportingUploadSchema), { id: 'supporting-upload' });
	form.data.kind = '' as SupportingKind;
	return withFiles(setError(form, 'file', tooLargeMessage(MAX_UPLOAD_BYTES + 1), { status: 413 }));
}

// The supporting-documents card's load data and form actions, shared by the shipment and the
// product page (they differ only in the owner), and the download response.

export async function supportingDocumentsData(event: RequestEvent, owner: DocumentOwner) {
	const user = requireUser(event);
	const [documents, uploadForm] = await Promise.all([
		listSupportingDocuments(user, owner),
		superValidate(zod4(supportingUploadSchema), { id: 'supporting-upload' })
	]);
	// No kind chosen until the user picks one (superforms would start at the enum's first value,
	// and a document filed as a UN38.3 summary by mistake would satisfy the readiness check).
	uploadForm.data.kind = '' as SupportingKind;
	return { documents: documents ?? [], uploadForm, canUpload: canEditShipments(user) };
}

export async function uploadSupportingAction(event: RequestEvent, owner: DocumentOwner) {
	const user = requireRole(event, 'admin', 'coordinator');
	const length = Number(event.request.headers.get('content-length') ?? 0);
	if (length > MAX_UPLOAD_REQUEST_BYTES) return tooLarge();
	const form = await validateForm(event.request, zod4(supportingUploadSchema), {
		id: 'supporting-upload',
		files: ['file']
	});
	// Not posted: the body could not be read, i.e. it went past BODY_SIZE_LIMIT while streaming.
	if (!form.posted) return tooLarge();
	if (!form.valid) return fail(400, withFiles({ form }));
	const { file, ...rest } = form.data;
	const result = await uploadSupportingDocument(
		user,
		owner,
		{
			kind: rest.kind,
			title: rest.title,
			issuedOn: rest.issuedOn || null,
			expiresOn: rest.expiresOn || null,
			fileName: file.name,
			bytes: new Uint8Array(await file.arrayBuffer())
		},
		event.getClientAddress()
	);
	if (!result.ok) return withFiles(refuse(form, result));
	return withFiles(
		message(form, { tone: 'ok', text: `Added ${result.value.fileName} to the documents on file.` })
	);
}

export async function retireSupportingAction(event: RequestEvent, owner: DocumentOwner) {
	const user = requireRole(event, 'admin', 'coordinator');
	const data = await readForm(event.request);
	const parsed = supportingRetireSchema.safeParse({ documentId: data.get('documentId') ?? '' });
	if (!parsed.success) return fail(400, { supportingError: 'No such document.' });
	const result = await retireSupportingDocument(
		user,
		owner,
		parsed.data.documentId,
		event.getClientAddress()
	);
	if (!result.ok) return fail(result.status, { supportingError: result.message });
	return { supportingDone: 'The document was retired; it stays on record.' };
}

/** The file as an attachment; 404 for anything not visible, so ids confirm nothing. */
export async function supportingDownloadResponse(
	event: RequestEvent,
	owner: DocumentOwner,
	documentId: string,
	via: 'file' | 'api'
): Promise<Response> {
	const file = await downloadSupportingDocument(
		requireUser(event),
		owner,
		documentId,
		via,
		event.getClientAddress()
	);
	if (!file) error(404, { message: 'No such document is visible to you.', code: 'not_found' });
	return new Response(new Uint8Array(file.content), {
		headers: {
			'content-type': file.contentType,
			// The name was sanitised on upload (no quotes, no paths); RFC 6266 filename*.
			'content-disposition': `attachment; filename="${file.fileName.replace(/[^\x20-\x7e]/g, '_')}"; filename*=UTF-8''${encodeURIComponent(file.fileName)}`,
			'cache-control': 'private, no-store',
			'x-content-type-options': 'nosniff',
			'x-landfall-sha256': file.sha256
		}
	});
}
