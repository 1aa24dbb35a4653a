import type { Migration } from '../src/lib/server/db/migrator';

const MODES = `'air', 'sea_fcl', 'sea_lcl', 'road', 'courier'`;
const STATUSES = `'draft', 'booked', 'documents_issued', 'in_transit', 'arrived', 'cleared', 'delivered', 'cancelled'`;
const INCOTERMS = `'EXW', 'FCA', 'CPT', 'CIP', 'DAP', 'DPU', 'DDP', 'FAS', 'FOB', 'CFR', 'CIF'`;

export const up: Migration = async ({ context: qi }) => {
	await qi.sequelize.query(`
		-- Gap-free shipment references per exporter and year (row lock while numbering).
		CREATE TABLE shipment_reference_counters (
			exporter_id uuid NOT NULL REFERENCES organizations (id) ON DELETE CASCADE,
			year integer NOT NULL CHECK (year BETWEEN 2000 AND 2999),
			last_value integer NOT NULL CHECK (last_value >= 0),
			PRIMARY KEY (exporter_id, year)
		);

		CREATE TABLE shipments (
			id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
			reference text NOT NULL UNIQUE,
			exporter_id uuid NOT NULL REFERENCES organizations (id) ON DELETE RESTRICT,
			customer_id uuid NOT NULL REFERENCES organizations (id) ON DELETE RESTRICT,
			broker_id uuid REFERENCES organizations (id) ON DELETE SET NULL,
			consignee_id uuid REFERENCES parties (id) ON DELETE RESTRICT,
			notify_party_id uuid REFERENCES parties (id) ON DELETE RESTRICT,
			incoterm char(3) NOT NULL CHECK (incoterm IN (${INCOTERMS})),
			incoterm_place text NOT NULL CHECK (length(btrim(incoterm_place)) > 0),
			origin_id uuid NOT NULL REFERENCES places (id) ON DELETE RESTRICT,
			destination_id uuid NOT NULL REFERENCES places (id) ON DELETE RESTRICT,
			modes_considered text[] NOT NULL DEFAULT '{}' CHECK (modes_considered <@ ARRAY[${MODES}]),
			chosen_mode text CHECK (chosen_mode IN (${MODES})),
			currency char(3) NOT NULL CHECK (currency ~ '^[A-Z]{3}$'),
			status text NOT NULL DEFAULT 'draft' CHECK (status IN (${STATUSES})),
			pallet_type_id uuid REFERENCES pallet_types (id) ON DELETE SET NULL,
			carrier text,
			vessel text,
			voyage_or_flight text,
			booking_number text,
			etd date,
			eta date,
			notes text,
			version integer NOT NULL DEFAULT 0,
			created_by uuid REFERENCES users (id) ON DELETE SET NULL,
			created_at timestamptz NOT NULL DEFAULT now(),
			updated_at timestamptz NOT NULL DEFAULT now(),
			CHECK (eta IS NULL OR etd IS NULL OR eta >= etd),
			CHECK (chosen_mode IS NULL OR chosen_mode = ANY (modes_considered))
		);
		CREATE INDEX shipments_status_idx ON shipments (status, etd);
		CREATE INDEX shipments_customer_idx ON shipments (customer_id, created_at DESC);
		CREATE INDEX shipments_broker_idx ON shipments (broker_id);
		CREATE INDEX shipments_etd_idx ON shipments (etd);
		CREATE INDEX shipments_created_idx ON shipments (created_at DESC);
		CREATE INDEX shipments_mode_idx ON shipments (chosen_mode);

		CREATE TABLE shipment_lines (
			id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
			shipment_id uuid NOT NULL REFERENCES shipments (id) ON DELETE CASCADE,
			position integer NOT NULL CHECK (position > 0),
			product_id uuid NOT NULL REFERENCES products (id) ON DELETE RESTRICT,
			quantity integer NOT NULL CHECK (quantity > 0),
			unit_price numeric(14, 4) NOT NULL CHECK (unit_price >= 0),
			created_at timestamptz NOT NULL DEFAULT now(),
			updated_at timestamptz NOT NULL DEFAULT now(),
			UNIQUE (shipment_id, position)
		);
		CREATE INDEX shipment_lines_product_idx ON shipment_lines (product_id);

		CREATE TABLE shipment_status_events (
			id bigint GENERATED ALWAYS AS IDENTITY PRIMARY KEY,
			shipment_id uuid NOT NULL REFERENCES shipments (id) ON DELETE CASCADE,
			from_status text CHECK (from_status IN (${STATUSES})),
			to_status text NOT NULL CHECK (to_status IN (${STATUSES})),
			actor_user_id uuid REFERENCES users (id) ON DELETE SET NULL,
			note text,
			occurred_at timestamptz NOT NULL DEFAULT now()
		);
		CREATE INDEX shipment_status_events_shipment_idx ON shipment_status_events (shipment_id, occurred_at);

		CREATE TABLE shipment_containers (
			id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
			shipment_id uuid NOT NULL REFERENCES shipments (id) ON DELETE CASCADE,
			container_type_id uuid REFERENCES container_types (id) ON DELETE RESTRICT,
			-- ISO 6346: owner code, category, serial, check digit (checked in the app too).
			container_number char(11) NOT NULL CHECK (container_number ~ '^[A-Z]{3}[UJZ][0-9]{7}$'),
			seal_number text CHECK (seal_number IS NULL OR length(btrim(seal_number)) BETWEEN 1 AND 40),
			created_at timestamptz NOT NULL DEFAULT now(),
			updated_at timestamptz NOT NULL DEFAULT now(),
			UNIQUE (shipment_id, container_number)
		);
	`);
};

export const down: Migration = async ({ context: qi }) => {
	await qi.sequelize.query(`
		DROP TABLE shipment_containers; DROP TABLE shipment_status_events; DROP TABLE shipment_lines;
		DROP TABLE shipments; DROP TABLE shipment_reference_counters;
	`);
};
