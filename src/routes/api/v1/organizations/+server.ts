import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/guard';
import { listOrganizations } from '$lib/server/services/organizations';
import type { RequestHandler } from './$types';

// Staff get every organization; customers and brokers get only their own (scoped in the query).
export const GET: RequestHandler = async (event) => {
	const user = requireUser(event);
	return json({ organizations: await listOrganizations(user) });
};
