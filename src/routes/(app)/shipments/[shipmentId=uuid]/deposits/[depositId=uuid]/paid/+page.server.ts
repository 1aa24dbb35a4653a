import { error } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/guard';
import { getDeposit } from '$lib/server/services/deposits';
import type { PageServerLoad } from './$types';

// Return page after the payment provider's page; shows the state the webhook has recorded.
export const load: PageServerLoad = async (event) => {
	const user = requireUser(event);
	const deposit = await getDeposit(user, event.params.shipmentId, event.params.depositId);
	if (!deposit) error(404, { message: 'No deposit with this id is visible to you.' });
	return { deposit };
};
