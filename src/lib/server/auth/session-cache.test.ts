import { describe, expect, it } from 'vitest';
import {
	cachedSessionUserId,
	forgetSession,
	forgetUserSessions,
	rememberSession,
	sessionCookieKey
} from './session-cache';

describe('session cache', () => {
	it('keys only the session-token cookies, chunked ones included, in a stable order', () => {
		expect(sessionCookieKey(null)).toBeNull();
		expect(sessionCookieKey('theme=dark')).toBeNull();
		expect(sessionCookieKey('a=1; authjs.session-token=xyz; b=2')).toBe('authjs.session-token=xyz');
		expect(sessionCookieKey('authjs.session-token.1=b; authjs.session-token.0=a')).toBe(
			'authjs.session-token.0=a; authjs.session-token.1=b'
		);
		expect(sessionCookieKey('authjs.csrf-token=q')).toBeNull();
	});

	it('remembers a user for at most a minute and never past the token expiry', () => {
		const now = 1_000_000;
		rememberSession('k1', 'u1', new Date(now + 3_600_000), now);
		expect(cachedSessionUserId('k1', now + 59_000)).toBe('u1');
		expect(cachedSessionUserId('k1', now + 60_000)).toBeNull();

		rememberSession('k2', 'u2', new Date(now + 5_000), now);
		expect(cachedSessionUserId('k2', now + 4_000)).toBe('u2');
		expect(cachedSessionUserId('k2', now + 5_000)).toBeNull();

		rememberSession('k3', 'u3', new Date(now - 1), now); // already expired: not kept
		expect(cachedSessionUserId('k3', now)).toBeNull();
	});

	it('forgets on sign-out and per user', () => {
		const now = Date.now();
		rememberSession('k4', 'u4', new Date(now + 3_600_000), now);
		rememberSession('k5', 'u4', new Date(now + 3_600_000), now);
		forgetSession('k4');
		expect(cachedSessionUserId('k4', now)).toBeNull();
		expect(cachedSessionUserId('k5', now)).toBe('u4');
		forgetUserSessions('u4');
		expect(cachedSessionUserId('k5', now)).toBeNull();
	});
});
