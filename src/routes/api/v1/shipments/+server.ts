import { error, json } from '@sveltejs/kit';
import { readJson, respond } from '$lib/server/api';
import { requireRole, requireUser } from '$lib/server/auth/guard';
import { listShipments } from '$lib/server/services/shipment-list';
import { createShipment } from '$lib/server/services/shipments';
import { shipmentListQuerySchema, shipmentSchema } from '$lib/schemas/shipments';
import type { RequestHandler } from './$types';

// Scoped in the query: staff all, a customer its own, a broker those assigned to it.
export const GET: RequestHandler = async (event) => {
	const user = requireUser(event);
	const parsed = shipmentListQuerySchema.safeParse(Object.fromEntries(event.url.searchParams));
	if (!parsed.success) {
		error(400, {
			message: 'Some query parameters are invalid.',
			code: 'invalid_query',
			issues: parsed.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message }))
		});
	}
	return json(await listShipments(user, parsed.data));
};

export const POST: RequestHandler = async (event) => {
	const user = requireRole(event, 'admin', 'coordinator');
	const input = await readJson(event.request, shipmentSchema);
	return respond(await createShipment(user, input, event.getClientAddress()), 201);
};
