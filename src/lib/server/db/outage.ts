// Telling "the database cannot be reached just now" apart from a bug, so the app answers 503
// with Retry-After (a load balancer or client tries again) instead of a 500. The pool makes new
// connections once PostgreSQL is back: the app itself needs no restart.
import { ConnectionError } from 'sequelize';

/** SQLSTATE classes and codes of a server that is down, restarting or refusing connections. */
const OUTAGE_SQLSTATES = new Set(['57P01', '57P02', '57P03', '53300']);
const OUTAGE_ERRNOS = new Set(['ECONNREFUSED', 'ECONNRESET', 'EPIPE', 'ETIMEDOUT', 'ENOTFOUND']);
const OUTAGE_MESSAGES = [
	/Connection terminated/i,
	/terminating connection due to administrator command/i,
	/the database system is (starting up|shutting down|in recovery mode)/i,
	/Client has encountered a connection error and is not queryable/i
];

export const OUTAGE_MESSAGE =
	'Landfall cannot reach its database just now. Nothing was saved; try again in a moment.';
export const RETRY_AFTER_SECONDS = 5;

/** True for errors (or their causes) that mean PostgreSQL is unreachable, not a bad query. */
export function isDatabaseOutage(error: unknown, depth = 0): boolean {
	if (depth > 4 || error === null || typeof error !== 'object') return false;
	if (error instanceof ConnectionError) return true;
	const e = error as { code?: unknown; message?: unknown; parent?: unknown; original?: unknown };
	if (typeof e.code === 'string') {
		if (OUTAGE_SQLSTATES.has(e.code) || e.code.startsWith('08') || OUTAGE_ERRNOS.has(e.code))
			return true;
	}
	if (typeof e.message === 'string' && OUTAGE_MESSAGES.some((m) => m.test(e.message as string)))
		return true;
	return isDatabaseOutage(e.parent ?? e.original, depth + 1);
}
