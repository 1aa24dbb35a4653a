import { fail } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { REFERENCE_DATA_EDITORS, REFERENCE_DATA_READERS, canEditReferenceData } from '$lib/roles';
import { exchangeRateImportSchema, exchangeRateSchema } from '$lib/schemas/reference-data';
import { requireRole } from '$lib/server/auth/guard';
import { refuse, validateForm } from '$lib/server/forms';
import { countryAndCurrencyOptions } from '$lib/server/services/form-options';
import {
	LIST_LIMIT,
	addExchangeRate,
	importExchangeRates,
	listExchangeRates
} from '$lib/server/services/reference-data/exchange-rates';
import type { Actions, PageServerLoad } from './$types';

/** "USD-EUR" from ?pair=…, or null for every pair (anything else is ignored). */
function pairFilter(url: URL) {
	const match = /^([A-Z]{3})-([A-Z]{3})$/.exec(url.searchParams.get('pair') ?? '');
	return match ? { base: match[1]!, quote: match[2]! } : null;
}

// Returns: rates (newest first, at most `limit`), pairs (with counts), pair (the filter), canEdit,
// addForm, importForm, currencies.
export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...REFERENCE_DATA_READERS);
	const pair = pairFilter(event.url);
	const { rows, pairs } = await listExchangeRates(pair);
	return {
		rates: rows,
		pairs,
		pair: pair ? `${pair.base}-${pair.quote}` : '',
		limit: LIST_LIMIT,
		canEdit: canEditReferenceData(user.role),
		addForm: await superValidate(zod4(exchangeRateSchema), { id: 'fx-add' }),
		importForm: await superValidate(zod4(exchangeRateImportSchema), { id: 'fx-import' }),
		currencies: countryAndCurrencyOptions().currencies
	};
};

export const actions: Actions = {
	add: async (event) => {
		const user = requireRole(event, ...REFERENCE_DATA_EDITORS);
		const form = await validateForm(event.request, zod4(exchangeRateSchema), { id: 'fx-add' });
		if (!form.valid) return fail(400, { form });
		const result = await addExchangeRate(user, form.data, event.getClientAddress());
		if (!result.ok) return refuse(form, result);
		const { base, quote, rate, validFrom } = form.data;
		return message(form, { tone: 'ok', text: `${base}/${quote} ${rate} from ${validFrom} added.` });
	},
	import: async (event) => {
		const user = requireRole(event, ...REFERENCE_DATA_EDITORS);
		const form = await validateForm(event.request, zod4(exchangeRateImportSchema), {
			id: 'fx-import'
		});
		if (!form.valid) {
			const sourceError = form.errors.source?.[0];
			return message(
				form,
				{
					tone: 'error',
					text: sourceError
						? `Source note: ${sourceError}`
						: 'Some rates are not valid: choose the file again and check the rows.'
				},
				{ status: 400 }
			);
		}
		const result = await importExchangeRates(user, form.data, event.getClientAddress());
		if (!result.ok) return refuse(form, result);
		const n = result.value.count;
		return message(form, { tone: 'ok', text: `${n} rate${n === 1 ? '' : 's'} imported.` });
	}
};
