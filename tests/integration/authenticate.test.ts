// authenticate() against the real database: answers, throttling, and what a sign-in records.
// Every test signs in with its own users and addresses; the demo users are only read, and the one
// demo account tried (the disabled one) only gains a failed attempt.
import { col, fn, Op, where } from 'sequelize';
import { describe, expect, it } from 'vitest';
import { authenticate, type AuthenticateResult } from '$lib/server/auth/authenticate';
import { hashPassword } from '$lib/server/auth/password';
import { THROTTLE } from '$lib/server/auth/throttle';
import { AuditEvent, SignInAttempt, User } from '$lib/server/db/models';
import { createOwnUser, DEMO_PASSWORD, freshIp, uniqueEmail } from './db';

const INVALID: AuthenticateResult = { ok: false, reason: 'invalid' };
const WINDOW_SECONDS = THROTTLE.windowMinutes * 60;

async function failTimes(count: number, email: string, ip: string | null) {
	const results: AuthenticateResult[] = [];
	for (let i = 0; i < count; i++) {
		results.push(await authenticate({ email, password: 'wrong-password-0000', ip }));
	}
	return results;
}

function expectThrottled(result: AuthenticateResult) {
	expect(result).toMatchObject({ ok: false, reason: 'throttled' });
	if (result.ok || result.reason !== 'throttled') throw new Error('not throttled');
	expect(Number.isInteger(result.retryAfterSeconds)).toBe(true);
	expect(result.retryAfterSeconds).toBeGreaterThanOrEqual(1);
	expect(result.retryAfterSeconds).toBeLessThanOrEqual(WINDOW_SECONDS);
}

describe('authenticate: answers', () => {
	it('signs in with the right password', async () => {
		const user = await createOwnUser();
		const result = await authenticate({
			email: user.email,
			password: user.password,
			ip: await freshIp()
		});
		expect(result).toEqual({
			ok: true,
			userId: user.id,
			email: user.email,
			name: expect.any(String),
			role: 'coordinator',
			organizationId: expect.any(String)
		});
	});

	it('gives the same answer for a wrong password and for an unknown e-mail address', async () => {
		const user = await createOwnUser();
		const ip = await freshIp();
		const wrongPassword = await authenticate({
			email: user.email,
			password: 'not-the-password',
			ip
		});
		const unknownEmail = await authenticate({
			email: uniqueEmail('nobody'),
			password: user.password,
			ip
		});
		expect(wrongPassword).toStrictEqual(INVALID);
		expect(unknownEmail).toStrictEqual(INVALID);
		// Nothing in the answer (not even a key) tells the two apart.
		expect(Object.keys(wrongPassword)).toEqual(Object.keys(unknownEmail));
	});

	it('ignores letter case and surrounding white space in the e-mail address', async () => {
		const user = await createOwnUser({ email: uniqueEmail('Mixed.Case') });
		const ip = await freshIp();
		for (const typed of [
			user.email.toUpperCase(),
			`  ${user.email.toLowerCase()}\t`,
			` ${user.email} `
		]) {
			const result = await authenticate({ email: typed, password: user.password, ip });
			expect(result, typed).toMatchObject({ ok: true, userId: user.id });
		}
	});

	it('does not let the password itself vary in case or white space', async () => {
		const user = await createOwnUser();
		const ip = await freshIp();
		expect(
			await authenticate({ email: user.email, password: user.password.toUpperCase(), ip })
		).toEqual(INVALID);
		expect(await authenticate({ email: user.email, password: ` ${user.password}`, ip })).toEqual(
			INVALID
		);
	});

	it('refuses a disabled account with the right password, as plain "invalid"', async () => {
		const user = await createOwnUser({ disabled: true });
		const ip = await freshIp();
		expect(await authenticate({ email: user.email, password: user.password, ip })).toStrictEqual(
			INVALID
		);
		// The seeded disabled demo account too (the demo password is right for it).
		expect(
			await authenticate({ email: 'former.planner@solvrae.example', password: DEMO_PASSWORD, ip })
		).toStrictEqual(INVALID);
	});
});

describe('authenticate: throttling', () => {
	it('uses the agreed limits: 5 per e-mail address, 30 per client address, in 15 minutes', () => {
		expect(THROTTLE).toEqual({ windowMinutes: 15, maxFailuresPerEmail: 5, maxFailuresPerIp: 30 });
	});

	it(`refuses an address after ${THROTTLE.maxFailuresPerEmail} failures, even with the right password`, async () => {
		const user = await createOwnUser();
		const ip = await freshIp();
		const failures = await failTimes(THROTTLE.maxFailuresPerEmail, user.email, ip);
		expect(failures).toEqual(Array(THROTTLE.maxFailuresPerEmail).fill(INVALID));

		expectThrottled(await authenticate({ email: user.email, password: user.password, ip }));
		// Another spelling of the same address, from another client address, is the same account.
		expectThrottled(
			await authenticate({
				email: ` ${user.email.toUpperCase()} `,
				password: user.password,
				ip: await freshIp()
			})
		);
		// An unrelated account from the same client is not affected.
		const other = await createOwnUser();
		expect(await authenticate({ email: other.email, password: other.password, ip })).toMatchObject({
			ok: true
		});
	});

	it('throttles an address without an account the same way, so throttling reveals nothing', async () => {
		const email = uniqueEmail('ghost');
		const ip = await freshIp();
		expect(await failTimes(THROTTLE.maxFailuresPerEmail, email, ip)).toEqual(
			Array(THROTTLE.maxFailuresPerEmail).fill(INVALID)
		);
		expectThrottled(await authenticate({ email, password: 'anything-at-all', ip }));
	});

	it('counts only the failures since the last successful sign-in', async () => {
		const user = await createOwnUser();
		const ip = await freshIp();
		const almost = THROTTLE.maxFailuresPerEmail - 1;
		await failTimes(almost, user.email, ip);
		expect(await authenticate({ email: user.email, password: user.password, ip })).toMatchObject({
			ok: true
		});
		// Without the reset these would make 2 × (limit − 1) failures in the window.
		expect(await failTimes(almost, user.email, ip)).toEqual(Array(almost).fill(INVALID));
		expect(await authenticate({ email: user.email, password: user.password, ip })).toMatchObject({
			ok: true
		});
		// After a full run of failures since that success, it is refused again.
		await failTimes(THROTTLE.maxFailuresPerEmail, user.email, ip);
		expectThrottled(await authenticate({ email: user.email, password: user.password, ip }));
	});

	it(`refuses a client address after ${THROTTLE.maxFailuresPerIp} failures across different e-mail addresses`, async () => {
		const ip = await freshIp();
		const results: AuthenticateResult[] = [];
		for (let i = 0; i < THROTTLE.maxFailuresPerIp; i++) {
			results.push(
				await authenticate({ email: uniqueEmail('spray'), password: 'guess-123456', ip })
			);
		}
		expect(results).toEqual(Array(THROTTLE.maxFailuresPerIp).fill(INVALID));

		const user = await createOwnUser();
		expectThrottled(await authenticate({ email: user.email, password: user.password, ip }));
		// The same account from another client address still signs in.
		expect(
			await authenticate({ email: user.email, password: user.password, ip: await freshIp() })
		).toMatchObject({ ok: true, userId: user.id });
	});
});

describe('authenticate: what it records', () => {
	it('records every checked attempt in sign_in_attempts, with the e-mail trimmed and lower-cased', async () => {
		const user = await createOwnUser({ email: uniqueEmail('Recorded') });
		const stored = user.email.toLowerCase();
		const ip = await freshIp();
		await authenticate({ email: user.email, password: 'wrong-password-0000', ip });
		await authenticate({ email: `  ${user.email.toUpperCase()} `, password: user.password, ip });
		const unknown = uniqueEmail('unknown');
		await authenticate({ email: unknown, password: 'whatever-123', ip: null });

		const rows = await SignInAttempt.findAll({
			where: { email: [stored, unknown] },
			order: [['id', 'ASC']],
			raw: true
		});
		expect(rows.map((r) => ({ email: r.email, ip: r.ip, succeeded: r.succeeded }))).toEqual([
			{ email: stored, ip, succeeded: false },
			{ email: stored, ip, succeeded: true },
			{ email: unknown, ip: null, succeeded: false }
		]);
		for (const row of rows) {
			expect(Math.abs(row.attemptedAt.getTime() - Date.now())).toBeLessThan(60_000);
		}
	});

	it('writes an auth.sign_in audit event and sets last_sign_in_at on success', async () => {
		const user = await createOwnUser();
		const ip = await freshIp();
		const before = await User.findByPk(user.id, { rejectOnEmpty: true });
		expect(before.lastSignInAt).toBeNull();
		const started = Date.now();

		expect(await authenticate({ email: user.email, password: user.password, ip })).toMatchObject({
			ok: true
		});

		const after = await User.findByPk(user.id, { rejectOnEmpty: true });
		expect(after.lastSignInAt).toBeInstanceOf(Date);
		expect(after.lastSignInAt!.getTime()).toBeGreaterThanOrEqual(started - 1000);
		expect(after.lastSignInAt!.getTime()).toBeLessThanOrEqual(Date.now() + 1000);
		// A sign-in is not an edit: the optimistic-lock version stays, so an open admin form is not stale.
		expect(after.version).toBe(before.version);

		const events = await AuditEvent.findAll({
			where: { action: 'auth.sign_in', entityId: user.id },
			raw: true
		});
		expect(events).toHaveLength(1);
		expect(events[0]).toMatchObject({ actorUserId: user.id, entity: 'user', ip });
	});

	it('writes no audit event and leaves last_sign_in_at alone on a failure', async () => {
		const user = await createOwnUser();
		await authenticate({ email: user.email, password: 'wrong-password-0000', ip: await freshIp() });
		expect(await AuditEvent.count({ where: { entityId: user.id } })).toBe(0);
		expect((await User.findByPk(user.id, { rejectOnEmpty: true })).lastSignInAt).toBeNull();
	});
});

// OWASP Password Storage Cheat Sheet (OWASP Cheat Sheet Series, section "Argon2id", recommendation
// current since 2023): "Use Argon2id with a minimum configuration of 19 MiB of memory, an
// iteration count of 2, and 1 degree of parallelism." The stored form is the PHC string
// $argon2id$v=19$m=<KiB>,t=<passes>,p=<lanes>$<salt>$<hash>.
describe('password hashes', () => {
	const PHC = /^\$argon2id\$v=19\$m=(\d+),t=(\d+),p=(\d+)\$[A-Za-z0-9+/]+\$[A-Za-z0-9+/]+$/;

	function expectOwaspArgon2id(passwordHash: string) {
		expect(passwordHash.startsWith('$argon2id$')).toBe(true);
		const match = PHC.exec(passwordHash);
		expect(match, passwordHash).not.toBeNull();
		const [, memoryKiB, passes, lanes] = match!.map(Number);
		expect(memoryKiB).toBeGreaterThanOrEqual(19 * 1024);
		expect(passes).toBeGreaterThanOrEqual(2);
		expect(lanes).toBeGreaterThanOrEqual(1);
	}

	it('hashes new passwords with argon2id at the OWASP baseline, with a fresh salt each time', async () => {
		const first = await hashPassword('Same-password-twice');
		const second = await hashPassword('Same-password-twice');
		expectOwaspArgon2id(first);
		expect(second).not.toEqual(first);
	});

	it('stores argon2id hashes for the seeded demo users (read only)', async () => {
		const users = await User.scope('withPassword').findAll({
			attributes: ['email', 'passwordHash'],
			where: where(fn('lower', col('email')), {
				[Op.in]: ['admin@solvrae.example', 'buyer@hallvik.example']
			})
		});
		expect(users).toHaveLength(2);
		for (const user of users) {
			expectOwaspArgon2id(user.passwordHash);
			expect(user.passwordHash).not.toContain(DEMO_PASSWORD);
		}
	});

	it('never returns the hash through the default scope', async () => {
		const user = await createOwnUser();
		const loaded = await User.findByPk(user.id, { rejectOnEmpty: true });
		expect(loaded.get({ plain: true })).not.toHaveProperty('passwordHash');
	});
});
