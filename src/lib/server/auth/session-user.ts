import type { OrganizationKind, Role } from '../../roles';
import { QueryTypes } from 'sequelize';
import { User } from '../db/models';

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
	// One plain query: this runs on every request, and the model layer's overhead showed in
	// the list benchmark's profile.
	const [row] = await User.sequelize!.query<SessionUser>(
		`SELECT u.id, u.email, u.name, u.role, o.id AS "organizationId",
		        o.name AS "organizationName", o.kind AS "organizationKind"
		   FROM users u JOIN organizations o ON o.id = u.organization_id
		  WHERE u.id = :userId AND NOT u.disabled`,
		{ type: QueryTypes.SELECT, replacements: { userId } }
	);
	return row ?? null;
}
