import { requireRole } from '$lib/server/auth/guard';
import { traceSerial } from '$lib/server/services/shipment-lots';
import type { PageServerLoad } from './$types';

// Returns: q (the serial or lot searched), hits (shipment, cartons, customer, date per match).
export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'admin', 'coordinator', 'finance');
	const q = (event.url.searchParams.get('q') ?? '').trim().slice(0, 40);
	return { q, hits: q ? await traceSerial(user, q) : [] };
};
