import { col, fn, where } from 'sequelize';
import { User } from '../db/models';
import { recordAudit } from '../services/audit';
import { verifyAgainstDummy, verifyPassword } from './password';
import { recordAttempt, throttleState } from './throttle';

export type AuthenticateResult =
	| {
			ok: true;
			userId: string;
			email: string;
			name: string;
			role: User['role'];
			organizationId: string;
	  }
	| { ok: false; reason: 'invalid' }
	| { ok: false; reason: 'throttled'; retryAfterSeconds: number };

export function normaliseEmail(email: string): string {
	return email.trim().toLowerCase();
}

/**
 * Checks an e-mail and password. Unknown e-mail, wrong password and disabled account all give
 * 'invalid', so the answer never tells which addresses have accounts.
 */
export async function authenticate(input: {
	email: string;
	password: string;
	ip: string | null;
}): Promise<AuthenticateResult> {
	const email = normaliseEmail(input.email);
	const throttle = await throttleState(email, input.ip);
	if (throttle.throttled) {
		return { ok: false, reason: 'throttled', retryAfterSeconds: throttle.retryAfterSeconds };
	}

	const user = await User.scope('withPassword').findOne({
		where: where(fn('lower', col('email')), email)
	});
	const valid = user
		? (await verifyPassword(user.passwordHash, input.password)) && !user.disabled
		: await verifyAgainstDummy(input.password);

	await recordAttempt({ email, ip: input.ip, succeeded: valid });
	if (!valid || !user) return { ok: false, reason: 'invalid' };

	// Static update: it leaves the optimistic-lock version alone, so a sign-in never makes an
	// administrator's open edit form stale.
	await User.update({ lastSignInAt: new Date() }, { where: { id: user.id }, silent: true });
	await recordAudit({
		actorUserId: user.id,
		action: 'auth.sign_in',
		entity: 'user',
		entityId: user.id,
		ip: input.ip
	});
	return {
		ok: true,
		userId: user.id,
		email: user.email,
		name: user.name,
		role: user.role,
		organizationId: user.organizationId
	};
}
