import { fail } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { canEditMasterData } from '$lib/roles';
import { requireRole } from '$lib/server/auth/guard';
import { refuse, validateForm } from '$lib/server/forms';
import { countryAndCurrencyOptions } from '$lib/server/services/form-options';
import { createParty, listParties } from '$lib/server/services/master-data';
import { partySchema } from '$lib/schemas/master-data';
import type { Actions, PageServerLoad } from './$types';

// Returns: parties (consignees, notify parties…), canEdit, form (add a party), countries.
export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'admin', 'coordinator', 'finance', 'broker');
	return {
		parties: await listParties(),
		canEdit: canEditMasterData(user.role),
		form: await superValidate(zod4(partySchema)),
		countries: countryAndCurrencyOptions().countries
	};
};

export const actions: Actions = {
	default: async (event) => {
		const user = requireRole(event, 'admin', 'coordinator');
		const form = await validateForm(event.request, zod4(partySchema));
		if (!form.valid) return fail(400, { form });
		const result = await createParty(user, form.data, event.getClientAddress());
		if (!result.ok) return refuse(form, result);
		return message(form, { tone: 'ok', text: `${form.data.name} added.` });
	}
};
