import { error, redirect, type RequestEvent } from '@sveltejs/kit';
import { ROLE_LABELS, STAFF_ROLES, isStaff, type Role } from '../../roles';
import type { SessionUser } from './session-user';

type GuardEvent = Pick<RequestEvent, 'locals' | 'url'>;

export function isApiPath(pathname: string): boolean {
	return pathname === '/api' || pathname.startsWith('/api/');
}

/** The signed-in user, or: pages redirect to sign-in, API routes answer 401. */
export function requireUser(event: GuardEvent): SessionUser {
	const user = event.locals.user;
	if (user) return user;
	if (isApiPath(event.url.pathname)) {
		error(401, {
			message: 'Sign in first: this request has no valid session.',
			code: 'unauthenticated'
		});
	}
	const back = event.url.pathname + event.url.search;
	redirect(303, `/signin?redirectTo=${encodeURIComponent(back)}`);
}

/** Call in every load, action and endpoint: the signed-in user if the role is allowed, else 403. */
export function requireRole(event: GuardEvent, ...roles: Role[]): SessionUser {
	const user = requireUser(event);
	if (!roles.includes(user.role)) {
		const allowed = roles.map((role) => ROLE_LABELS[role]).join(', ');
		error(403, {
			message: `Your role (${ROLE_LABELS[user.role]}) cannot open this. It is for: ${allowed}.`,
			code: 'forbidden'
		});
	}
	return user;
}

export function requireStaff(event: GuardEvent): SessionUser {
	return requireRole(event, ...STAFF_ROLES);
}

/**
 * The WHERE fragment that scopes organization-owned rows: staff see all, a customer or broker only
 * their own organization. Spread it into every query on such rows.
 */
export function organizationScope(
	user: SessionUser,
	column = 'organizationId'
): Record<string, string> {
	return isStaff(user.role) ? {} : { [column]: user.organizationId };
}
