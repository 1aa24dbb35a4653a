import { requireUser } from '$lib/server/auth/guard';
import { attentionFor } from '$lib/server/services/attention';
import { organizationHeadcounts } from '$lib/server/services/dashboard';
import { recentPapers } from '$lib/server/services/recent-papers';
import { isStaff } from '$lib/roles';
import { countryName } from '$lib/reference/countries';
import type { PageServerLoad } from './$types';

// Returns: attention (departing soon, drafts missing data, or the viewer's open shipments),
// organizations (users per role, scoped to the viewer), and for customers and brokers the
// latest papers of their shipments.
export const load: PageServerLoad = async (event) => {
	const user = requireUser(event);
	const organizations = (await organizationHeadcounts(user)).map((o) => ({
		...o,
		countryName: countryName(o.countryCode) ?? o.countryCode
	}));
	const [attention, papers] = await Promise.all([
		attentionFor(user),
		isStaff(user.role) ? Promise.resolve([]) : recentPapers(user)
	]);
	return { organizations, attention, papers };
};
