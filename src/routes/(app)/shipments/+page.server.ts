import { error } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/guard';
import { canEditShipments } from '$lib/server/services/shipment-scope';
import { customerFilterOptions, listShipments } from '$lib/server/services/shipment-list';
import { shipmentListQuerySchema } from '$lib/schemas/shipments';
import type { PageServerLoad } from './$types';

// Returns: shipments (one page), total, query (the filters in force), customers (staff only), canCreate.
export const load: PageServerLoad = async (event) => {
	const user = requireUser(event);
	const parsed = shipmentListQuerySchema.safeParse(Object.fromEntries(event.url.searchParams));
	if (!parsed.success) {
		const issue = parsed.error.issues[0];
		error(400, {
			message: `The filter “${issue?.path.join('.')}” is not valid: ${issue?.message}`
		});
	}
	const [result, customers] = await Promise.all([
		listShipments(user, parsed.data),
		customerFilterOptions(user)
	]);
	return { ...result, query: parsed.data, customers, canCreate: canEditShipments(user) };
};
