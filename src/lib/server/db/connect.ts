import pg from 'pg';
import { Sequelize } from 'sequelize';
import { initModels } from './models';

// Framework-free so that scripts (migrate, seed) and tests can open a connection too.
export function createSequelize(
	databaseUrl: string,
	options: { poolMax?: number } = {}
): Sequelize {
	const sequelize = new Sequelize(databaseUrl, {
		dialect: 'postgres',
		dialectModule: pg,
		logging: false,
		define: { underscored: true, timestamps: true },
		pool: { max: options.poolMax ?? 10, idle: 10_000, acquire: 15_000 }
	});
	initModels(sequelize);
	return sequelize;
}
