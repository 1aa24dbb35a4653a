/**
 * Remembers, for a short while, which user a verified session cookie stands for, so that most
 * requests skip Auth.js's JWT decrypt and re-encrypt (two HKDF derivations, AES-GCM both ways):
 * about a quarter of a list page's CPU time. The user row is still read on every request
 * (session-user.ts), so disabling a user or changing a role takes effect at once.
 * An entry lives at most TTL_MS and never beyond the token's own expiry; sign-out forgets it.
 */
const TTL_MS = 60_000;
const MAX_ENTRIES = 5_000;

interface Entry {
	userId: string;
	expiresAt: number;
}

const entries = new Map<string, Entry>();

/** The session cookie(s) of a request as one key: Auth.js may split a large token in chunks. */
export function sessionCookieKey(cookieHeader: string | null): string | null {
	if (!cookieHeader) return null;
	const parts = cookieHeader
		.split(';')
		.map((c) => c.trim())
		.filter((c) => /^(__Secure-)?authjs\.session-token(\.\d+)?=/.test(c))
		.sort();
	return parts.length ? parts.join('; ') : null;
}

export function cachedSessionUserId(key: string, now = Date.now()): string | null {
	const entry = entries.get(key);
	if (!entry) return null;
	if (entry.expiresAt <= now) {
		entries.delete(key);
		return null;
	}
	return entry.userId;
}

export function rememberSession(
	key: string,
	userId: string,
	tokenExpires: string | Date | undefined,
	now = Date.now()
): void {
	const tokenEnd = tokenExpires ? new Date(tokenExpires).getTime() : now;
	const expiresAt = Math.min(now + TTL_MS, tokenEnd);
	if (!(expiresAt > now)) return;
	if (entries.size >= MAX_ENTRIES) {
		// Map keeps insertion order: drop the oldest.
		const oldest = entries.keys().next().value;
		if (oldest !== undefined) entries.delete(oldest);
	}
	entries.set(key, { userId, expiresAt });
}

export function forgetSession(key: string | null): void {
	if (key) entries.delete(key);
}

/** Forget every session of one user (disabled, password changed). */
export function forgetUserSessions(userId: string): void {
	for (const [key, entry] of entries) if (entry.userId === userId) entries.delete(key);
}
