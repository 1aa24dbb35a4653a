import { CredentialsSignin, SvelteKitAuth, type SvelteKitAuthConfig } from '@auth/sveltekit';
import Credentials from '@auth/sveltekit/providers/credentials';
import { skipCSRFCheck } from '@auth/core';
import { env } from '$env/dynamic/private';
import { db } from '../db';
import { authenticate } from './authenticate';

/** Refusals carry a code so the sign-in action can tell "wrong" from "throttled". */
export class SignInRefused extends CredentialsSignin {
	retryAfterSeconds: number;
	constructor(code: 'invalid' | 'throttled', retryAfterSeconds = 0) {
		super();
		this.code = code;
		this.retryAfterSeconds = retryAfterSeconds;
	}
}

export const SESSION_MAX_AGE_SECONDS = 8 * 60 * 60;

export const {
	handle: authHandle,
	signIn,
	signOut
} = SvelteKitAuth(async (): Promise<SvelteKitAuthConfig> => {
	if (!env.AUTH_SECRET) throw new Error('AUTH_SECRET is not set: see .env.example');
	return {
		secret: env.AUTH_SECRET,
		// The built app runs behind our own origin; @auth/sveltekit only trusts the host in dev.
		trustHost: true,
		// Auth.js's CSRF token is not used: its endpoints are closed (hooks.server.ts) and the
		// only way in is our sign-in form action, which SvelteKit's origin check protects.
		skipCSRFCheck,
		basePath: '/auth',
		session: { strategy: 'jwt', maxAge: SESSION_MAX_AGE_SECONDS },
		pages: { signIn: '/signin', error: '/signin' },
		providers: [
			Credentials({
				credentials: { email: {}, password: {}, ip: {} },
				async authorize(credentials) {
					db(); // binds the models to the connection pool
					const result = await authenticate({
						email: String(credentials.email ?? ''),
						password: String(credentials.password ?? ''),
						ip: credentials.ip ? String(credentials.ip) : null
					});
					if (result.ok) {
						const { userId, email, name, role, organizationId } = result;
						return { id: userId, email, name, role, organizationId };
					}
					throw new SignInRefused(
						result.reason,
						result.reason === 'throttled' ? result.retryAfterSeconds : 0
					);
				}
			})
		],
		callbacks: {
			// The session carries who signed in, their organization and role. hooks.server.ts still
			// re-reads the user on every request: the database, not the cookie, has the last word.
			jwt({ token, user }) {
				if (user?.id) {
					const claims = user as typeof user & { role: string; organizationId: string };
					token.sub = claims.id;
					token.role = claims.role;
					token.organizationId = claims.organizationId;
				}
				return token;
			},
			session({ session, token }) {
				if (token.sub) session.user.id = token.sub;
				return Object.assign(session, {
					role: token.role as string | undefined,
					organizationId: token.organizationId as string | undefined
				});
			}
		},
		logger: {
			// A refused sign-in is an expected outcome, not a server error.
			error(error) {
				if (!(error instanceof CredentialsSignin)) console.error('[auth]', error);
			},
			warn() {},
			debug() {}
		}
	};
});
