import { error, fail } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { canEditMasterData } from '$lib/roles';
import { requireRole } from '$lib/server/auth/guard';
import { refuse, validateForm } from '$lib/server/forms';
import { lifecycleActions } from '$lib/server/master-record-actions';
import { countryAndCurrencyOptions } from '$lib/server/services/form-options';
import { getParty, saveParty } from '$lib/server/services/master-data';
import { partySchema } from '$lib/schemas/master-data';
import type { Actions, PageServerLoad } from './$types';

// Returns: party (with the shipments that name it), canEdit, form, countries.
export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'admin', 'coordinator', 'finance', 'broker');
	const party = await getParty(event.params.partyId);
	if (!party) error(404, { message: 'No such party.' });
	const text = (v: string | null) => v ?? '';
	const values = {
		name: party.name,
		line1: party.line1,
		line2: text(party.line2),
		city: party.city,
		postalCode: text(party.postalCode),
		region: text(party.region),
		countryCode: party.countryCode,
		contactName: text(party.contactName),
		email: text(party.email),
		phone: text(party.phone),
		taxIds: party.taxIds.map((t) => `${t.type}: ${t.value}`).join('\n'),
		version: party.version
	};
	return {
		party,
		canEdit: canEditMasterData(user.role),
		form: await superValidate(values, zod4(partySchema)),
		countries: countryAndCurrencyOptions().countries
	};
};

export const actions: Actions = {
	save: async (event) => {
		const user = requireRole(event, 'admin', 'coordinator');
		const form = await validateForm(event.request, zod4(partySchema));
		if (!form.valid) return fail(400, { form });
		const result = await saveParty(user, event.params.partyId, form.data, event.getClientAddress());
		if (!result.ok) return refuse(form, result);
		form.data.version += 1;
		return message(form, { tone: 'ok', text: 'Saved.' });
	},
	...lifecycleActions('party')
};
