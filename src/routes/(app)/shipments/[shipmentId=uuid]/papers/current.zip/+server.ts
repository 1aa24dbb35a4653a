import { requireUser } from '$lib/server/auth/guard';
import { papersZipResponse } from '$lib/server/documents/respond';
import type { RequestHandler } from './$types';

// The shipment's current papers as one ZIP with their SHA-256 sums; each logged as downloaded.
export const GET: RequestHandler = async (event) =>
	papersZipResponse(requireUser(event), event.params.shipmentId);
