import { fail, redirect } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { acceptInvitation, pendingInvitation } from '$lib/server/services/invitations';
import { setPasswordSchema } from '$lib/schemas/users';
import type { Actions, PageServerLoad } from './$types';
import { validateForm } from '$lib/server/forms';

// Public: the token in the path is the proof. Returns: invitee (name, e-mail) or null, form.
export const load: PageServerLoad = async ({ params }) => {
	const pending = await pendingInvitation(params.token);
	return {
		invitee: pending ? { name: pending.name, email: pending.email } : null,
		form: await superValidate(zod4(setPasswordSchema))
	};
};

export const actions: Actions = {
	default: async (event) => {
		const form = await validateForm(event.request, zod4(setPasswordSchema));
		const password = form.data.password;
		form.data.password = '';
		form.data.confirm = '';
		if (!form.valid) return fail(400, { form });
		const result = await acceptInvitation(event.params.token, password, event.getClientAddress());
		if (!result.ok) return message(form, result.message, { status: 400 });
		redirect(303, '/signin?password-set=1');
	}
};
