import { randomBytes } from 'node:crypto';
import { OptimisticLockError, UniqueConstraintError, type Transaction } from 'sequelize';
import { ROLE_LABELS, ROLE_ORGANIZATION_KIND, ORGANIZATION_KIND_LABELS } from '../../roles';
import type { CreateUserInput, UpdateUserInput } from '../../schemas/users';
import { hashPassword } from '../auth/password';
import type { SessionUser } from '../auth/session-user';
import { Organization, User } from '../db/models';
import { recordAudit } from './audit';
import { invalid, type ServiceResult } from './result';

export type { FieldErrors, ServiceResult } from './result';

export interface UserRow {
	id: string;
	name: string;
	email: string;
	role: User['role'];
	disabled: boolean;
	organizationId: string;
	organizationName: string;
	lastSignInAt: string | null;
	version: number;
}

function toRow(user: User & { organization?: Organization }): UserRow {
	return {
		id: user.id,
		name: user.name,
		email: user.email,
		role: user.role,
		disabled: user.disabled,
		organizationId: user.organizationId,
		organizationName: user.organization?.name ?? '',
		lastSignInAt: user.lastSignInAt?.toISOString() ?? null,
		version: user.version
	};
}

/** What the audit trail keeps of a user: never the password hash. */
function auditView(user: User) {
	return {
		name: user.name,
		email: user.email,
		role: user.role,
		organizationId: user.organizationId,
		disabled: user.disabled
	};
}

const withOrganization = { include: [{ model: Organization, as: 'organization' }] };

export async function listUsers(): Promise<UserRow[]> {
	const users = await User.findAll({ ...withOrganization, order: [['name', 'ASC']] });
	return users.map(toRow);
}

export async function getUser(id: string): Promise<UserRow | null> {
	const user = await User.findByPk(id, withOrganization);
	return user ? toRow(user) : null;
}

async function roleFitsOrganization(role: User['role'], organizationId: string) {
	const organization = await Organization.findByPk(organizationId);
	if (!organization) return 'That organization does not exist.';
	const needed = ROLE_ORGANIZATION_KIND[role];
	if (organization.kind !== needed) {
		return `A ${ROLE_LABELS[role].toLowerCase()} must belong to an organization of kind “${ORGANIZATION_KIND_LABELS[needed]}”; ${organization.name} is “${ORGANIZATION_KIND_LABELS[organization.kind]}”.`;
	}
	return null;
}

/**
 * Adds a person. Without a password (an invitation) the account gets a random one nobody knows;
 * `onCreated` runs in the same transaction (e.g. to queue the invitation e-mail).
 */
export async function createUser(
	actor: SessionUser,
	input: Omit<CreateUserInput, 'password'> & { password?: string },
	ip: string | null,
	onCreated?: (user: User, transaction: Transaction) => Promise<void>
): Promise<ServiceResult<UserRow>> {
	const mismatch = await roleFitsOrganization(input.role, input.organizationId);
	if (mismatch) return invalid({ organizationId: mismatch });
	const passwordHash = await hashPassword(input.password ?? randomBytes(32).toString('base64url'));
	try {
		const user = await User.sequelize!.transaction(async (transaction) => {
			const created = await User.create(
				{
					name: input.name,
					email: input.email,
					role: input.role,
					organizationId: input.organizationId,
					passwordHash
				},
				{ transaction }
			);
			await recordAudit(
				{
					actorUserId: actor.id,
					action: 'user.create',
					entity: 'user',
					entityId: created.id,
					after: auditView(created),
					ip
				},
				transaction
			);
			await onCreated?.(created, transaction);
			return created;
		});
		return { ok: true, value: (await getUser(user.id))! };
	} catch (error) {
		if (error instanceof UniqueConstraintError) {
			return invalid({ email: 'Someone already signs in with this e-mail address.' });
		}
		throw error;
	}
}

export async function updateUser(
	actor: SessionUser,
	id: string,
	input: UpdateUserInput,
	ip: string | null
): Promise<ServiceResult<UserRow>> {
	let outcome: ServiceResult<null>;
	try {
		outcome = await User.sequelize!.transaction(async (transaction) => {
			const user = await User.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
			if (!user) return { ok: false, status: 404, message: 'No such user.', fieldErrors: {} };
			if (user.version !== input.version) return conflict();
			if (user.id === actor.id && (input.disabled || input.role !== 'admin')) {
				const field = input.disabled ? 'disabled' : 'role';
				return invalid(
					{ [field]: 'You cannot lock yourself out: ask another administrator.' },
					'You cannot remove your own access.'
				);
			}
			const mismatch = await roleFitsOrganization(input.role, user.organizationId);
			if (mismatch) return invalid({ role: mismatch });

			const before = auditView(user);
			user.set({ name: input.name, role: input.role, disabled: input.disabled });
			if (!user.changed()) return { ok: true, value: null };
			await user.save({ transaction });
			await recordAudit(
				{
					actorUserId: actor.id,
					action: auditAction(before, input),
					entity: 'user',
					entityId: id,
					before,
					after: auditView(user),
					ip
				},
				transaction
			);
			return { ok: true, value: null };
		});
	} catch (error) {
		if (error instanceof OptimisticLockError) return conflict();
		throw error;
	}
	return outcome.ok ? { ok: true, value: (await getUser(id))! } : outcome;
}

function conflict() {
	return {
		ok: false as const,
		status: 409 as const,
		message:
			'Someone else changed this person while you were editing. Reload to see their change, then apply yours again.',
		fieldErrors: {}
	};
}

function auditAction(before: { disabled: boolean; role: string }, input: UpdateUserInput): string {
	if (before.disabled !== input.disabled) return input.disabled ? 'user.disable' : 'user.enable';
	if (before.role !== input.role) return 'user.role_change';
	return 'user.update';
}
