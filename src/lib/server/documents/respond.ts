import { error } from '@sveltejs/kit';
import type { SessionUser } from '../auth/session-user';
import { downloadPapers } from '../services/documents/register';
import { papersZip } from '../services/documents/zip';

// Download responses for the papers, shared by the page routes and /api/v1 (which differ only
// in how the download is logged).

const NOT_FOUND = { message: 'No such paper is visible to you.', code: 'not_found' };

function headers(type: string, fileName: string, extra: Record<string, string> = {}) {
	return {
		'content-type': type,
		'content-disposition': `attachment; filename="${fileName}"`,
		'cache-control': 'private, no-store',
		'x-content-type-options': 'nosniff',
		...extra
	};
}

export async function paperResponse(
	user: SessionUser,
	shipmentId: string,
	documentId: string,
	via: 'file' | 'api'
): Promise<Response> {
	const found = await downloadPapers(user, shipmentId, { documentId }, via);
	const file = found?.files[0];
	if (!file) error(404, NOT_FOUND);
	return new Response(new Uint8Array(file.pdf), {
		headers: headers('application/pdf', file.fileName, {
			'x-landfall-sha256': file.sha256,
			'x-landfall-revision': file.revision,
			'x-landfall-superseded': file.current ? 'false' : 'true'
		})
	});
}

export async function papersZipResponse(user: SessionUser, shipmentId: string): Promise<Response> {
	const found = await downloadPapers(user, shipmentId, 'current', 'zip');
	if (!found)
		error(404, { message: 'No shipment with this id is visible to you.', code: 'not_found' });
	const { reference, files } = found;
	if (files.length === 0)
		error(404, { message: 'No papers have been issued for this shipment yet.', code: 'no_papers' });
	const zip = await papersZip(files, new Date());
	return new Response(new Uint8Array(zip), {
		headers: headers('application/zip', `${reference}-papers.zip`)
	});
}
