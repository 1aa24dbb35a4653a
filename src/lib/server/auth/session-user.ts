import type { OrganizationKind, Role } from '../../roles';
import { Organization, User } from '../db/models';

/** The signed-in person as every load, action and endpoint sees it (event.locals.user). */
export interface SessionUser {
	id: string;
	email: string;
	name: string;
	role: Role;
	organizationId: string;
	organizationName: string;
	organizationKind: OrganizationKind;
}

/**
 * Reads the user behind a session from the database on every request, so that disabling a user
 * or changing a role takes effect at once, not when the session cookie expires.
 */
export async function loadSessionUser(userId: string): Promise<SessionUser | null> {
	const user = await User.findByPk(userId, {
		include: [{ model: Organization, as: 'organization', attributes: ['id', 'name', 'kind'] }]
	});
	if (!user || user.disabled) return null;
	const organization = (user as User & { organization: Organization }).organization;
	return {
		id: user.id,
		email: user.email,
		name: user.name,
		role: user.role,
		organizationId: organization.id,
		organizationName: organization.name,
		organizationKind: organization.kind
	};
}
