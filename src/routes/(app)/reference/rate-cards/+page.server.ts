import { REFERENCE_DATA_READERS, canEditReferenceData } from '$lib/roles';
import { termsTemplate } from '$lib/schemas/rate-cards';
import { TRANSPORT_MODES, type TransportMode } from '$lib/trade/shipment-status';
import { requireRole } from '$lib/server/auth/guard';
import { rateCardPages } from '$lib/server/reference-page-specs';
import { countryAndCurrencyOptions } from '$lib/server/services/form-options';
import { lastChanged } from '$lib/server/services/reference-data/dated-rows';
import {
	containerTypeChoices,
	listRateCards,
	rateCardLanes
} from '$lib/server/services/reference-data/rate-cards';
import type { Actions, PageServerLoad } from './$types';

/** ?mode=…&lane=MYPKG-DEHAM (anything else is ignored). */
function filter(url: URL) {
	const mode = url.searchParams.get('mode') ?? '';
	const lane = url.searchParams.get('lane') ?? '';
	return {
		mode: (TRANSPORT_MODES as readonly string[]).includes(mode) ? (mode as TransportMode) : null,
		lane: /^[A-Z0-9]{2,5}-[A-Z0-9]{2,5}$/.test(lane) ? lane : null
	};
}

// Returns: cards (of the filter), lanes, mode and lane (the filter), canEdit, form (add a card),
// currencies, containerTypes, asOf (the cards' last change).
export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...REFERENCE_DATA_READERS);
	const wanted = filter(event.url);
	return {
		cards: await listRateCards(wanted),
		lanes: await rateCardLanes(),
		mode: wanted.mode ?? '',
		lane: wanted.lane ?? '',
		canEdit: canEditReferenceData(user.role),
		form: await rateCardPages.addForm({ terms: termsTemplate('air') }),
		currencies: countryAndCurrencyOptions().currencies,
		containerTypes: await containerTypeChoices(),
		asOf: await lastChanged(['rate_cards'])
	};
};

export const actions: Actions = { default: rateCardPages.add };
