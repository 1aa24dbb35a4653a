import type { Migration } from '../src/lib/server/db/migrator';

export const up: Migration = async ({ context: qi }) => {
	await qi.sequelize.query(`
		CREATE TABLE users (
			id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
			organization_id uuid NOT NULL REFERENCES organizations (id) ON DELETE RESTRICT,
			role text NOT NULL CHECK (role IN ('admin', 'coordinator', 'broker', 'finance', 'customer')),
			email text NOT NULL CHECK (email ~ '^[^@\\s]+@[^@\\s]+$' AND length(email) <= 254),
			name text NOT NULL CHECK (length(btrim(name)) BETWEEN 1 AND 120),
			password_hash text NOT NULL,
			disabled boolean NOT NULL DEFAULT false,
			last_sign_in_at timestamptz,
			version integer NOT NULL DEFAULT 0,
			created_at timestamptz NOT NULL DEFAULT now(),
			updated_at timestamptz NOT NULL DEFAULT now()
		);
		-- One account per address, whatever its letter case.
		CREATE UNIQUE INDEX users_email_key ON users (lower(email));
		CREATE INDEX users_organization_idx ON users (organization_id);
	`);
};

export const down: Migration = async ({ context: qi }) => {
	await qi.sequelize.query('DROP TABLE users;');
};
