/** Only same-site paths may be a post-sign-in destination (no open redirect to another host). */
export function safeRedirectPath(candidate: string | null | undefined, fallback = '/'): string {
	if (!candidate || !candidate.startsWith('/') || candidate.startsWith('//')) return fallback;
	// Backslashes and control characters make browsers read a path as another host.
	if (candidate.includes('\\') || [...candidate].some((c) => c.charCodeAt(0) < 0x20))
		return fallback;
	if (
		candidate === '/signin' ||
		candidate.startsWith('/signin?') ||
		candidate.startsWith('/signout')
	) {
		return fallback;
	}
	return candidate;
}
