import path from 'node:path';
import { pathToFileURL } from 'node:url';
import type { QueryInterface, Sequelize } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';

/** What every file in migrations/ exports as `up` and `down`. */
export type Migration = (params: { context: QueryInterface }) => Promise<void>;

interface MigrationModule {
	up: Migration;
	down?: Migration;
}

// Schema changes only ever go through these files; sync() is never used.
export function createMigrator(sequelize: Sequelize, directory = path.resolve('migrations')) {
	return new Umzug<QueryInterface>({
		migrations: {
			glob: ['*.ts', { cwd: directory }],
			resolve: ({ name, path: file, context }) => {
				const load = async () =>
					(await import(pathToFileURL(file as string).href)) as MigrationModule;
				return {
					name,
					up: async () => (await load()).up({ context }),
					down: async () => {
						const module = await load();
						if (!module.down) throw new Error(`${name} cannot be reverted`);
						await module.down({ context });
					}
				};
			}
		},
		context: sequelize.getQueryInterface(),
		storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
		logger: undefined
	});
}
