import type { SessionUser } from '$lib/server/auth/session-user';

declare global {
	namespace App {
		interface Error {
			message: string;
			/** Machine-readable reason for API clients, e.g. 'unauthenticated', 'forbidden'. */
			code?: string;
			/** Reference of an unexpected error, to quote to support; details are in the server log. */
			id?: string;
			/** Field-level problems of a rejected API body: path like 'email' or 'lines.0.quantity'. */
			issues?: { path: string; message: string }[];
		}
		interface Locals {
			/** The signed-in, enabled user read from the database, or null. */
			user: SessionUser | null;
			/** Set by handleError when the request failed because PostgreSQL was unreachable. */
			databaseOutage?: boolean;
		}
	}
}

export {};
