import { error, json } from '@sveltejs/kit';
import { readJson, respond } from '$lib/server/api';
import { requireRole, requireUser } from '$lib/server/auth/guard';
import { issuePapers } from '$lib/server/services/documents/issue';
import { documentRegister } from '$lib/server/services/documents/register';
import { issuePapersSchema } from '$lib/schemas/documents';
import type { RequestHandler } from './$types';

// The document register of a shipment (every paper and revision), and issuing papers.
export const GET: RequestHandler = async (event) => {
	const register = await documentRegister(requireUser(event), event.params.shipmentId);
	if (!register)
		error(404, { message: 'No shipment with this id is visible to you.', code: 'not_found' });
	return json(register);
};

export const POST: RequestHandler = async (event) => {
	const user = requireRole(event, 'admin', 'coordinator');
	const body = await readJson(event.request, issuePapersSchema);
	const result = await issuePapers(user, event.params.shipmentId, body, event.getClientAddress());
	return respond(result, 201);
};
