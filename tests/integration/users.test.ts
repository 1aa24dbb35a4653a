// The users service (createUser, updateUser) and its zod schemas, against the real database.
// The actor is always an administrator of the test's own, except for one create by the demo admin
// (which only adds a new user). Demo users are never changed.
import { col, fn, where } from 'sequelize';
import { beforeAll, describe, expect, it } from 'vitest';
import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from '$lib/server/auth/password';
import { loadSessionUser, type SessionUser } from '$lib/server/auth/session-user';
import { authenticate } from '$lib/server/auth/authenticate';
import { AuditEvent, User } from '$lib/server/db/models';
import { createUser, getUser, updateUser, type UserRow } from '$lib/server/services/users';
import {
	createUserSchema,
	PASSWORD_RULE,
	updateUserSchema,
	type CreateUserInput
} from '$lib/schemas/users';
import {
	countRows,
	createOwnUser,
	demoOrganization,
	freshIp,
	sessionUserFor,
	trackUser,
	uniqueEmail
} from './db';

let admin: SessionUser;
let exporterId: string;
let hallvikId: string;

beforeAll(async () => {
	const ownAdmin = await createOwnUser({ role: 'admin' });
	admin = (await loadSessionUser(ownAdmin.id))!;
	exporterId = (await demoOrganization('exporter')).id;
	hallvikId = (await demoOrganization('hallvik')).id;
});

function newUserInput(overrides: Partial<CreateUserInput> = {}): CreateUserInput {
	return createUserSchema.parse({
		name: 'Nadia Ramli',
		email: uniqueEmail('new'),
		role: 'coordinator',
		organizationId: exporterId,
		password: 'A-long-enough-password',
		...overrides
	});
}

async function createOk(input: CreateUserInput, actor = admin): Promise<UserRow> {
	const result = await createUser(actor, input, '198.51.100.10');
	if (!result.ok) throw new Error(`createUser failed: ${JSON.stringify(result)}`);
	trackUser(result.value.id);
	return result.value;
}

async function auditEventsFor(entityId: string) {
	return AuditEvent.findAll({
		where: { entity: 'user', entityId },
		order: [['id', 'ASC']],
		raw: true
	});
}

const countUsersAndAudit = async () => ({
	users: await countRows('users'),
	audit: await countRows('audit_events')
});

describe('createUser', () => {
	it('creates the row and a user.create audit event without the password hash', async () => {
		const demoAdmin = await sessionUserFor('admin@solvrae.example');
		const input = newUserInput({ name: '  Nadia Ramli  ' });
		const ip = await freshIp();
		const result = await createUser(demoAdmin, input, ip);
		if (!result.ok) throw new Error(JSON.stringify(result));
		trackUser(result.value.id);

		expect(result.value).toMatchObject({
			name: 'Nadia Ramli', // the schema trimmed it
			email: input.email,
			role: 'coordinator',
			disabled: false,
			organizationId: exporterId,
			organizationName: 'Solvrae Electronics Sdn. Bhd.',
			lastSignInAt: null,
			version: 0
		});
		const row = await User.scope('withPassword').findByPk(result.value.id, { rejectOnEmpty: true });
		expect(row.passwordHash.startsWith('$argon2id$')).toBe(true);

		const events = await auditEventsFor(result.value.id);
		expect(events).toHaveLength(1);
		const [event] = events;
		expect(event).toMatchObject({
			action: 'user.create',
			actorUserId: demoAdmin.id,
			ip,
			before: null
		});
		expect(event!.after).toEqual({
			name: 'Nadia Ramli',
			email: input.email,
			role: 'coordinator',
			organizationId: exporterId,
			disabled: false
		});
		const stored = JSON.stringify(event);
		expect(stored).not.toMatch(/password/i);
		expect(stored).not.toContain('$argon2');
		expect(stored).not.toContain(input.password);

		// The new person can sign in with the password they were given.
		expect(
			await authenticate({ email: input.email, password: input.password, ip: await freshIp() })
		).toMatchObject({ ok: true, userId: result.value.id });
	});

	it('refuses an e-mail address that differs from an existing one only in letter case', async () => {
		const first = await createOk(newUserInput({ email: uniqueEmail('twin') }));
		const counts = await countUsersAndAudit();
		const result = await createUser(
			admin,
			newUserInput({ email: first.email.toUpperCase() }),
			null
		);
		expect(result).toMatchObject({ ok: false, status: 400 });
		if (result.ok) return;
		expect(result.fieldErrors.email).toEqual(expect.any(String));
		expect(Object.keys(result.fieldErrors)).toEqual(['email']);
		expect(await countUsersAndAudit()).toEqual(counts);
	});

	it('refuses a demo user’s address typed in other letter case', async () => {
		const counts = await countUsersAndAudit();
		const result = await createUser(admin, newUserInput({ email: 'Buyer@Hallvik.example' }), null);
		expect(result).toMatchObject({
			ok: false,
			status: 400,
			fieldErrors: { email: expect.any(String) }
		});
		expect(await countUsersAndAudit()).toEqual(counts);
	});

	it.each([
		['customer', 'exporter'],
		['coordinator', 'hallvik'],
		['broker', 'hallvik']
	] as const)('refuses role %s in the %s organization (wrong kind)', async (role, key) => {
		const organizationId = key === 'exporter' ? exporterId : hallvikId;
		const email = uniqueEmail('mismatch');
		const counts = await countUsersAndAudit();
		const result = await createUser(admin, newUserInput({ role, organizationId, email }), null);
		expect(result).toMatchObject({ ok: false, status: 400 });
		if (result.ok) return;
		expect(result.fieldErrors.organizationId).toEqual(expect.any(String));
		// A failed create leaves neither a row nor an audit event.
		expect(await countUsersAndAudit()).toEqual(counts);
		expect(await User.count({ where: where(fn('lower', col('email')), email) })).toBe(0);
	});

	it('refuses an organization that does not exist, without a row or audit event', async () => {
		const counts = await countUsersAndAudit();
		const result = await createUser(
			admin,
			newUserInput({ organizationId: '00000000-0000-4000-8000-000000000000' }),
			null
		);
		expect(result).toMatchObject({
			ok: false,
			status: 400,
			fieldErrors: { organizationId: expect.any(String) }
		});
		expect(await countUsersAndAudit()).toEqual(counts);
	});
});

describe('updateUser', () => {
	async function freshCoordinator(): Promise<UserRow> {
		return createOk(newUserInput());
	}

	it('changes a role and writes user.role_change with before and after', async () => {
		const target = await freshCoordinator();
		const ip = await freshIp();
		const result = await updateUser(
			admin,
			target.id,
			{ name: target.name, role: 'finance', disabled: false, version: target.version },
			ip
		);
		expect(result).toMatchObject({
			ok: true,
			value: { role: 'finance', version: target.version + 1 }
		});

		const events = (await auditEventsFor(target.id)).filter((e) => e.action === 'user.role_change');
		expect(events).toHaveLength(1);
		expect(events[0]).toMatchObject({
			actorUserId: admin.id,
			ip,
			before: { role: 'coordinator', disabled: false },
			after: { role: 'finance', disabled: false }
		});
		// The next request of that person already sees the new role.
		expect((await loadSessionUser(target.id))?.role).toBe('finance');
	});

	it('disables a user: user.disable is written and their session stops working at once', async () => {
		const password = 'Disable-me-password-1';
		const target = await createOk(newUserInput({ password }));
		expect(await loadSessionUser(target.id)).not.toBeNull();

		const result = await updateUser(
			admin,
			target.id,
			{ name: target.name, role: target.role, disabled: true, version: target.version },
			null
		);
		expect(result).toMatchObject({ ok: true, value: { disabled: true } });
		const events = (await auditEventsFor(target.id)).filter((e) => e.action === 'user.disable');
		expect(events).toHaveLength(1);
		expect(events[0]).toMatchObject({ before: { disabled: false }, after: { disabled: true } });

		// hooks.server.ts rebuilds locals.user with loadSessionUser on every request.
		expect(await loadSessionUser(target.id)).toBeNull();
		expect(
			await authenticate({ email: target.email, password, ip: await freshIp() })
		).toStrictEqual({ ok: false, reason: 'invalid' });
	});

	it('re-enables a user with user.enable', async () => {
		const target = await freshCoordinator();
		const disabled = await updateUser(
			admin,
			target.id,
			{ ...editable(target), disabled: true },
			null
		);
		if (!disabled.ok) throw new Error(JSON.stringify(disabled));
		const enabled = await updateUser(
			admin,
			target.id,
			{ ...editable(disabled.value), disabled: false },
			null
		);
		expect(enabled).toMatchObject({ ok: true, value: { disabled: false } });
		expect((await auditEventsFor(target.id)).map((e) => e.action)).toEqual([
			'user.create',
			'user.disable',
			'user.enable'
		]);
		expect(await loadSessionUser(target.id)).not.toBeNull();
	});

	it('answers 409 to an edit made on a stale version, and keeps the newer data', async () => {
		const target = await freshCoordinator();
		const stale = target.version;
		const first = await updateUser(
			admin,
			target.id,
			{ ...editable(target), name: 'First editor' },
			null
		);
		expect(first).toMatchObject({ ok: true, value: { name: 'First editor', version: stale + 1 } });
		const auditBefore = await countRows('audit_events');

		const second = await updateUser(
			admin,
			target.id,
			{ name: 'Second editor', role: 'finance', disabled: false, version: stale },
			null
		);
		expect(second).toMatchObject({ ok: false, status: 409 });
		expect(await getUser(target.id)).toMatchObject({
			name: 'First editor',
			role: 'coordinator',
			version: stale + 1
		});
		expect(await countRows('audit_events')).toBe(auditBefore);
	});

	it('answers 404 for a user that does not exist', async () => {
		const result = await updateUser(
			admin,
			'00000000-0000-4000-8000-000000000000',
			{ name: 'Nobody', role: 'coordinator', disabled: false, version: 0 },
			null
		);
		expect(result).toMatchObject({ ok: false, status: 404 });
	});

	it('refuses a role that does not fit the user’s organization', async () => {
		const target = await freshCoordinator();
		const result = await updateUser(
			admin,
			target.id,
			{ ...editable(target), role: 'customer' },
			null
		);
		expect(result).toMatchObject({
			ok: false,
			status: 400,
			fieldErrors: { role: expect.any(String) }
		});
		expect((await getUser(target.id))?.role).toBe('coordinator');
	});

	describe('an administrator cannot lock themself out', () => {
		let self: SessionUser;
		beforeAll(async () => {
			const own = await createOwnUser({ role: 'admin' });
			self = (await loadSessionUser(own.id))!;
		});

		it('cannot disable their own account', async () => {
			const me = (await getUser(self.id))!;
			const auditBefore = await countRows('audit_events');
			const result = await updateUser(self, self.id, { ...editable(me), disabled: true }, null);
			expect(result).toMatchObject({
				ok: false,
				status: 400,
				fieldErrors: { disabled: expect.any(String) }
			});
			expect(await getUser(self.id)).toMatchObject({
				disabled: false,
				role: 'admin',
				version: me.version
			});
			expect(await loadSessionUser(self.id)).not.toBeNull();
			expect(await countRows('audit_events')).toBe(auditBefore);
		});

		it.each(['coordinator', 'finance'] as const)(
			'cannot change their own role to %s',
			async (role) => {
				const me = (await getUser(self.id))!;
				const result = await updateUser(self, self.id, { ...editable(me), role }, null);
				expect(result).toMatchObject({
					ok: false,
					status: 400,
					fieldErrors: { role: expect.any(String) }
				});
				expect((await getUser(self.id))?.role).toBe('admin');
			}
		);

		it('can still rename themself', async () => {
			const me = (await getUser(self.id))!;
			const result = await updateUser(
				self,
				self.id,
				{ ...editable(me), name: 'Renamed admin' },
				null
			);
			expect(result).toMatchObject({ ok: true, value: { name: 'Renamed admin', role: 'admin' } });
			expect((await auditEventsFor(self.id)).map((e) => e.action)).toContain('user.update');
		});

		it('can disable another administrator', async () => {
			const other = await createOk(newUserInput({ role: 'admin' }));
			const result = await updateUser(self, other.id, { ...editable(other), disabled: true }, null);
			expect(result).toMatchObject({ ok: true, value: { disabled: true } });
		});
	});
});

function editable(user: UserRow) {
	return { name: user.name, role: user.role, disabled: user.disabled, version: user.version };
}

describe('createUserSchema and updateUserSchema', () => {
	const valid = {
		name: 'Ana Lim',
		email: 'ana.lim@solvrae.example',
		role: 'finance',
		organizationId: '3f2b6c1e-8d4a-4c2e-9b7f-1a2b3c4d5e6f',
		password: 'harbour-tide'.padEnd(PASSWORD_MIN_LENGTH, '7')
	};

	function messages(input: unknown, field: string): string[] {
		const parsed = createUserSchema.safeParse(input);
		if (parsed.success) return [];
		return parsed.error.issues.filter((i) => i.path.join('.') === field).map((i) => i.message);
	}

	it('accepts a valid input and trims the name', () => {
		expect(createUserSchema.parse({ ...valid, name: '  Ana Lim ' })).toEqual(valid);
	});

	it('agrees with the password limits in auth/password.ts', () => {
		expect([PASSWORD_MIN_LENGTH, PASSWORD_MAX_LENGTH]).toEqual([12, 128]);
		expect(PASSWORD_RULE).toBe(
			'At least 12 and at most 128 characters; not a common or easily guessed one.'
		);
		expect(
			createUserSchema.safeParse({
				...valid,
				password: 'a quiet harbour at dawn '.repeat(6).slice(0, PASSWORD_MAX_LENGTH)
			}).success
		).toBe(true);
		expect(messages({ ...valid, password: 'password1234' }, 'password')).toEqual([
			'This password is on lists of common passwords: choose another.'
		]);
	});

	it('explains a short or long password', () => {
		expect(
			messages({ ...valid, password: 'x'.repeat(PASSWORD_MIN_LENGTH - 1) }, 'password')
		).toEqual([
			'Password too short: At least 12 and at most 128 characters; not a common or easily guessed one.'
		]);
		expect(
			messages({ ...valid, password: 'x'.repeat(PASSWORD_MAX_LENGTH + 1) }, 'password')
		).toEqual([
			'Password too long: At least 12 and at most 128 characters; not a common or easily guessed one.'
		]);
	});

	it('explains every other bad field', () => {
		expect(messages({ ...valid, name: '   ' }, 'name')).toEqual(['Enter the person’s name.']);
		expect(messages({ ...valid, name: 'n'.repeat(121) }, 'name')).toEqual([
			'Keep the name under 120 characters.'
		]);
		expect(messages({ ...valid, email: 'not-an-address' }, 'email')).toEqual([
			'Enter an e-mail address such as name@company.example.'
		]);
		expect(messages({ ...valid, role: 'superuser' }, 'role')).toEqual(['Choose one of the roles.']);
		expect(messages({ ...valid, organizationId: 'hallvik' }, 'organizationId')).toEqual([
			'Choose the organization this person belongs to.'
		]);
		const noPassword: Partial<typeof valid> = { ...valid };
		delete noPassword.password;
		expect(messages(noPassword, 'password')).toHaveLength(1);
	});

	it('updateUserSchema defaults disabled to false and needs a whole, non-negative version', () => {
		expect(updateUserSchema.parse({ name: 'Ana Lim', role: 'finance', version: 3 })).toEqual({
			name: 'Ana Lim',
			role: 'finance',
			disabled: false,
			version: 3
		});
		for (const version of [-1, 1.5, '2', undefined]) {
			expect(
				updateUserSchema.safeParse({ name: 'Ana Lim', role: 'finance', version }).success,
				String(version)
			).toBe(false);
		}
	});
});
