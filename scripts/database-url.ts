// The one place scripts read the database address from (the app reads it via $env).
export function databaseUrl(): string {
	const url = process.env.DATABASE_URL;
	if (!url) {
		console.error(
			'DATABASE_URL is not set. Run through `npm start` / `npm test`, or see .env.example.'
		);
		process.exit(2);
	}
	return url;
}
