import { requireUser } from '$lib/server/auth/guard';
import { organizationHeadcounts } from '$lib/server/services/dashboard';
import { countryName } from '$lib/reference/countries';
import type { PageServerLoad } from './$types';

// Returns: organizations (users per role, scoped to the viewer), totals per role.
export const load: PageServerLoad = async (event) => {
	const user = requireUser(event);
	const organizations = (await organizationHeadcounts(user)).map((o) => ({
		...o,
		countryName: countryName(o.countryCode) ?? o.countryCode
	}));
	return { organizations };
};
