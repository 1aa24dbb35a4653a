import { requireUser } from '$lib/server/auth/guard';
import { papersZipResponse } from '$lib/server/documents/respond';
import type { RequestHandler } from './$types';

// All current papers of the shipment as one ZIP with a SHA256SUMS file.
export const GET: RequestHandler = async (event) =>
	papersZipResponse(requireUser(event), event.params.shipmentId);
