import { json, type Handle, type HandleServerError, type ServerInit } from '@sveltejs/kit';
import { sequence } from '@sveltejs/kit/hooks';
import { authHandle } from '$lib/server/auth';
import { isApiPath, requireUser } from '$lib/server/auth/guard';
import { loadSessionUser } from '$lib/server/auth/session-user';
import {
	cachedSessionUserId,
	rememberSession,
	sessionCookieKey
} from '$lib/server/auth/session-cache';
import { env } from '$env/dynamic/private';
import { extraPolicy } from '$lib/server/content-security';
import { building } from '$app/environment';
import { db } from '$lib/server/db';
import { isDatabaseOutage, OUTAGE_MESSAGE, RETRY_AFTER_SECONDS } from '$lib/server/db/outage';
import { outagePage } from '$lib/server/db/outage-page';
import { startMailDispatcher, stopMailDispatcher } from '$lib/server/mail';
import { userForToken } from '$lib/server/services/api-tokens';

/** Pages and endpoints anyone may reach. Everything else needs a session. */
// The Stripe webhook proves itself with its signature (checked in the route) instead.
// /api/ping is the benchmarks' no-op (no database, no session).
const PUBLIC_PATHS = new Set(['/signin', '/api/health', '/api/ping', '/api/v1/stripe/webhook']);

export const init: ServerInit = async () => {
	// Fail at start-up, not on the first request, when the database is unreachable or misconfigured.
	await db().authenticate();
	// The outbox's dispatcher runs in the app process; the build starts none.
	if (!building) startMailDispatcher();
	// adapter-node emits this after SIGINT/SIGTERM once requests are done; the open pool
	// would otherwise keep the process alive.
	process.once('sveltekit:shutdown', () => void stopMailDispatcher().then(() => db().close()));
};

// Auth.js's own HTTP endpoints stay closed: sign-in goes through our form action only.
const closeAuthEndpoints: Handle = ({ event, resolve }) =>
	event.url.pathname === '/auth' || event.url.pathname.startsWith('/auth/')
		? new Response('Not found', { status: 404 })
		: resolve(event);

const loadUser: Handle = async ({ event, resolve }) => {
	event.locals.user = null;
	const bearer = /^Bearer (\S+)$/.exec(event.request.headers.get('authorization') ?? '')?.[1];
	if (bearer && event.url.pathname.startsWith('/api/v1/')) {
		// Integrations: an API token stands for its user on the JSON API only, never on pages.
		event.locals.user = await userForToken(bearer);
		if (!event.locals.user) {
			return json(
				{ message: 'This API token is unknown or revoked.', code: 'invalid_token' },
				{ status: 401 }
			);
		}
		return resolve(event);
	}
	const key = sessionCookieKey(event.request.headers.get('cookie'));
	let userId = key ? cachedSessionUserId(key) : null;
	if (!userId && key) {
		const session = await event.locals.auth();
		userId = session?.user?.id ?? null;
		if (userId) rememberSession(key, userId, session?.expires);
	}
	if (userId) event.locals.user = await loadSessionUser(userId);
	return resolve(event);
};

// Whole-area checks; every load, action and endpoint checks its role again where the data is.
const guardAreas: Handle = ({ event, resolve }) => {
	const { pathname } = event.url;
	// An invitation's set-password link proves itself with its token (checked in the page).
	if (PUBLIC_PATHS.has(pathname) || pathname.startsWith('/set-password/')) return resolve(event);
	const user = event.locals.user;
	if (!user && isApiPath(pathname)) {
		return json(
			{ message: 'Sign in first: this request has no valid session.', code: 'unauthenticated' },
			{ status: 401 }
		);
	}
	requireUser(event); // pages: redirect to sign-in
	const adminArea = pathname === '/admin' || pathname.startsWith('/admin/');
	// GETs reach the area's load, which renders the 403 page; anything else stops here.
	if (adminArea && user?.role !== 'admin' && event.request.method !== 'GET') {
		return json(
			{ message: 'This is for administrators only.', code: 'forbidden' },
			{ status: 403 }
		);
	}
	return resolve(event);
};

const securityHeaders: Handle = async ({ event, resolve }) => {
	const response = await resolve(event);
	response.headers.set('X-Content-Type-Options', 'nosniff');
	response.headers.set('Referrer-Policy', 'same-origin');
	response.headers.set('X-Frame-Options', 'DENY');
	response.headers.set('Permissions-Policy', 'camera=(), microphone=(), geolocation=()');
	response.headers.set('Cross-Origin-Opener-Policy', 'same-origin');
	if (response.headers.has('content-security-policy'))
		response.headers.append('Content-Security-Policy', extraPolicy(env));
	if (isApiPath(event.url.pathname) || event.locals.user) {
		response.headers.set('Cache-Control', 'no-store');
	}
	return response;
};

/** A plain answer for a request that failed while PostgreSQL was unreachable: 503, Retry-After. */
function outageResponse(event: Parameters<Handle>[0]['event']): Response {
	const headers = { 'retry-after': String(RETRY_AFTER_SECONDS), 'cache-control': 'no-store' };
	const wantsJson =
		isApiPath(event.url.pathname) ||
		event.request.headers.get('x-sveltekit-action') === 'true' ||
		event.url.pathname.endsWith('/__data.json');
	if (wantsJson)
		return json(
			{ message: OUTAGE_MESSAGE, code: 'database_unavailable' },
			{ status: 503, headers }
		);
	const retry = `${event.url.pathname}${event.url.search}`;
	return new Response(outagePage(OUTAGE_MESSAGE, RETRY_AFTER_SECONDS, retry), {
		status: 503,
		headers: { ...headers, 'content-type': 'text/html; charset=utf-8' }
	});
}

// Outermost: a request that failed because the database was unreachable (in a hook, a load, an
// action or an endpoint) answers 503 with Retry-After, never a 500; the pool reconnects by itself.
const answerOutages: Handle = async ({ event, resolve }) => {
	let response: Response;
	try {
		response = await resolve(event);
	} catch (e) {
		if (!isDatabaseOutage(e)) throw e;
		console.error(`[database] ${event.request.method} ${event.url.pathname}: unreachable`);
		return outageResponse(event);
	}
	if (event.locals.databaseOutage && response.status === 500) {
		// SvelteKit's own error page or JSON, already carrying OUTAGE_MESSAGE: only the status changes.
		const headers = new Headers(response.headers);
		headers.set('retry-after', String(RETRY_AFTER_SECONDS));
		return new Response(response.body, { status: 503, headers });
	}
	return response;
};

export const handle = sequence(
	answerOutages,
	closeAuthEndpoints,
	authHandle,
	loadUser,
	securityHeaders,
	guardAreas
);

export const handleError: HandleServerError = ({ error, event, status, message }) => {
	if (status === 404) return { message: 'Not found' };
	if (isDatabaseOutage(error)) {
		event.locals.databaseOutage = true;
		console.error(`[database] ${event.request.method} ${event.url.pathname}: unreachable`);
		return { message: OUTAGE_MESSAGE, code: 'database_unavailable' };
	}
	if (status < 500) {
		// SvelteKit's own refusals (415 for JSON posted to an action, say): the client's mistake, so
		// one line, not a stack.
		console.warn(`[refused ${status}] ${event.request.method} ${event.url.pathname}: ${message}`);
		return { message };
	}
	const id = crypto.randomUUID();
	try {
		console.error(`[error ${id}] ${event.request.method} ${event.url.pathname}`, error);
	} catch {
		// logging must never turn one error into two
	}
	return { message: 'Something went wrong on our side.', id };
};
