import { json } from '@sveltejs/kit';
import { queryInt } from '$lib/server/api';
import { requireRole } from '$lib/server/auth/guard';
import { listAuditEvents } from '$lib/server/services/audit';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	requireRole(event, 'admin');
	const limit = queryInt(event.url, 'limit', 50, 500);
	const offset = queryInt(event.url, 'offset', 0, 1_000_000);
	return json(await listAuditEvents({ limit, offset }));
};
