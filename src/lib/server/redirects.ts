/** Only same-site paths may be a post-sign-in destination (no open redirect to another host). */
export function safeRedirectPath(candidate: string | null | undefined, fallback = '/'): string {
	if (!candidate || !candidate.startsWith('/') || candidate.startsWith('//')) return fallback;
	if (candidate.includes('\\') || /[\u0000-\u001f]/.test(candidate)) return fallback;
	if (candidate === '/signin' || candidate.startsWith('/signin?') || candidate.startsWith('/signout')) {
		return fallback;
	}
	return candidate;
}
