import type { Migration } from '../src/lib/server/db/migrator';

// The last load plan of each shipment, kept for the shipment revision (version) and the planner
// input (a SHA-256 of it: container types can change without the shipment changing) it was made
// for. Any other revision or input computes afresh and replaces the row.
export const up: Migration = async ({ context: qi }) => {
	await qi.sequelize.query(`
		CREATE TABLE shipment_load_plans (
			shipment_id uuid PRIMARY KEY REFERENCES shipments (id) ON DELETE CASCADE,
			shipment_version integer NOT NULL CHECK (shipment_version >= 0),
			input_hash char(64) NOT NULL CHECK (input_hash ~ '^[0-9a-f]{64}$'),
			plan jsonb NOT NULL,
			created_at timestamptz NOT NULL DEFAULT now()
		);
	`);
};

export const down: Migration = async ({ context: qi }) => {
	await qi.sequelize.query('DROP TABLE shipment_load_plans;');
};
