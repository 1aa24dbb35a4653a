import { error } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/guard';
import { depositReceipt } from '$lib/server/services/deposit-receipts';
import type { PageServerLoad } from './$types';

// Returns: receipt (a paid deposit, scoped to the customer's organization in the query).
export const load: PageServerLoad = async (event) => {
	const user = requireUser(event);
	const receipt = await depositReceipt(user, event.params.shipmentId, event.params.depositId);
	if (!receipt) error(404, { message: 'No receipt with this id is visible to you.' });
	return { receipt };
};
