import { requireUser } from '$lib/server/auth/guard';
import { attentionFor } from '$lib/server/services/attention';
import { organizationHeadcounts } from '$lib/server/services/dashboard';
import { countryName } from '$lib/reference/countries';
import type { PageServerLoad } from './$types';

// Returns: attention (departing soon, drafts missing data, or the viewer's open shipments),
// organizations (users per role, scoped to the viewer).
export const load: PageServerLoad = async (event) => {
	const user = requireUser(event);
	const organizations = (await organizationHeadcounts(user)).map((o) => ({
		...o,
		countryName: countryName(o.countryCode) ?? o.countryCode
	}));
	return { organizations, attention: await attentionFor(user) };
};
