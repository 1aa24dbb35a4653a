import { isRedirect, redirect, type RequestEvent } from '@sveltejs/kit';
import { signOut } from '$lib/server/auth';
import { requireUser } from '$lib/server/auth/guard';
import { forgetSession, sessionCookieKey } from '$lib/server/auth/session-cache';
import { recordAudit } from '$lib/server/services/audit';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = (event) => {
	requireUser(event);
	return {};
};

export const actions: Actions = {
	default: async (event) => {
		const user = requireUser(event);
		await recordAudit({
			actorUserId: user.id,
			action: 'auth.sign_out',
			entity: 'user',
			entityId: user.id,
			ip: event.getClientAddress()
		});
		const request = new Request(event.url, {
			method: 'POST',
			headers: {
				'content-type': 'application/x-www-form-urlencoded',
				cookie: event.request.headers.get('cookie') ?? ''
			},
			body: new URLSearchParams({ redirectTo: '/signin' })
		});
		forgetSession(sessionCookieKey(event.request.headers.get('cookie')));
		try {
			await signOut({ ...event, request } as RequestEvent);
		} catch (error) {
			// signOut clears the cookie and then throws its own redirect; ours follows below.
			if (!isRedirect(error)) throw error;
		}
		redirect(303, '/signin');
	}
};
