import type { Migration } from '../src/lib/server/db/migrator';

// A counter that moves whenever data a landed-cost figure depends on changes, other than the
// shipment itself (whose version moves on every edit): products and their packaging, pallet and
// container types, places, and every landed-cost reference table. The landed-cost service keeps
// results in memory keyed on (shipment version, this counter), so one cheap read tells it whether
// a kept result still holds, in every process.
// Why a row bumped by a deferred constraint trigger: the bump commits with the change, so a
// reader that reads the counter before the data never files old data under a new counter; and it
// runs at commit, when the writer holds every other lock it needs, so two writers cannot deadlock
// on it (the row is held only for the instant of the commit).
const TABLES = [
	'products',
	'product_packagings',
	'pallet_types',
	'container_types',
	'places',
	'rate_cards',
	'tariff_rows',
	'country_rules',
	'customs_fees',
	'de_minimis_rules',
	'exchange_rates',
	'emission_factors',
	'landed_cost_settings'
];

export const up: Migration = async ({ context: qi }) => {
	await qi.sequelize.query(`
		CREATE TABLE landed_cost_data_generation (
			id integer PRIMARY KEY CHECK (id = 1),
			generation bigint NOT NULL
		);
		INSERT INTO landed_cost_data_generation VALUES (1, 0);
		CREATE FUNCTION bump_landed_cost_data_generation() RETURNS trigger
			LANGUAGE plpgsql AS $$
			BEGIN
				UPDATE landed_cost_data_generation SET generation = generation + 1 WHERE id = 1;
				RETURN NULL;
			END $$;
		${TABLES.map(
			(t) => `CREATE CONSTRAINT TRIGGER ${t}_landed_cost_generation
			AFTER INSERT OR UPDATE OR DELETE ON ${t} DEFERRABLE INITIALLY DEFERRED
			FOR EACH ROW EXECUTE FUNCTION bump_landed_cost_data_generation();`
		).join('\n')}
	`);
};

export const down: Migration = async ({ context: qi }) => {
	await qi.sequelize.query(`
		${TABLES.map((t) => `DROP TRIGGER ${t}_landed_cost_generation ON ${t};`).join('\n')}
		DROP FUNCTION bump_landed_cost_data_generation();
		DROP TABLE landed_cost_data_generation;
	`);
};
