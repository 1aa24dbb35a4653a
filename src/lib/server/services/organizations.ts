import { Op } from 'sequelize';
import type { SessionUser } from '../auth/session-user';
import { organizationScope } from '../auth/guard';
import { Organization, OrganizationAddress, OrganizationTaxId } from '../db/models';

export interface OrganizationSummary {
	id: string;
	name: string;
	kind: Organization['kind'];
	countryCode: string;
}

export interface OrganizationDetail extends OrganizationSummary {
	addresses: {
		id: string;
		purpose: string;
		label: string | null;
		line1: string;
		line2: string | null;
		city: string;
		postalCode: string | null;
		region: string | null;
		countryCode: string;
	}[];
	taxIds: { id: string; type: string; value: string; countryCode: string | null }[];
}

const summaryAttributes = ['id', 'name', 'kind', 'countryCode'] as const;

/** Organizations the user may see: all for staff, only their own for customers and brokers. */
export async function listOrganizations(user: SessionUser): Promise<OrganizationSummary[]> {
	return (await Organization.findAll({
		attributes: [...summaryAttributes],
		where: organizationScope(user, 'id'),
		order: [['name', 'ASC']],
		raw: true
	})) as OrganizationSummary[];
}

/** One organization, or null when it does not exist or is not the user's to see. */
export async function getOrganization(
	user: SessionUser,
	id: string
): Promise<OrganizationDetail | null> {
	const organization = await Organization.findOne({
		attributes: [...summaryAttributes],
		// Op.and, not a spread: the scope's `id` must not overwrite the requested one.
		where: { [Op.and]: [{ id }, organizationScope(user, 'id')] },
		include: [
			{ model: OrganizationAddress, as: 'addresses' },
			{ model: OrganizationTaxId, as: 'taxIds' }
		],
		order: [
			[{ model: OrganizationAddress, as: 'addresses' }, 'createdAt', 'ASC'],
			[{ model: OrganizationTaxId, as: 'taxIds' }, 'type', 'ASC']
		]
	});
	if (!organization) return null;
	const plain = organization.get({ plain: true }) as unknown as OrganizationSummary & {
		addresses: (OrganizationDetail['addresses'][number] & Record<string, unknown>)[];
		taxIds: (OrganizationDetail['taxIds'][number] & Record<string, unknown>)[];
	};
	return {
		id: plain.id,
		name: plain.name,
		kind: plain.kind,
		countryCode: plain.countryCode,
		addresses: [...plain.addresses].sort(byPurpose).map((a) => ({
			id: a.id,
			purpose: a.purpose,
			label: a.label,
			line1: a.line1,
			line2: a.line2,
			city: a.city,
			postalCode: a.postalCode,
			region: a.region,
			countryCode: a.countryCode
		})),
		taxIds: plain.taxIds.map((t) => ({
			id: t.id,
			type: t.type,
			value: t.value,
			countryCode: t.countryCode
		}))
	};
}

// Registered address first, then the others in a fixed order.
const PURPOSE_ORDER = ['registered', 'office', 'billing', 'delivery', 'factory'];
function byPurpose(a: { purpose: string }, b: { purpose: string }): number {
	return PURPOSE_ORDER.indexOf(a.purpose) - PURPOSE_ORDER.indexOf(b.purpose);
}
