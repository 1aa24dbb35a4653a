// API tokens: only a hash is stored; revoked tokens and disabled users stop working at once.
import { describe, expect, it } from 'vitest';
import {
	hashToken,
	issueToken,
	listTokens,
	revokeToken,
	userForToken
} from '$lib/server/services/api-tokens';
import { ApiToken, User } from '$lib/server/db/models';
import { createOwnUser, sessionUserFor } from './db';

describe('API tokens', () => {
	it('issues a token whose SHA-256 hash, never the token, is stored', async () => {
		const admin = await sessionUserFor('admin@solvrae.example');
		const user = await createOwnUser();
		const issued = await issueToken(admin, user.id, 'ERP export', null);
		if (!issued.ok) throw new Error(issued.message);
		const { token } = issued.value;
		expect(token).toMatch(/^lf_/);
		const rows = await ApiToken.findAll({ where: { userId: user.id }, raw: true });
		expect(rows).toHaveLength(1);
		expect(rows[0]!.tokenHash).toBe(hashToken(token));
		expect(JSON.stringify(rows)).not.toContain(token);
		// FIPS 180-4 (NIST, 2015) test vector: SHA-256("abc").
		expect(hashToken('abc')).toBe(
			'ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad'
		);
	});

	it('stands for its user until revoked, and never for a disabled user', async () => {
		const admin = await sessionUserFor('admin@solvrae.example');
		const user = await createOwnUser();
		const issued = await issueToken(admin, user.id, 'Warehouse feed', null);
		if (!issued.ok) throw new Error(issued.message);
		expect((await userForToken(issued.value.token))?.id).toBe(user.id);
		expect((await listTokens(user.id))[0]!.lastUsedAt).not.toBeNull();

		await User.update({ disabled: true }, { where: { id: user.id } });
		expect(await userForToken(issued.value.token)).toBeNull();
		await User.update({ disabled: false }, { where: { id: user.id } });

		const revoked = await revokeToken(admin, user.id, issued.value.row.id, null);
		expect(revoked.ok).toBe(true);
		expect(await userForToken(issued.value.token)).toBeNull();
		expect(await userForToken('lf_not-a-real-token')).toBeNull();
		expect(await userForToken('garbage')).toBeNull();
	});
});
