import { QueryTypes, type Transaction } from 'sequelize';
import { Place } from '../db/models';
import { refused, type Refusal } from './result';

// Optimistic locking for master-data rows: bump the version the editor saw, or say why not.

const TABLES = [
	'places',
	'parties',
	'pallet_types',
	'container_types',
	'tariff_rows',
	'rate_cards',
	'country_rules',
	'customs_fees',
	'de_minimis_rules',
	'landed_cost_settings'
] as const;
export type VersionedTable = (typeof TABLES)[number];

/** null when the row was bumped; else a 404 (no such row) or a 409 (someone saved first). */
export async function bumpVersion(
	table: VersionedTable,
	id: string | number,
	version: number,
	what: string,
	transaction: Transaction
): Promise<Refusal | null> {
	if (!TABLES.includes(table)) throw new Error(`not a versioned table: ${table}`);
	const sequelize = Place.sequelize!;
	const [, bumped] = await sequelize.query(
		`UPDATE ${table} SET version = version + 1, updated_at = now() WHERE id = :id AND version = :version`,
		{ replacements: { id, version }, transaction, type: QueryTypes.UPDATE }
	);
	if (bumped === 1) return null;
	const [exists] = await sequelize.query(`SELECT 1 FROM ${table} WHERE id = :id`, {
		replacements: { id },
		transaction,
		type: QueryTypes.SELECT
	});
	if (!exists) return refused(404, `No such ${what}.`);
	return refused(
		409,
		`Someone else changed this ${what} while you were editing. Reload to see their change, then make yours again.`
	);
}
