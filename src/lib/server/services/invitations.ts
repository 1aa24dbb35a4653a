/**
 * Invitations: an administrator adds a person without a password; Landfall e-mails a single-use
 * set-password link that expires after INVITATION_HOURS. Only the token's SHA-256 is stored
 * (table user_invitations, migration 017), so a copy of the database opens no account.
 */
import { createHash, randomBytes } from 'node:crypto';
import { QueryTypes, type Transaction } from 'sequelize';
import { ROLE_LABELS } from '../../roles';
import type { CreateUserInput } from '../../schemas/users';
import { hashPassword } from '../auth/password';
import type { SessionUser } from '../auth/session-user';
import { Organization, User } from '../db/models';
import { enqueue } from '../mail/outbox';
import { mailMoment } from '../mail/origin';
import { invitationMail } from '../mail/templates/messages';
import { recordAudit } from './audit';
import { refused, type ServiceResult } from './result';
import { createUser, type UserRow } from './users';

export const INVITATION_HOURS = 72;

const sequelize = () => User.sequelize!;
const digest = (token: string) => createHash('sha256').update(token).digest('hex');

/** Writes a fresh invitation for `user` (earlier unused links stop working) and queues the mail. */
async function issueInvitation(
	transaction: Transaction,
	actor: SessionUser,
	user: Pick<User, 'id' | 'name' | 'email' | 'role' | 'organizationId'>,
	origin: string,
	hours: number
): Promise<void> {
	const token = randomBytes(32).toString('base64url');
	await sequelize().query(
		`UPDATE user_invitations SET used_at = now() WHERE user_id = :userId AND used_at IS NULL`,
		{ transaction, replacements: { userId: user.id } }
	);
	const [row] = await sequelize().query<{ id: string; expiresAt: Date }>(
		`INSERT INTO user_invitations (user_id, token_hash, expires_at, invited_by)
		 VALUES (:userId, :hash, now() + make_interval(hours => :hours), :actor)
		 RETURNING id, expires_at AS "expiresAt"`,
		{
			type: QueryTypes.SELECT,
			transaction,
			replacements: { userId: user.id, hash: digest(token), hours, actor: actor.id }
		}
	);
	const organization = await Organization.findByPk(user.organizationId, { transaction });
	await enqueue(transaction, {
		kind: 'invitation',
		recipient: user.email,
		dedupeKey: `invitation:${row!.id}`,
		...invitationMail({
			origin,
			name: user.name,
			inviter: actor.name,
			organization: organization?.name ?? '',
			role: ROLE_LABELS[user.role],
			link: `${origin}/set-password/${token}`,
			expires: mailMoment(new Date(row!.expiresAt))
		})
	});
}

/** Adds a person and e-mails them a set-password link, in one transaction. */
export async function inviteUser(
	actor: SessionUser,
	input: Omit<CreateUserInput, 'password'>,
	context: { origin: string; ip: string | null },
	hours = INVITATION_HOURS
): Promise<ServiceResult<UserRow>> {
	if (actor.role !== 'admin') return refused(403, 'Only administrators invite people.');
	return createUser(actor, input, context.ip, (created, transaction) =>
		issueInvitation(transaction, actor, created, context.origin, hours)
	);
}

/** Sends a new link to someone who has not chosen a password yet (or lost the mail). */
export async function reinviteUser(
	actor: SessionUser,
	userId: string,
	context: { origin: string; ip: string | null }
): Promise<ServiceResult<{ email: string }>> {
	if (actor.role !== 'admin') return refused(403, 'Only administrators invite people.');
	const user = await User.findByPk(userId);
	if (!user) return refused(404, 'No person with this id.');
	if (user.disabled) return refused(409, 'This sign-in is disabled: enable it first.');
	await sequelize().transaction(async (transaction) => {
		await issueInvitation(transaction, actor, user, context.origin, INVITATION_HOURS);
		await recordAudit(
			{
				actorUserId: actor.id,
				action: 'user.invite',
				entity: 'user',
				entityId: user.id,
				ip: context.ip
			},
			transaction
		);
	});
	return { ok: true, value: { email: user.email } };
}

interface Pending {
	invitationId: string;
	userId: string;
	name: string;
	email: string;
}

const PENDING = `SELECT i.id AS "invitationId", u.id AS "userId", u.name, u.email
	FROM user_invitations i JOIN users u ON u.id = i.user_id
	WHERE i.token_hash = :hash AND i.used_at IS NULL AND i.expires_at > now() AND NOT u.disabled`;

/** Who a set-password link is for, or null when it is unknown, used, expired or disabled. */
export async function pendingInvitation(
	token: string
): Promise<Omit<Pending, 'invitationId'> | null> {
	if (!/^[\w-]{20,100}$/.test(token)) return null;
	const [row] = await sequelize().query<Pending>(PENDING, {
		type: QueryTypes.SELECT,
		replacements: { hash: digest(token) }
	});
	return row ? { userId: row.userId, name: row.name, email: row.email } : null;
}

/** Sets the password and uses the link up, once; a second use (even a concurrent one) is refused. */
export async function acceptInvitation(
	token: string,
	password: string,
	ip: string | null
): Promise<ServiceResult<{ email: string }>> {
	const gone = refused(
		404,
		'This link is no longer valid: it was used already or has expired. Ask your administrator for a new one.'
	);
	if (!/^[\w-]{20,100}$/.test(token)) return gone;
	const passwordHash = await hashPassword(password);
	const email = await sequelize().transaction(async (transaction) => {
		const [row] = await sequelize().query<Pending>(`${PENDING} FOR UPDATE OF i`, {
			type: QueryTypes.SELECT,
			transaction,
			replacements: { hash: digest(token) }
		});
		if (!row) return null;
		await sequelize().query(`UPDATE user_invitations SET used_at = now() WHERE id = :id`, {
			transaction,
			replacements: { id: row.invitationId }
		});
		await sequelize().query(
			`UPDATE users SET password_hash = :passwordHash, version = version + 1, updated_at = now()
			  WHERE id = :userId`,
			{ transaction, replacements: { passwordHash, userId: row.userId } }
		);
		await recordAudit(
			{
				actorUserId: row.userId,
				action: 'user.set_password',
				entity: 'user',
				entityId: row.userId,
				ip
			},
			transaction
		);
		return row.email;
	});
	return email ? { ok: true, value: { email } } : gone;
}
