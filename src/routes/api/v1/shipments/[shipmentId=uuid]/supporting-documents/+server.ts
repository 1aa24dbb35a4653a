import { error, json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/guard';
import { listSupportingDocuments } from '$lib/server/services/supporting-documents';
import type { RequestHandler } from './$types';

// The shipment's supporting documents (metadata, no content), for whoever sees the shipment.
export const GET: RequestHandler = async (event) => {
	const documents = await listSupportingDocuments(requireUser(event), {
		shipmentId: event.params.shipmentId
	});
	if (!documents)
		error(404, { message: 'No shipment with this id is visible to you.', code: 'not_found' });
	return json({ documents });
};
