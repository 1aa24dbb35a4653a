import { json } from '@sveltejs/kit';
import { db } from '$lib/server/db';
import type { RequestHandler } from './$types';

// Public: used by the start script, the tests and a load balancer to see the app and its database.
export const GET: RequestHandler = async () => {
	try {
		await db().query('SELECT 1');
		return json({ status: 'ok', database: 'ok' });
	} catch {
		return json({ status: 'degraded', database: 'unreachable' }, { status: 503 });
	}
};
