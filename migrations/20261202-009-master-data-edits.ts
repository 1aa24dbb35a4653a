import type { Migration } from '../src/lib/server/db/migrator';

// Editing master data: a version per row for optimistic locking; places and parties can be retired
// (kept for the shipments that name them, no longer offered for new ones); equipment types know
// whether they came from data/*.json (the seeder refreshes those only while nobody has edited them).
export const up: Migration = async ({ context: qi }) => {
	await qi.sequelize.query(`
		ALTER TABLE places
			ADD COLUMN version integer NOT NULL DEFAULT 0,
			ADD COLUMN active boolean NOT NULL DEFAULT true;
		ALTER TABLE parties
			ADD COLUMN version integer NOT NULL DEFAULT 0,
			ADD COLUMN active boolean NOT NULL DEFAULT true;
		ALTER TABLE pallet_types
			ADD COLUMN version integer NOT NULL DEFAULT 0,
			ADD COLUMN custom boolean NOT NULL DEFAULT false;
		ALTER TABLE container_types
			ADD COLUMN version integer NOT NULL DEFAULT 0,
			ADD COLUMN custom boolean NOT NULL DEFAULT false,
			ADD CONSTRAINT container_types_door_within_section
				CHECK (door_width_mm <= internal_width_mm AND door_height_mm <= internal_height_mm),
			ADD CONSTRAINT container_types_gross_above_tare CHECK (max_gross_kg > tare_kg);
		CREATE INDEX shipments_origin_idx ON shipments (origin_id);
		CREATE INDEX shipments_destination_idx ON shipments (destination_id);
		CREATE INDEX shipments_consignee_idx ON shipments (consignee_id);
		CREATE INDEX shipments_notify_party_idx ON shipments (notify_party_id);
	`);
};

export const down: Migration = async ({ context: qi }) => {
	await qi.sequelize.query(`
		DROP INDEX shipments_origin_idx; DROP INDEX shipments_destination_idx;
		DROP INDEX shipments_consignee_idx; DROP INDEX shipments_notify_party_idx;
		ALTER TABLE container_types DROP CONSTRAINT container_types_door_within_section,
			DROP CONSTRAINT container_types_gross_above_tare, DROP COLUMN custom, DROP COLUMN version;
		ALTER TABLE pallet_types DROP COLUMN custom, DROP COLUMN version;
		ALTER TABLE parties DROP COLUMN active, DROP COLUMN version;
		ALTER TABLE places DROP COLUMN active, DROP COLUMN version;
	`);
};
