/**
 * The address links in e-mails start with: ORIGIN (the app's public origin, which adapter-node
 * needs anyway). Mail queued from a request uses that request's origin instead. Read from
 * process.env, not $env, because the seed scripts run these services outside SvelteKit.
 */
export function mailOrigin(): string {
	return (process.env.ORIGIN || 'http://127.0.0.1:4310').replace(/\/+$/, '');
}

/** A date for people: '2 Dec 2026' (UTC). */
export function mailDate(date: Date): string {
	return new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium', timeZone: 'UTC' }).format(date);
}

/** A moment for people: '2 Dec 2026, 14:05 UTC'. */
export function mailMoment(date: Date): string {
	return (
		new Intl.DateTimeFormat('en-GB', {
			dateStyle: 'medium',
			timeStyle: 'short',
			timeZone: 'UTC'
		}).format(date) + ' UTC'
	);
}
