import { fail, redirect } from '@sveltejs/kit';
import { superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { requireRole } from '$lib/server/auth/guard';
import { refuse, validateForm } from '$lib/server/forms';
import { countryAndCurrencyOptions } from '$lib/server/services/form-options';
import { saveProduct } from '$lib/server/services/products';
import { productSchema } from '$lib/schemas/products';
import type { Actions, PageServerLoad } from './$types';

// Returns: form (empty product), countries, currencies.
export const load: PageServerLoad = async (event) => {
	requireRole(event, 'admin', 'coordinator');
	return {
		form: await superValidate({ currency: 'USD', hasPackaging: true }, zod4(productSchema), {
			errors: false
		}),
		...countryAndCurrencyOptions()
	};
};

export const actions: Actions = {
	default: async (event) => {
		const user = requireRole(event, 'admin', 'coordinator');
		const form = await validateForm(event.request, zod4(productSchema));
		if (!form.valid) return fail(400, { form });
		const result = await saveProduct(user, null, form.data, event.getClientAddress());
		if (!result.ok) return refuse(form, result);
		redirect(303, `/products/${result.value.id}`);
	}
};
