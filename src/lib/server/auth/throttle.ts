import { Op } from 'sequelize';
import { SignInAttempt } from '../db/models';

// Sign-in throttling, kept in the database so every app process sees the same counts.
export const THROTTLE = {
	windowMinutes: 15,
	/** Failures for one e-mail address (since its last success) before it is refused. */
	maxFailuresPerEmail: 5,
	/** Failures from one client address, whatever the e-mail, before it is refused. */
	maxFailuresPerIp: 30
} as const;

export interface ThrottleState {
	throttled: boolean;
	retryAfterSeconds: number;
}

async function failuresSince(
	where: { email: string } | { ip: string },
	since: Date,
	limit: number
): Promise<Date[]> {
	const rows = await SignInAttempt.findAll({
		attributes: ['attemptedAt'],
		where: { ...where, succeeded: false, attemptedAt: { [Op.gt]: since } },
		order: [['attemptedAt', 'DESC']],
		limit
	});
	return rows.map((row) => row.attemptedAt);
}

function stateFrom(failures: Date[], limit: number, now: Date): ThrottleState {
	if (failures.length < limit) return { throttled: false, retryAfterSeconds: 0 };
	// Refused until the oldest of the counted failures leaves the window.
	const oldest = failures[limit - 1] as Date;
	const until = oldest.getTime() + THROTTLE.windowMinutes * 60_000;
	return {
		throttled: true,
		retryAfterSeconds: Math.max(1, Math.ceil((until - now.getTime()) / 1000))
	};
}

export async function throttleState(email: string, ip: string | null): Promise<ThrottleState> {
	const now = new Date();
	const windowStart = new Date(now.getTime() - THROTTLE.windowMinutes * 60_000);
	const lastSuccess = await SignInAttempt.max<Date | null, SignInAttempt>('attemptedAt', {
		where: { email, succeeded: true }
	});
	const emailSince = lastSuccess && lastSuccess > windowStart ? lastSuccess : windowStart;
	const byEmail = stateFrom(
		await failuresSince({ email }, emailSince, THROTTLE.maxFailuresPerEmail),
		THROTTLE.maxFailuresPerEmail,
		now
	);
	if (byEmail.throttled || !ip) return byEmail;
	return stateFrom(
		await failuresSince({ ip }, windowStart, THROTTLE.maxFailuresPerIp),
		THROTTLE.maxFailuresPerIp,
		now
	);
}

export async function recordAttempt(attempt: {
	email: string;
	ip: string | null;
	succeeded: boolean;
}): Promise<void> {
	await SignInAttempt.create(attempt);
}
