import { error, json } from '@sveltejs/kit';
import { requireRole } from '$lib/server/auth/guard';
import { listDeposits } from '$lib/server/services/deposits';
import type { RequestHandler } from './$types';

// The shipment's freight deposits: staff see all, a customer only its own organization's.
export const GET: RequestHandler = async (event) => {
	const user = requireRole(event, 'admin', 'coordinator', 'finance', 'customer');
	const deposits = await listDeposits(user, event.params.shipmentId);
	if (!deposits)
		error(404, { message: 'No shipment with this id is visible to you.', code: 'not_found' });
	return json({ deposits });
};
