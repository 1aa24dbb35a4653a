import { isRedirect, redirect, type RequestEvent } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { signIn, SignInRefused } from '$lib/server/auth';
import { safeRedirectPath } from '$lib/server/redirects';
import type { Actions, PageServerLoad } from './$types';
import { signInSchema } from './schema';
import { validateForm } from '$lib/server/forms';

export const load: PageServerLoad = async ({ locals, url }) => {
	if (locals.user) redirect(303, safeRedirectPath(url.searchParams.get('redirectTo')));
	return {
		form: await superValidate(zod4(signInSchema)),
		// Set by the invitation's set-password page after it saved the password.
		passwordSet: url.searchParams.get('password-set') === '1'
	};
};

const INVALID = 'That e-mail address and password do not match an active Landfall account.';

function minutes(seconds: number): string {
	const m = Math.ceil(seconds / 60);
	return m === 1 ? '1 minute' : `${m} minutes`;
}

export const actions: Actions = {
	default: async (event) => {
		const form = await validateForm(event.request, zod4(signInSchema));
		const password = form.data.password;
		form.data.password = ''; // never echo a password back to the page
		if (!form.valid) return message(form, 'Check the highlighted fields.', { status: 400 });

		const redirectTo = safeRedirectPath(event.url.searchParams.get('redirectTo'));
		// Hand the credentials to Auth.js, which calls authorize() and sets the session cookie.
		const headers = new Headers(event.request.headers);
		headers.set('content-type', 'application/x-www-form-urlencoded');
		headers.delete('content-length');
		const request = new Request(event.url, {
			method: 'POST',
			headers,
			body: new URLSearchParams({
				providerId: 'credentials',
				email: form.data.email,
				password,
				ip: event.getClientAddress(),
				redirectTo
			})
		});
		try {
			await signIn({ ...event, request } as RequestEvent);
		} catch (error) {
			if (isRedirect(error)) redirect(303, redirectTo);
			if (error instanceof SignInRefused && error.code === 'throttled') {
				return message(
					form,
					`Too many failed sign-ins for this address. Wait ${minutes(error.retryAfterSeconds)} and try again, or ask an administrator to check the account.`,
					{ status: 429 }
				);
			}
			if (error instanceof SignInRefused) return message(form, INVALID, { status: 400 });
			throw error;
		}
		redirect(303, redirectTo);
	}
};
