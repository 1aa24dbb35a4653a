// Invitations against the real database: the admin adds a person without a password, the
// set-password link arrives through the outbox, works once, and not after it expires.
import { QueryTypes } from 'sequelize';
import { describe, expect, it } from 'vitest';
import { authenticate } from '$lib/server/auth/authenticate';
import {
	acceptInvitation,
	inviteUser,
	pendingInvitation,
	reinviteUser
} from '$lib/server/services/invitations';
import { demoOrganization, freshIp, sequelize, sessionUserFor, trackUser, uniqueEmail } from './db';

const origin = 'http://127.0.0.1:4999';

/** Invites a fresh finance user and returns the token from the queued e-mail's link. */
async function invite() {
	const admin = await sessionUserFor('admin@solvrae.example');
	const exporter = await demoOrganization('exporter');
	const email = uniqueEmail('invite');
	const result = await inviteUser(
		admin,
		{ name: 'Invited <Person>', email, role: 'finance', organizationId: exporter.id },
		{ origin, ip: null }
	);
	if (!result.ok) throw new Error(result.message);
	trackUser(result.value.id);
	return { email, userId: result.value.id, token: await latestToken(email) };
}

async function latestToken(email: string): Promise<string> {
	const [mail] = await sequelize.query<{ text: string; html: string; subject: string }>(
		`SELECT text, html, subject FROM mail_outbox WHERE kind = 'invitation' AND recipient = :email
		  ORDER BY created_at DESC LIMIT 1`,
		{ type: QueryTypes.SELECT, replacements: { email } }
	);
	expect(mail?.html).toContain('Invited &lt;Person&gt;');
	const token = /\/set-password\/([\w-]+)/.exec(mail!.text)?.[1];
	if (!token) throw new Error('no set-password link in the invitation');
	return token;
}

describe('invitations', () => {
	it('the link sets the password once, then signs in; a second use is refused', async () => {
		const { email, token } = await invite();
		// The invited person cannot sign in before choosing a password.
		const ip = await freshIp();
		expect((await authenticate({ email, password: '', ip })).ok).toBe(false);
		expect(await pendingInvitation(token)).toMatchObject({ email });

		const password = 'A-good-long-password-2026';
		const [first, second] = await Promise.all([
			acceptInvitation(token, password, null),
			acceptInvitation(token, 'Another-long-password-2026', null)
		]);
		expect([first.ok, second.ok].sort()).toEqual([false, true]);
		const winner = first.ok ? password : 'Another-long-password-2026';
		expect((await authenticate({ email, password: winner, ip })).ok).toBe(true);
		expect(await pendingInvitation(token)).toBeNull();
		expect(await acceptInvitation(token, password, null)).toMatchObject({ ok: false, status: 404 });
	});

	it('an expired link is refused', async () => {
		const { userId, token } = await invite();
		await sequelize.query(
			`UPDATE user_invitations SET expires_at = now() - interval '1 minute' WHERE user_id = :userId`,
			{ replacements: { userId } }
		);
		expect(await pendingInvitation(token)).toBeNull();
		expect((await acceptInvitation(token, 'A-good-long-password-2026', null)).ok).toBe(false);
	});

	it('a new invitation replaces the old link; the database keeps only hashes', async () => {
		const { email, userId, token } = await invite();
		const admin = await sessionUserFor('admin@solvrae.example');
		expect((await reinviteUser(admin, userId, { origin, ip: null })).ok).toBe(true);
		const fresh = await latestToken(email);
		expect(fresh).not.toBe(token);
		expect(await pendingInvitation(token)).toBeNull();
		expect(await pendingInvitation(fresh)).toMatchObject({ email });
		const stored = await sequelize.query<{ token_hash: string }>(
			`SELECT token_hash FROM user_invitations WHERE user_id = :userId`,
			{ type: QueryTypes.SELECT, replacements: { userId } }
		);
		expect(stored.map((s) => s.token_hash)).not.toContain(fresh);
		expect(stored.every((s) => /^[0-9a-f]{64}$/.test(s.token_hash))).toBe(true);
	});

	it('only administrators invite', async () => {
		const coordinator = await sessionUserFor('coordinator@solvrae.example');
		const exporter = await demoOrganization('exporter');
		const result = await inviteUser(
			coordinator,
			{ name: 'X', email: uniqueEmail('nope'), role: 'finance', organizationId: exporter.id },
			{ origin, ip: null }
		);
		expect(result).toMatchObject({ ok: false, status: 403 });
	});
});
