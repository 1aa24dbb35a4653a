import pg from 'pg';

// A fingerprint of the database: one md5 per table over all its rows, so a test can say "this
// rejected request changed nothing". Playwright's process gets DATABASE_URL from scripts/test.sh.

/**
 * Tables that change without any request of the test, or by requests that are meant to leave a
 * trace even when refused; read from the migrations.
 */
const SKIPPED_TABLES = new Set([
	'sign_in_attempts', // every sign-in try, for throttling (migration 003)
	'document_downloads', // download log of the papers (migration 011)
	'supporting_document_downloads', // download log of supporting documents (migration 018)
	'schema_migrations' // umzug's own bookkeeping
]);

/**
 * Columns that background jobs move: the mail dispatcher sends queued mail (status, attempts…),
 * the expiry check marks reminders. A row added or removed still changes the table's md5.
 */
const SKIPPED_COLUMNS: Record<string, string[]> = {
	mail_outbox: ['status', 'attempts', 'next_attempt_at', 'last_error', 'sent_at'],
	supporting_documents: ['reminder_sent_at'],
	// Signing in (the test's own sessions) stamps the user.
	users: ['last_sign_in_at']
};

export type Fingerprint = Map<string, string>;

export class DatabaseFingerprint {
	private readonly client: pg.Client;
	private query = '';

	constructor(url = process.env.DATABASE_URL) {
		if (!url) throw new Error('DATABASE_URL is not set: run the e2e tests through scripts/test.sh');
		this.client = new pg.Client({ connectionString: url });
	}

	async open(): Promise<void> {
		await this.client.connect();
		const { rows } = await this.client.query<{ table: string; column: string; type: string }>(
			`SELECT c.table_name AS table, c.column_name AS column, c.data_type AS type
			 FROM information_schema.columns c
			 JOIN information_schema.tables t USING (table_schema, table_name)
			 WHERE c.table_schema = 'public' AND t.table_type = 'BASE TABLE'
			 ORDER BY c.table_name, c.ordinal_position`
		);
		const tables = new Map<string, string[]>();
		for (const { table, column, type } of rows) {
			if (SKIPPED_TABLES.has(table) || SKIPPED_COLUMNS[table]?.includes(column)) continue;
			// Stored files and PDFs: their md5 instead of megabytes of hex.
			const value = type === 'bytea' ? `md5("${column}")` : `"${column}"`;
			tables.set(table, [...(tables.get(table) ?? []), value]);
		}
		this.query = [...tables]
			.map(
				([table, columns]) =>
					`SELECT '${table}' AS table, md5(coalesce(string_agg(r, ',' ORDER BY r), '')) AS md5
					 FROM (SELECT md5(ROW(${columns.join(', ')})::text) AS r FROM "${table}") x`
			)
			.join('\nUNION ALL\n');
	}

	async take(): Promise<Fingerprint> {
		const { rows } = await this.client.query<{ table: string; md5: string }>(this.query);
		return new Map(rows.map((r) => [r.table, r.md5]));
	}

	async close(): Promise<void> {
		await this.client.end();
	}
}

/** The tables whose rows differ between two fingerprints. */
export function changedTables(before: Fingerprint, after: Fingerprint): string[] {
	const names = new Set([...before.keys(), ...after.keys()]);
	return [...names].filter((name) => before.get(name) !== after.get(name)).sort();
}
