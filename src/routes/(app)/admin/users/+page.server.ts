import { fail } from '@sveltejs/kit';
import { message, setError, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { requireRole } from '$lib/server/auth/guard';
import { listOrganizations } from '$lib/server/services/organizations';
import { inviteUser } from '$lib/server/services/invitations';
import { createUser, listUsers } from '$lib/server/services/users';
import { createUserSchema, inviteUserSchema } from '$lib/schemas/users';
import type { Actions, PageServerLoad } from './$types';
import { validateForm } from '$lib/server/forms';

// Both buttons of the one "Add a person" form answer to the same superform.
const FORM_ID = 'add-person';

// Returns: users (everyone with a sign-in), organizations (to choose from), form (add a person).
export const load: PageServerLoad = async (event) => {
	const admin = requireRole(event, 'admin');
	const [users, organizations, form] = await Promise.all([
		listUsers(),
		listOrganizations(admin),
		superValidate(zod4(createUserSchema), { id: FORM_ID })
	]);
	return { users, organizations, form };
};

export const actions: Actions = {
	create: async (event) => {
		const admin = requireRole(event, 'admin');
		const form = await validateForm(event.request, zod4(createUserSchema), { id: FORM_ID });
		if (!form.valid) {
			form.data.password = '';
			return fail(400, { form });
		}
		const result = await createUser(admin, form.data, event.getClientAddress());
		form.data.password = '';
		if (!result.ok) {
			for (const [field, text] of Object.entries(result.fieldErrors)) {
				setError(form, field as 'email', text);
			}
			return message(form, { tone: 'error', text: result.message }, { status: result.status });
		}
		return message(form, {
			tone: 'ok',
			text: `${result.value.name} can now sign in as ${result.value.email}.`
		});
	},
	/** Adds the person without a password and e-mails them a set-password link. */
	invite: async (event) => {
		const admin = requireRole(event, 'admin');
		const form = await validateForm(event.request, zod4(inviteUserSchema), { id: FORM_ID });
		if (!form.valid) return fail(400, { form });
		const result = await inviteUser(admin, form.data, {
			origin: event.url.origin,
			ip: event.getClientAddress()
		});
		if (!result.ok) {
			for (const [field, text] of Object.entries(result.fieldErrors)) {
				setError(form, field as 'email', text);
			}
			return message(form, { tone: 'error', text: result.message }, { status: result.status });
		}
		return message(form, {
			tone: 'ok',
			text: `Invitation e-mailed to ${result.value.email}: the link lets ${result.value.name} choose a password.`
		});
	}
};
