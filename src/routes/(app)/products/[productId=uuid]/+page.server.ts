import { error, fail } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { requireRole } from '$lib/server/auth/guard';
import { refuse, validateForm } from '$lib/server/forms';
import {
	retireSupportingAction,
	supportingDocumentsData,
	uploadSupportingAction
} from '$lib/server/supporting-document-actions';
import { countryAndCurrencyOptions } from '$lib/server/services/form-options';
import { productFormValues } from '$lib/server/services/product-form';
import { getProduct, saveProduct } from '$lib/server/services/products';
import { productSchema } from '$lib/schemas/products';
import { productLithiumView } from '$lib/lithium-view';
import { formatHsCode, hsParts } from '$lib/trade/hs-code';
import type { Actions, PageServerLoad } from './$types';

// Returns: product, hs (chapter/heading/subheading), canEdit, form, supporting (documents on
// file and the upload form), countries, currencies.
export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'admin', 'coordinator', 'finance', 'broker');
	const product = await getProduct(event.params.productId);
	if (!product) error(404, { message: 'No such product.' });
	return {
		product,
		hs: { formatted: formatHsCode(product.hsCode), parts: hsParts(product.hsCode) },
		canEdit: user.role === 'admin' || user.role === 'coordinator',
		form: await superValidate(productFormValues(product), zod4(productSchema), { errors: false }),
		supporting: await supportingDocumentsData(event, { productId: product.id }),
		lithium: productLithiumView(product),
		...countryAndCurrencyOptions()
	};
};

export const actions: Actions = {
	uploadSupporting: (event) => uploadSupportingAction(event, { productId: event.params.productId }),
	retireSupporting: (event) => retireSupportingAction(event, { productId: event.params.productId }),
	save: async (event) => {
		const user = requireRole(event, 'admin', 'coordinator');
		const form = await validateForm(event.request, zod4(productSchema));
		if (!form.valid) return fail(400, { form });
		const result = await saveProduct(
			user,
			event.params.productId,
			form.data,
			event.getClientAddress()
		);
		if (!result.ok) return refuse(form, result);
		form.data = { ...form.data, ...productFormValues(result.value) };
		return message(form, { tone: 'ok', text: 'Saved.' });
	}
};
