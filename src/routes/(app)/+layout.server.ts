import { requireUser } from '$lib/server/auth/guard';
import { navigationFor } from '$lib/roles';
import type { LayoutServerLoad } from './$types';

// Returns: user (the signed-in person), nav (the links this role sees).
export const load: LayoutServerLoad = (event) => {
	const user = requireUser(event);
	return { user, nav: navigationFor(user.role, user.organizationId) };
};
