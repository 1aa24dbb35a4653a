import type { Migration } from '../src/lib/server/db/migrator';

export const up: Migration = async ({ context: qi }) => {
	await qi.sequelize.transaction(async (transaction) => {
		await qi.sequelize.query(
			`
			CREATE TABLE organizations (
				id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
				name text NOT NULL CHECK (length(btrim(name)) BETWEEN 1 AND 200),
				kind text NOT NULL CHECK (kind IN ('exporter', 'customer', 'broker', 'forwarder')),
				country_code char(2) NOT NULL CHECK (country_code ~ '^[A-Z]{2}$'),
				created_at timestamptz NOT NULL DEFAULT now(),
				updated_at timestamptz NOT NULL DEFAULT now()
			);
			CREATE UNIQUE INDEX organizations_name_key ON organizations (lower(name));
			CREATE INDEX organizations_kind_idx ON organizations (kind);

			CREATE TABLE organization_addresses (
				id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
				organization_id uuid NOT NULL REFERENCES organizations (id) ON DELETE CASCADE,
				purpose text NOT NULL
					CHECK (purpose IN ('registered', 'billing', 'delivery', 'factory', 'office')),
				label text,
				line1 text NOT NULL CHECK (length(btrim(line1)) > 0),
				line2 text,
				city text NOT NULL CHECK (length(btrim(city)) > 0),
				postal_code text,
				region text,
				country_code char(2) NOT NULL CHECK (country_code ~ '^[A-Z]{2}$'),
				created_at timestamptz NOT NULL DEFAULT now(),
				updated_at timestamptz NOT NULL DEFAULT now()
			);
			CREATE INDEX organization_addresses_organization_idx
				ON organization_addresses (organization_id);

			CREATE TABLE organization_tax_ids (
				id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
				organization_id uuid NOT NULL REFERENCES organizations (id) ON DELETE CASCADE,
				type text NOT NULL CHECK (type ~ '^[A-Z0-9_]{2,20}$'),
				value text NOT NULL CHECK (length(btrim(value)) BETWEEN 1 AND 64),
				country_code char(2) CHECK (country_code ~ '^[A-Z]{2}$'),
				created_at timestamptz NOT NULL DEFAULT now(),
				updated_at timestamptz NOT NULL DEFAULT now(),
				UNIQUE (organization_id, type, value)
			);
			`,
			{ transaction }
		);
	});
};

export const down: Migration = async ({ context: qi }) => {
	await qi.sequelize.query(
		'DROP TABLE organization_tax_ids; DROP TABLE organization_addresses; DROP TABLE organizations;'
	);
};
