import { palletPages } from '$lib/server/equipment-pages';
import type { Actions, PageServerLoad } from './$types';

// Returns: row, stored (figures as saved), reference (data file figures and sources), form.
export const load: PageServerLoad = (event) => palletPages.load(event, event.params.palletTypeId);

export const actions: Actions = {
	default: (event) => palletPages.save(event, event.params.palletTypeId)
};
