import { requireRole } from '$lib/server/auth/guard';
import { listOutbox } from '$lib/server/mail/outbox';
import type { PageServerLoad } from './$types';

// Returns: messages (the newest 200 outbox rows, without their bodies).
export const load: PageServerLoad = async (event) => {
	requireRole(event, 'admin');
	return { messages: await listOutbox(200) };
};
