// Applies pending migrations (or `down` to revert the last one). Usage: tsx scripts/migrate.ts [up|down|status]
import { createSequelize } from '../src/lib/server/db/connect';
import { createMigrator } from '../src/lib/server/db/migrator';
import { databaseUrl } from './database-url';

const command = process.argv[2] ?? 'up';
const sequelize = createSequelize(databaseUrl(), { poolMax: 2 });
const migrator = createMigrator(sequelize);
try {
	if (command === 'up') {
		const applied = await migrator.up();
		console.error(
			`[migrate] ${applied.length ? applied.map((m) => m.name).join(', ') : 'schema up to date'}`
		);
	} else if (command === 'down') {
		const reverted = await migrator.down();
		console.error(`[migrate] reverted ${reverted.map((m) => m.name).join(', ') || 'nothing'}`);
	} else if (command === 'status') {
		const pending = await migrator.pending();
		console.log(
			pending.length ? `pending: ${pending.map((m) => m.name).join(', ')}` : 'up to date'
		);
	} else {
		throw new Error(`Unknown command ${command}: use up, down or status`);
	}
} finally {
	await sequelize.close();
}
