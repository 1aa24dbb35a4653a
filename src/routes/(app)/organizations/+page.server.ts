import { requireStaff } from '$lib/server/auth/guard';
import { listOrganizations } from '$lib/server/services/organizations';
import { countryName } from '$lib/reference/countries';
import type { PageServerLoad } from './$types';

// Returns: organizations (every organization, for the exporter's staff).
export const load: PageServerLoad = async (event) => {
	const user = requireStaff(event);
	const organizations = (await listOrganizations(user)).map((o) => ({
		...o,
		countryName: countryName(o.countryCode) ?? o.countryCode
	}));
	return { organizations };
};
