import { env } from '$env/dynamic/private';
import type { Sequelize } from 'sequelize';
import { createSequelize } from './connect';

export * from './models';

let instance: Sequelize | undefined;

/** The app's one connection pool, opened on first use (the build imports this file without a database). */
export function db(): Sequelize {
	if (!instance) {
		const url = env.DATABASE_URL;
		if (!url) throw new Error('DATABASE_URL is not set: see .env.example');
		instance = createSequelize(url);
	}
	return instance;
}
