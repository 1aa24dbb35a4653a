import { palletPages } from '$lib/server/equipment-pages';
import type { Actions, PageServerLoad } from './$types';

// Returns: an empty form for a custom pallet type.
export const load: PageServerLoad = (event) => palletPages.loadNew(event);

export const actions: Actions = {
	default: (event) => palletPages.save(event, null)
};
