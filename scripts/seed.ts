// Runs every seeder in seeders/ in file order. Seeders are idempotent: running twice changes nothing.
import { readdir } from 'node:fs/promises';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import type { Sequelize } from 'sequelize';
import { createSequelize } from '../src/lib/server/db/connect';
import { databaseUrl } from './database-url';

const directory = path.resolve('seeders');
const files = (await readdir(directory)).filter((f) => /^\d{3}-.+\.ts$/.test(f)).sort();
const sequelize = createSequelize(databaseUrl(), { poolMax: 2 });
try {
	for (const file of files) {
		const module = (await import(pathToFileURL(path.join(directory, file)).href)) as {
			seed: (s: Sequelize) => Promise<void>;
		};
		await module.seed(sequelize);
		console.error(`[seed] ${file}`);
	}
} finally {
	await sequelize.close();
}
