import { requireUser } from '$lib/server/auth/guard';
import { paperResponse } from '$lib/server/documents/respond';
import type { RequestHandler } from './$types';

// One issued paper (any revision) as PDF, for anyone who may see the shipment; logged.
export const GET: RequestHandler = async (event) =>
	paperResponse(requireUser(event), event.params.shipmentId, event.params.documentId, 'file');
