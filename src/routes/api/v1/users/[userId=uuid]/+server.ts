import { error, json } from '@sveltejs/kit';
import { readJson, respond } from '$lib/server/api';
import { requireRole } from '$lib/server/auth/guard';
import { getUser, updateUser } from '$lib/server/services/users';
import { updateUserSchema } from '$lib/schemas/users';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	requireRole(event, 'admin');
	const user = await getUser(event.params.userId);
	if (!user) error(404, { message: 'No such user.', code: 'not_found' });
	return json(user);
};

export const PATCH: RequestHandler = async (event) => {
	const admin = requireRole(event, 'admin');
	const input = await readJson(event.request, updateUserSchema);
	return respond(await updateUser(admin, event.params.userId, input, event.getClientAddress()));
};
