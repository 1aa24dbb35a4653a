import { error } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/guard';
import { getOrganization } from '$lib/server/services/organizations';
import { countryName } from '$lib/reference/countries';
import { taxIdentifierLabel } from '$lib/reference/tax-identifiers';
import type { PageServerLoad } from './$types';

// Returns: organization (with addresses and tax identifiers); another organization's id is a 404.
export const load: PageServerLoad = async (event) => {
	const user = requireUser(event);
	const organization = await getOrganization(user, event.params.organizationId);
	if (!organization) error(404, { message: 'No organization with this id is visible to you.' });
	return {
		organization: {
			...organization,
			countryName: countryName(organization.countryCode) ?? organization.countryCode,
			addresses: organization.addresses.map((a) => ({
				...a,
				countryName: countryName(a.countryCode) ?? a.countryCode
			})),
			taxIds: organization.taxIds.map((t) => ({ ...t, label: taxIdentifierLabel(t.type) }))
		}
	};
};
