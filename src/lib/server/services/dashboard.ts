import { QueryTypes } from 'sequelize';
import { isStaff, ROLES, type Role } from '../../roles';
import type { SessionUser } from '../auth/session-user';
import { Organization } from '../db/models';

export interface OrganizationHeadcount {
	id: string;
	name: string;
	kind: Organization['kind'];
	countryCode: string;
	/** Enabled users per role. */
	byRole: Record<Role, number>;
	disabled: number;
}

/** Users per organization and role, straight from the database; scoped for external roles. */
export async function organizationHeadcounts(user: SessionUser): Promise<OrganizationHeadcount[]> {
	const rows = await Organization.sequelize!.query<{
		id: string;
		name: string;
		kind: Organization['kind'];
		countryCode: string;
		role: Role | null;
		enabled: string;
		disabled: string;
	}>(
		`SELECT o.id, o.name, o.kind, o.country_code AS "countryCode", u.role,
		        count(u.id) FILTER (WHERE NOT u.disabled) AS enabled,
		        count(u.id) FILTER (WHERE u.disabled) AS disabled
		   FROM organizations o LEFT JOIN users u ON u.organization_id = o.id
		  WHERE (:all OR o.id = :organizationId)
		  GROUP BY o.id, u.role
		  ORDER BY o.kind, o.name`,
		{
			type: QueryTypes.SELECT,
			replacements: { all: isStaff(user.role), organizationId: user.organizationId }
		}
	);
	const byId = new Map<string, OrganizationHeadcount>();
	for (const row of rows) {
		let entry = byId.get(row.id);
		if (!entry) {
			entry = {
				id: row.id,
				name: row.name,
				kind: row.kind,
				countryCode: row.countryCode,
				byRole: Object.fromEntries(ROLES.map((r) => [r, 0])) as Record<Role, number>,
				disabled: 0
			};
			byId.set(row.id, entry);
		}
		if (row.role) entry.byRole[row.role] += Number(row.enabled);
		entry.disabled += Number(row.disabled);
	}
	return [...byId.values()];
}
