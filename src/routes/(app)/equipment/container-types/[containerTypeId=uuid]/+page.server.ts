import { containerPages } from '$lib/server/equipment-pages';
import type { Actions, PageServerLoad } from './$types';

// Returns: row, stored (figures as saved), reference (data file figures and sources), form.
export const load: PageServerLoad = (event) =>
	containerPages.load(event, event.params.containerTypeId);

export const actions: Actions = {
	default: (event) => containerPages.save(event, event.params.containerTypeId)
};
