import { error, fail } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { REFERENCE_DATA_EDITORS, REFERENCE_DATA_READERS, canEditReferenceData } from '$lib/roles';
import { settingsSchema } from '$lib/schemas/landed-cost-settings';
import { requireRole } from '$lib/server/auth/guard';
import { refuse, validateForm } from '$lib/server/forms';
import { countryAndCurrencyOptions } from '$lib/server/services/form-options';
import {
	getSettings,
	listEmissionFactors,
	saveSettings,
	settingsFormValues
} from '$lib/server/services/reference-data/settings';
import type { Actions, PageServerLoad } from './$types';

// Returns: settings (the stored row), canEdit, form, factors (emission factors), countries,
// currencies, asOf (the settings' last change).
export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...REFERENCE_DATA_READERS);
	const settings = await getSettings();
	if (!settings)
		error(404, { message: 'The landed-cost settings are not set up yet.', code: 'not_found' });
	return {
		settings,
		canEdit: canEditReferenceData(user.role),
		form: await superValidate(settingsFormValues(settings), zod4(settingsSchema), {
			errors: false
		}),
		factors: await listEmissionFactors(),
		...countryAndCurrencyOptions(),
		asOf: settings.updatedAt
	};
};

export const actions: Actions = {
	default: async (event) => {
		const user = requireRole(event, ...REFERENCE_DATA_EDITORS);
		const form = await validateForm(event.request, zod4(settingsSchema));
		if (!form.valid) return fail(400, { form });
		const result = await saveSettings(user, form.data, event.getClientAddress());
		if (!result.ok) return refuse(form, result);
		form.data.version = result.value.version;
		return message(form, { tone: 'ok', text: 'Settings saved.' });
	}
};
