import { requireUser } from '$lib/server/auth/guard';
import { paperResponse } from '$lib/server/documents/respond';
import type { RequestHandler } from './$types';

// One issued paper as PDF (headers carry its SHA-256 and revision); the download is logged.
export const GET: RequestHandler = async (event) =>
	paperResponse(requireUser(event), event.params.shipmentId, event.params.documentId, 'api');
