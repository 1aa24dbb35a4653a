import { queryInt } from '$lib/server/api';
import { requireRole } from '$lib/server/auth/guard';
import { listAuditEvents } from '$lib/server/services/audit';
import type { PageServerLoad } from './$types';

const PAGE_SIZE = 50;

// Returns: events (newest first), total, page, pageCount.
export const load: PageServerLoad = async (event) => {
	requireRole(event, 'admin');
	const page = Math.max(1, queryInt(event.url, 'page', 1, 100_000));
	const { rows, total } = await listAuditEvents({
		limit: PAGE_SIZE,
		offset: (page - 1) * PAGE_SIZE
	});
	return { events: rows, total, page, pageCount: Math.max(1, Math.ceil(total / PAGE_SIZE)) };
};
