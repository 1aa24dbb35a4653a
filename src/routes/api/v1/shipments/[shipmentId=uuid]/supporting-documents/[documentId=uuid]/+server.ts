import { supportingDownloadResponse } from '$lib/server/supporting-document-actions';
import type { RequestHandler } from './$types';

// One supporting document of the shipment, as an attachment; scoped like the shipment, logged
// as an API download.
export const GET: RequestHandler = (event) =>
	supportingDownloadResponse(
		event,
		{ shipmentId: event.params.shipmentId },
		event.params.documentId,
		'api'
	);
