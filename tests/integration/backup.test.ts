// npm run db:backup / db:restore (scripts/pg.sh backup|restore) round trip. The tests' database
// is backed up, restored into a scratch database of the same cluster, wiped, and restored again:
// every table must come back with the same rows (an md5 over each table's rows, in order).
// A scratch database, because other test files keep writing to the tests' own one meanwhile.
import { execFile } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { afterAll, describe, expect, it } from 'vitest';
import { QueryTypes, type Sequelize } from 'sequelize';
import { createSequelize } from '$lib/server/db/connect';

const run = promisify(execFile);
const SCRATCH = 'landfall_backup_check';
const dir = mkdtempSync(join(tmpdir(), 'landfall-backup-'));
const env = (db?: string) => ({ ...process.env, ...(db ? { LANDFALL_PG_DB: db } : {}) });
const pg = (args: string[], db?: string) =>
	run('bash', ['scripts/pg.sh', ...args], { env: env(db), maxBuffer: 16 * 1024 * 1024 });

function scratchUrl(): string {
	const url = new URL(process.env.DATABASE_URL!);
	url.pathname = `/${SCRATCH}`;
	return url.toString();
}

async function fingerprint(db: Sequelize): Promise<Record<string, string>> {
	const tables = await db.query<{ name: string }>(
		`SELECT tablename AS name FROM pg_tables WHERE schemaname = 'public' ORDER BY tablename`,
		{ type: QueryTypes.SELECT }
	);
	const out: Record<string, string> = {};
	for (const { name } of tables) {
		const [row] = await db.query<{ n: string; digest: string | null }>(
			`SELECT count(*)::text AS n, md5(string_agg(t::text, '|' ORDER BY t::text)) AS digest
			 FROM "${name}" t`,
			{ type: QueryTypes.SELECT }
		);
		out[name] = `${row!.n}:${row!.digest ?? ''}`;
	}
	return out;
}

let scratch: Sequelize | null = null;
afterAll(async () => {
	await scratch?.close();
	rmSync(dir, { recursive: true, force: true });
	// Leave no scratch database behind.
	await run('bash', ['scripts/pg.sh', 'psql', '-c', `DROP DATABASE IF EXISTS ${SCRATCH}`], {
		env: env()
	}).catch(() => undefined);
});

describe('database backup and restore', () => {
	it(
		'backs up, wipes and restores the demo data with every row',
		{ timeout: 120_000 },
		async () => {
			const file = join(dir, 'demo.dump');
			const backup = await pg(['backup', file]);
			expect(backup.stdout.trim()).toBe(file);

			await pg(['reset-db'], SCRATCH);
			await pg(['restore', file], SCRATCH);
			scratch = createSequelize(scratchUrl(), { poolMax: 1 });
			const restored = await fingerprint(scratch);
			// The demo scenario is there: its organizations, users, shipments and migrations.
			for (const table of ['organizations', 'users', 'shipments', 'products', 'shipment_documents'])
				expect(Number(restored[table]!.split(':')[0]), table).toBeGreaterThan(0);

			// Wipe: every table emptied (as after a disaster), then the same backup restored again.
			await scratch.query(
				`DO $$ DECLARE r record; BEGIN
			   FOR r IN SELECT tablename FROM pg_tables WHERE schemaname = 'public' LOOP
			     EXECUTE format('TRUNCATE %I CASCADE', r.tablename);
			   END LOOP; END $$`
			);
			expect(Number((await fingerprint(scratch)).users!.split(':')[0])).toBe(0);
			await pg(['restore', file], SCRATCH);
			expect(await fingerprint(scratch)).toEqual(restored);
		}
	);

	it('refuses a file that is not a backup and leaves the database alone', async () => {
		const bogus = join(dir, 'not-a-backup.dump');
		await run('bash', ['-c', `printf 'MZ not a dump' > "${bogus}"`]);
		await expect(pg(['restore', bogus], SCRATCH)).rejects.toMatchObject({
			stderr: expect.stringMatching(/not a pg_dump custom-format backup/)
		});
	});
});
