// Shared set-up for the integration tests: one real PostgreSQL connection per test file.
//
// The database is the one scripts/test.sh prepares (migrated and seeded, DATABASE_URL set). Tests
// never call sync(): the schema is exactly what migrations/ built. Tests create their own users
// with unique e-mail addresses and never change the demo users; the users they create are deleted
// again when the file ends.
import { randomBytes } from 'node:crypto';
import { afterAll } from 'vitest';
import { col, fn, Op, QueryTypes, where, type Sequelize } from 'sequelize';
import { hashPassword } from '$lib/server/auth/password';
import { loadSessionUser, type SessionUser } from '$lib/server/auth/session-user';
import { createSequelize } from '$lib/server/db/connect';
import { Organization, User } from '$lib/server/db/models';
import type { Role } from '$lib/roles';
import { DEMO_ORGANIZATIONS, DEMO_PASSWORD } from '../../seeders/demo-scenario';

export { DEMO_PASSWORD };

function openDatabase(): Sequelize {
	const url = process.env.DATABASE_URL;
	if (!url) {
		throw new Error(
			'DATABASE_URL is not set. The integration tests need a migrated and seeded PostgreSQL: ' +
				'run them through `npm test` (scripts/test.sh), or start a cluster with scripts/pg.sh, ' +
				'run scripts/migrate.ts and scripts/seed.ts, and export DATABASE_URL=$(bash scripts/pg.sh url).'
		);
	}
	// Vitest loads modules afresh for every test file, so this runs once per file and binds the
	// models (which are module-level classes) to this one connection.
	return createSequelize(url, { poolMax: 4 });
}

/** The test file's one connection; closed after the file's last test. */
export const sequelize: Sequelize = openDatabase();

const createdUserIds = new Set<string>();

afterAll(async () => {
	try {
		if (createdUserIds.size > 0) {
			// Audit events keep their rows (actor_user_id is ON DELETE SET NULL).
			await User.destroy({ where: { id: { [Op.in]: [...createdUserIds] } } });
		}
	} finally {
		await sequelize.close();
	}
});

/** A short random suffix that keeps names and e-mail addresses unique across runs. */
export function uniqueSuffix(): string {
	return randomBytes(5).toString('hex');
}

/** A fresh address in the reserved .example domain (RFC 2606) that no account uses yet. */
export function uniqueEmail(prefix = 'itest'): string {
	return `${prefix}.${uniqueSuffix()}@landfall-itest.example`;
}

/** Tells the file's clean-up to delete a user that a test created through a service. */
export function trackUser(id: string): void {
	createdUserIds.add(id);
}

export async function userIdFor(email: string): Promise<string> {
	const user = await User.findOne({
		attributes: ['id'],
		where: where(fn('lower', col('email')), email.trim().toLowerCase())
	});
	if (!user) throw new Error(`No user with e-mail ${email}: is the database seeded?`);
	return user.id;
}

/** The SessionUser that the app builds for a signed-in user (throws if they have none). */
export async function sessionUserFor(email: string): Promise<SessionUser> {
	const sessionUser = await loadSessionUser(await userIdFor(email));
	if (!sessionUser) throw new Error(`${email} has no session: the account is disabled`);
	return sessionUser;
}

export type DemoOrganizationKey = (typeof DEMO_ORGANIZATIONS)[number]['key'];

/** A demo organization by its key in seeders/demo-scenario.ts ('exporter', 'hallvik', ...). */
export async function demoOrganization(key: DemoOrganizationKey): Promise<Organization> {
	const demo = DEMO_ORGANIZATIONS.find((o) => o.key === key);
	if (!demo) throw new Error(`No demo organization with key ${key}`);
	const organization = await Organization.findOne({
		where: where(fn('lower', col('name')), demo.name.toLowerCase())
	});
	if (!organization)
		throw new Error(`Demo organization ${demo.name} is missing: is the database seeded?`);
	return organization;
}

export interface OwnUser {
	id: string;
	email: string;
	password: string;
}

/**
 * Creates a user of the test's own (straight through the model, no audit event), deleted again
 * when the file ends. Defaults: an enabled coordinator of the demo exporter.
 */
export async function createOwnUser(
	options: {
		role?: Role;
		organization?: DemoOrganizationKey;
		disabled?: boolean;
		email?: string;
		password?: string;
	} = {}
): Promise<OwnUser> {
	const email = options.email ?? uniqueEmail();
	const password = options.password ?? `Own-test-password-${uniqueSuffix()}`;
	const organization = await demoOrganization(options.organization ?? 'exporter');
	const user = await User.create({
		email,
		name: `Test person ${uniqueSuffix()}`,
		role: options.role ?? 'coordinator',
		organizationId: organization.id,
		passwordHash: await hashPassword(password),
		disabled: options.disabled ?? false
	});
	trackUser(user.id);
	return { id: user.id, email, password };
}

const handedOut = new Set<string>();

/**
 * A client address that no sign-in attempt used in the last 15 minutes (the throttle window), so
 * a test's IP count starts at zero. Addresses come from the documentation ranges of RFC 5737
 * (TEST-NET-2 198.51.100.0/24 first, then TEST-NET-3 and TEST-NET-1); they are only strings
 * stored in sign_in_attempts.ip, no traffic is sent. Picked at random so that they rarely meet
 * another file's fixed addresses.
 */
export async function freshIp(): Promise<string> {
	const recent = await sequelize.query<{ ip: string }>(
		`SELECT DISTINCT ip FROM sign_in_attempts
		  WHERE ip IS NOT NULL AND attempted_at > now() - interval '15 minutes'`,
		{ type: QueryTypes.SELECT }
	);
	const busy = new Set(recent.map((row) => row.ip));
	for (const prefix of ['198.51.100', '203.0.113', '192.0.2']) {
		const candidates = Array.from({ length: 254 }, (_, i) => `${prefix}.${i + 1}`)
			.filter((ip) => !busy.has(ip) && !handedOut.has(ip))
			.sort(() => Math.random() - 0.5);
		const ip = candidates[0];
		if (ip) {
			handedOut.add(ip);
			return ip;
		}
	}
	throw new Error('Every documentation address was used for a sign-in in the last 15 minutes');
}

/** count(*) of a table, optionally with a WHERE condition using :named replacements. */
export async function countRows(
	table: string,
	condition = 'TRUE',
	replacements: Record<string, unknown> = {}
): Promise<number> {
	if (!/^[a-z_]+$/.test(table)) throw new Error(`Not a table name: ${table}`);
	const [row] = await sequelize.query<{ n: string }>(
		`SELECT count(*) AS n FROM ${table} WHERE ${condition}`,
		{ type: QueryTypes.SELECT, replacements }
	);
	return Number(row?.n ?? 0);
}
