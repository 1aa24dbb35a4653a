import type { Migration } from '../src/lib/server/db/migrator';

// Traceability: which lots and serial-number ranges went into which cartons of a shipment.
export const up: Migration = async ({ context: qi }) => {
	await qi.sequelize.query(`
		CREATE TABLE shipment_lots (
			id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
			shipment_id uuid NOT NULL REFERENCES shipments (id) ON DELETE CASCADE,
			product_id uuid NOT NULL REFERENCES products (id) ON DELETE RESTRICT,
			carton_from integer NOT NULL CHECK (carton_from > 0),
			carton_to integer NOT NULL CHECK (carton_to >= carton_from),
			lot_number text NOT NULL CHECK (length(btrim(lot_number)) BETWEEN 1 AND 40),
			serial_from text CHECK (serial_from IS NULL OR length(serial_from) BETWEEN 1 AND 40),
			serial_to text CHECK (serial_to IS NULL OR length(serial_to) BETWEEN 1 AND 40),
			created_by uuid REFERENCES users (id) ON DELETE SET NULL,
			created_at timestamptz NOT NULL DEFAULT now(),
			-- A range compares as text, so both ends have the same length (e.g. PB20-000001…PB20-000500).
			CHECK ((serial_from IS NULL) = (serial_to IS NULL)),
			CHECK (serial_from IS NULL OR (length(serial_from) = length(serial_to) AND serial_from <= serial_to))
		);
		CREATE INDEX shipment_lots_shipment_idx ON shipment_lots (shipment_id, carton_from);
		CREATE INDEX shipment_lots_serial_idx ON shipment_lots (length(serial_from), serial_from, serial_to);
		CREATE INDEX shipment_lots_lot_idx ON shipment_lots (lot_number);
	`);
};

export const down: Migration = async ({ context: qi }) => {
	await qi.sequelize.query('DROP TABLE shipment_lots;');
};
