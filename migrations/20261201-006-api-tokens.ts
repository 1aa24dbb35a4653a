import type { Migration } from '../src/lib/server/db/migrator';

// API tokens for integrations: only a SHA-256 hash of each token is stored.
export const up: Migration = async ({ context: qi }) => {
	await qi.sequelize.query(`
		CREATE TABLE api_tokens (
			id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
			user_id uuid NOT NULL REFERENCES users (id) ON DELETE CASCADE,
			name text NOT NULL CHECK (length(btrim(name)) BETWEEN 1 AND 80),
			token_hash char(64) NOT NULL UNIQUE CHECK (token_hash ~ '^[0-9a-f]{64}$'),
			-- The first characters, so people can tell their tokens apart.
			prefix text NOT NULL,
			created_by uuid REFERENCES users (id) ON DELETE SET NULL,
			created_at timestamptz NOT NULL DEFAULT now(),
			last_used_at timestamptz,
			revoked_at timestamptz
		);
		CREATE INDEX api_tokens_user_idx ON api_tokens (user_id);
	`);
};

export const down: Migration = async ({ context: qi }) => {
	await qi.sequelize.query('DROP TABLE api_tokens;');
};
