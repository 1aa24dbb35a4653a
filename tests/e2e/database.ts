import pg from 'pg';

// Direct reads of the test database (scripts/test.sh exports DATABASE_URL to Playwright): for
// checks the app's own screens cannot show, such as counters, row counts and fingerprints.
let pool: pg.Pool | undefined;

export function database(): pg.Pool {
	const connectionString = process.env.DATABASE_URL;
	if (!connectionString) throw new Error('DATABASE_URL is not set: run the e2e tests via npm test');
	pool ??= new pg.Pool({ connectionString, max: 2 });
	return pool;
}

export async function rows<T extends pg.QueryResultRow>(
	sql: string,
	values: unknown[] = []
): Promise<T[]> {
	return (await database().query<T>(sql, values)).rows;
}

export async function closeDatabase(): Promise<void> {
	await pool?.end();
	pool = undefined;
}
