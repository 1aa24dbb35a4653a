import { createHash, randomBytes } from 'node:crypto';
import type { SessionUser } from '../auth/session-user';
import { loadSessionUser } from '../auth/session-user';
import { ApiToken, User } from '../db/models';
import { recordAudit } from './audit';
import type { ServiceResult } from './result';

const PREFIX = 'lf_';

export function hashToken(token: string): string {
	return createHash('sha256').update(token).digest('hex');
}

export interface ApiTokenRow {
	id: string;
	name: string;
	prefix: string;
	createdAt: string;
	lastUsedAt: string | null;
	revokedAt: string | null;
}

const toRow = (t: ApiToken): ApiTokenRow => ({
	id: t.id,
	name: t.name,
	prefix: t.prefix,
	createdAt: t.createdAt.toISOString(),
	lastUsedAt: t.lastUsedAt?.toISOString() ?? null,
	revokedAt: t.revokedAt?.toISOString() ?? null
});

export async function listTokens(userId: string): Promise<ApiTokenRow[]> {
	return (await ApiToken.findAll({ where: { userId }, order: [['createdAt', 'DESC']] })).map(toRow);
}

/** Issues a token for a user; the plain token is returned this once and never stored. */
export async function issueToken(
	admin: SessionUser,
	userId: string,
	name: string,
	ip: string | null
): Promise<ServiceResult<{ token: string; row: ApiTokenRow }>> {
	if (!(await User.findByPk(userId))) {
		return { ok: false, status: 404, message: 'No such user.', fieldErrors: {} };
	}
	const token = PREFIX + randomBytes(32).toString('base64url');
	const row = await ApiToken.sequelize!.transaction(async (transaction) => {
		const created = await ApiToken.create(
			{
				userId,
				name,
				tokenHash: hashToken(token),
				prefix: token.slice(0, PREFIX.length + 6),
				createdBy: admin.id,
				lastUsedAt: null,
				revokedAt: null
			},
			{ transaction }
		);
		await recordAudit(
			{
				actorUserId: admin.id,
				action: 'api_token.issue',
				entity: 'user',
				entityId: userId,
				after: { tokenId: created.id, name },
				ip
			},
			transaction
		);
		return created;
	});
	return { ok: true, value: { token, row: toRow(row) } };
}

export async function revokeToken(
	admin: SessionUser,
	userId: string,
	tokenId: string,
	ip: string | null
): Promise<ServiceResult<ApiTokenRow>> {
	const token = await ApiToken.findOne({ where: { id: tokenId, userId } });
	if (!token) return { ok: false, status: 404, message: 'No such token.', fieldErrors: {} };
	if (!token.revokedAt) {
		await token.update({ revokedAt: new Date() });
		await recordAudit({
			actorUserId: admin.id,
			action: 'api_token.revoke',
			entity: 'user',
			entityId: userId,
			before: { tokenId, name: token.name },
			ip
		});
	}
	return { ok: true, value: toRow(token) };
}

/** The user behind a bearer token, or null: unknown, revoked, or the user is disabled. */
export async function userForToken(token: string): Promise<SessionUser | null> {
	if (!token.startsWith(PREFIX) || token.length > 200) return null;
	const row = await ApiToken.findOne({ where: { tokenHash: hashToken(token), revokedAt: null } });
	if (!row) return null;
	const user = await loadSessionUser(row.userId);
	if (user) await ApiToken.update({ lastUsedAt: new Date() }, { where: { id: row.id } });
	return user;
}
