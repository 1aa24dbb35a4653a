import type { Migration } from '../src/lib/server/db/migrator';

// Indexes matching the list's ORDER BY (column, then id), so a page is an index scan, not a sort
// of every shipment (seen in EXPLAIN ANALYZE of npm run bench:measure).
export const up: Migration = async ({ context: qi }) => {
	await qi.sequelize.query(`
		CREATE INDEX shipments_created_id_idx ON shipments (created_at DESC, id DESC);
		CREATE INDEX shipments_etd_id_idx ON shipments (etd DESC NULLS LAST, id DESC);
		CREATE INDEX shipments_reference_id_idx ON shipments (reference, id);
	`);
};

export const down: Migration = async ({ context: qi }) => {
	await qi.sequelize.query(`
		DROP INDEX shipments_created_id_idx; DROP INDEX shipments_etd_id_idx;
		DROP INDEX shipments_reference_id_idx;
	`);
};
