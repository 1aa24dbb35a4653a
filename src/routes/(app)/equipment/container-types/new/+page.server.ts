import { containerPages } from '$lib/server/equipment-pages';
import type { Actions, PageServerLoad } from './$types';

// Returns: an empty form for a custom container type.
export const load: PageServerLoad = (event) => containerPages.loadNew(event);

export const actions: Actions = {
	default: (event) => containerPages.save(event, null)
};
