import type { Migration } from '../src/lib/server/db/migrator';

// Equipment types, places, parties and products with their packaging.
// Masses: NUMERIC kg with 3 decimals (grams), 4 for per-unit net weights; lengths: integer mm.
export const up: Migration = async ({ context: qi }) => {
	await qi.sequelize.query(`
		CREATE TABLE pallet_types (
			id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
			code text NOT NULL UNIQUE CHECK (code ~ '^[A-Z0-9]{2,12}$'),
			name text NOT NULL,
			length_mm integer NOT NULL CHECK (length_mm > 0),
			width_mm integer NOT NULL CHECK (width_mm > 0),
			deck_height_mm integer NOT NULL CHECK (deck_height_mm > 0),
			tare_kg numeric(10, 3) NOT NULL CHECK (tare_kg > 0),
			max_gross_kg numeric(10, 3) NOT NULL CHECK (max_gross_kg > tare_kg),
			max_loaded_height_mm integer NOT NULL CHECK (max_loaded_height_mm > deck_height_mm),
			source_note text NOT NULL,
			created_at timestamptz NOT NULL DEFAULT now(),
			updated_at timestamptz NOT NULL DEFAULT now()
		);

		CREATE TABLE container_types (
			id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
			code text NOT NULL UNIQUE CHECK (code ~ '^[A-Z0-9]{2,12}$'),
			name text NOT NULL,
			iso668_designation text NOT NULL,
			iso6346_size_type char(4) NOT NULL,
			internal_length_mm integer NOT NULL CHECK (internal_length_mm > 0),
			internal_width_mm integer NOT NULL CHECK (internal_width_mm > 0),
			internal_height_mm integer NOT NULL CHECK (internal_height_mm > 0),
			door_width_mm integer NOT NULL CHECK (door_width_mm > 0),
			door_height_mm integer NOT NULL CHECK (door_height_mm > 0),
			tare_kg numeric(10, 3) NOT NULL CHECK (tare_kg > 0),
			max_gross_kg numeric(10, 3) NOT NULL,
			max_payload_kg numeric(10, 3) NOT NULL CHECK (max_payload_kg = max_gross_kg - tare_kg),
			source_note text NOT NULL,
			created_at timestamptz NOT NULL DEFAULT now(),
			updated_at timestamptz NOT NULL DEFAULT now()
		);

		CREATE TABLE places (
			id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
			code char(5) NOT NULL UNIQUE CHECK (code ~ '^[A-Z]{2}[A-Z2-9]{3}$'),
			name text NOT NULL CHECK (length(btrim(name)) > 0),
			kind text NOT NULL
				CHECK (kind IN ('seaport', 'airport', 'inland', 'rail_terminal', 'road_terminal')),
			country_code char(2) NOT NULL CHECK (country_code ~ '^[A-Z]{2}$'),
			created_at timestamptz NOT NULL DEFAULT now(),
			updated_at timestamptz NOT NULL DEFAULT now()
		);

		-- Consignees, notify parties and other parties named on shipments and papers.
		CREATE TABLE parties (
			id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
			organization_id uuid REFERENCES organizations (id) ON DELETE SET NULL,
			name text NOT NULL CHECK (length(btrim(name)) BETWEEN 1 AND 200),
			line1 text NOT NULL,
			line2 text,
			city text NOT NULL,
			postal_code text,
			region text,
			country_code char(2) NOT NULL CHECK (country_code ~ '^[A-Z]{2}$'),
			contact_name text,
			email text,
			phone text,
			-- [{ "type": "EORI", "value": "DE…" }]: free text with a type, as the papers print them.
			tax_ids jsonb NOT NULL DEFAULT '[]' CHECK (jsonb_typeof(tax_ids) = 'array'),
			created_at timestamptz NOT NULL DEFAULT now(),
			updated_at timestamptz NOT NULL DEFAULT now()
		);
		CREATE INDEX parties_organization_idx ON parties (organization_id);

		CREATE TABLE products (
			id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
			sku text NOT NULL CHECK (sku ~ '^[A-Za-z0-9][A-Za-z0-9._/-]{0,39}$'),
			description text NOT NULL CHECK (length(btrim(description)) BETWEEN 1 AND 300),
			hs_code varchar(10) NOT NULL CHECK (hs_code ~ '^[0-9]{6}([0-9]{2}){0,2}$'),
			origin_country char(2) NOT NULL CHECK (origin_country ~ '^[A-Z]{2}$'),
			unit_price numeric(14, 4) NOT NULL CHECK (unit_price >= 0),
			currency char(3) NOT NULL CHECK (currency ~ '^[A-Z]{3}$'),
			net_kg_per_unit numeric(12, 4) NOT NULL CHECK (net_kg_per_unit > 0),
			battery_config text NOT NULL DEFAULT 'none'
				CHECK (battery_config IN ('none', 'contained', 'packed_with', 'standalone')),
			battery_chemistry text CHECK (battery_chemistry IN ('lithium_ion', 'lithium_metal')),
			cell_wh numeric(10, 2) CHECK (cell_wh > 0),
			battery_wh numeric(10, 2) CHECK (battery_wh > 0),
			cell_lithium_g numeric(10, 3) CHECK (cell_lithium_g > 0),
			battery_lithium_g numeric(10, 3) CHECK (battery_lithium_g > 0),
			nominal_voltage numeric(8, 3) CHECK (nominal_voltage > 0),
			capacity_ah numeric(10, 4) CHECK (capacity_ah > 0),
			cells_per_battery integer CHECK (cells_per_battery > 0),
			batteries_per_unit integer CHECK (batteries_per_unit > 0),
			version integer NOT NULL DEFAULT 0,
			created_at timestamptz NOT NULL DEFAULT now(),
			updated_at timestamptz NOT NULL DEFAULT now(),
			CHECK (battery_config = 'none' OR battery_chemistry IS NOT NULL)
		);
		CREATE UNIQUE INDEX products_sku_key ON products (lower(sku));

		CREATE TABLE product_packagings (
			id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
			product_id uuid NOT NULL UNIQUE REFERENCES products (id) ON DELETE CASCADE,
			units_per_carton integer NOT NULL CHECK (units_per_carton > 0),
			carton_length_mm integer NOT NULL CHECK (carton_length_mm > 0),
			carton_width_mm integer NOT NULL CHECK (carton_width_mm > 0),
			carton_height_mm integer NOT NULL CHECK (carton_height_mm > 0),
			carton_gross_kg numeric(10, 3) NOT NULL CHECK (carton_gross_kg > 0),
			orientation text NOT NULL DEFAULT 'any' CHECK (orientation IN ('any', 'this_way_up')),
			-- NULL: not stackable (nothing may stand on it).
			max_load_on_top_kg numeric(10, 3) CHECK (max_load_on_top_kg >= 0),
			created_at timestamptz NOT NULL DEFAULT now(),
			updated_at timestamptz NOT NULL DEFAULT now()
		);
	`);
};

export const down: Migration = async ({ context: qi }) => {
	await qi.sequelize.query(`
		DROP TABLE product_packagings; DROP TABLE products; DROP TABLE parties;
		DROP TABLE places; DROP TABLE container_types; DROP TABLE pallet_types;
	`);
};
