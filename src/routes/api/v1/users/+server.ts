import { json } from '@sveltejs/kit';
import { readJson, respond } from '$lib/server/api';
import { requireRole } from '$lib/server/auth/guard';
import { createUser, listUsers } from '$lib/server/services/users';
import { createUserSchema } from '$lib/schemas/users';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	requireRole(event, 'admin');
	return json({ users: await listUsers() });
};

export const POST: RequestHandler = async (event) => {
	const admin = requireRole(event, 'admin');
	const input = await readJson(event.request, createUserSchema);
	return respond(await createUser(admin, input, event.getClientAddress()), 201);
};
