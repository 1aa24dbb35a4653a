import { error, json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/guard';
import { getOrganization } from '$lib/server/services/organizations';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	const user = requireUser(event);
	const organization = await getOrganization(user, event.params.organizationId);
	if (!organization)
		error(404, { message: 'No organization with this id is visible to you.', code: 'not_found' });
	return json(organization);
};
