import { requireRole } from '$lib/server/auth/guard';
import type { LayoutServerLoad } from './$types';

// The whole admin area is for administrators; each page and action checks again.
export const load: LayoutServerLoad = (event) => {
	requireRole(event, 'admin');
	return {};
};
