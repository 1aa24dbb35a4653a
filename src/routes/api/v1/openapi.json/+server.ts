import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/guard';
import { openApiDocument } from '$lib/server/openapi';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = (event) => {
	requireUser(event);
	return json(openApiDocument(event.url.origin));
};
