import { error, fail } from '@sveltejs/kit';
import { message, setError, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { requireRole } from '$lib/server/auth/guard';
import { issueToken, listTokens, revokeToken } from '$lib/server/services/api-tokens';
import { reinviteUser } from '$lib/server/services/invitations';
import { getUser, updateUser } from '$lib/server/services/users';
import { updateUserSchema } from '$lib/schemas/users';
import type { Actions, PageServerLoad } from './$types';
import { readForm, validateForm } from '$lib/server/forms';
import { NUL_MESSAGE } from '$lib/schemas/nul-text';

// Returns: person (the user being edited), form (name, role, disabled, version), tokens (API).
export const load: PageServerLoad = async (event) => {
	requireRole(event, 'admin');
	const person = await getUser(event.params.userId);
	if (!person) error(404, { message: 'No such person.' });
	const form = await superValidate(
		{ name: person.name, role: person.role, disabled: person.disabled, version: person.version },
		zod4(updateUserSchema)
	);
	return { person, form, tokens: await listTokens(person.id) };
};

export const actions: Actions = {
	save: async (event) => {
		const admin = requireRole(event, 'admin');
		const form = await validateForm(event.request, zod4(updateUserSchema));
		if (!form.valid) return fail(400, { form });
		const result = await updateUser(
			admin,
			event.params.userId,
			form.data,
			event.getClientAddress()
		);
		if (!result.ok) {
			if (result.status === 404) error(404, { message: 'No such person.' });
			for (const [field, text] of Object.entries(result.fieldErrors)) {
				setError(form, field as 'role', text);
			}
			return message(form, { tone: 'error', text: result.message }, { status: result.status });
		}
		form.data.version = result.value.version;
		return message(form, { tone: 'ok', text: 'Saved.' });
	},
	issueToken: async (event) => {
		const admin = requireRole(event, 'admin');
		const name = String((await readForm(event.request)).get('name') ?? '').trim();
		if (name.length < 1 || name.length > 80) {
			return fail(400, { tokenError: 'Name the token (1 to 80 characters), e.g. “ERP export”.' });
		}
		if (name.includes('\u0000')) return fail(400, { tokenError: NUL_MESSAGE });
		const result = await issueToken(admin, event.params.userId, name, event.getClientAddress());
		if (!result.ok) return fail(result.status, { tokenError: result.message });
		return { issued: { name, token: result.value.token } };
	},
	revokeToken: async (event) => {
		const admin = requireRole(event, 'admin');
		const tokenId = String((await readForm(event.request)).get('tokenId') ?? '');
		if (!/^[0-9a-f-]{36}$/i.test(tokenId)) return fail(400, { tokenError: 'No such token.' });
		const result = await revokeToken(admin, event.params.userId, tokenId, event.getClientAddress());
		if (!result.ok) return fail(result.status, { tokenError: result.message });
		return { revoked: result.value.name };
	},
	reinvite: async (event) => {
		const admin = requireRole(event, 'admin');
		const result = await reinviteUser(admin, event.params.userId, {
			origin: event.url.origin,
			ip: event.getClientAddress()
		});
		if (!result.ok) return fail(result.status, { inviteError: result.message });
		return { invited: result.value.email };
	}
};
