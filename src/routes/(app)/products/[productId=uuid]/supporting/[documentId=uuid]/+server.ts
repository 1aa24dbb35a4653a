import { supportingDownloadResponse } from '$lib/server/supporting-document-actions';
import type { RequestHandler } from './$types';

// A supporting document of the product (staff, and brokers of shipments carrying it), logged.
export const GET: RequestHandler = (event) =>
	supportingDownloadResponse(
		event,
		{ productId: event.params.productId },
		event.params.documentId,
		'file'
	);
