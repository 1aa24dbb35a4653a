import type { Migration } from '../src/lib/server/db/migrator';

export const up: Migration = async ({ context: qi }) => {
	await qi.sequelize.query(`
		CREATE TABLE audit_events (
			id bigint GENERATED ALWAYS AS IDENTITY PRIMARY KEY,
			actor_user_id uuid REFERENCES users (id) ON DELETE SET NULL,
			action text NOT NULL,
			entity text NOT NULL,
			entity_id text,
			before jsonb,
			after jsonb,
			ip text,
			occurred_at timestamptz NOT NULL DEFAULT now()
		);
		CREATE INDEX audit_events_entity_idx ON audit_events (entity, entity_id);
		CREATE INDEX audit_events_occurred_idx ON audit_events (occurred_at DESC);
		CREATE INDEX audit_events_actor_idx ON audit_events (actor_user_id);

		-- Every sign-in try, for throttling; e-mail is stored lower-cased.
		CREATE TABLE sign_in_attempts (
			id bigint GENERATED ALWAYS AS IDENTITY PRIMARY KEY,
			email text NOT NULL,
			ip text,
			succeeded boolean NOT NULL,
			attempted_at timestamptz NOT NULL DEFAULT now()
		);
		CREATE INDEX sign_in_attempts_email_idx ON sign_in_attempts (email, attempted_at DESC);
		CREATE INDEX sign_in_attempts_ip_idx ON sign_in_attempts (ip, attempted_at DESC);
	`);
};

export const down: Migration = async ({ context: qi }) => {
	await qi.sequelize.query('DROP TABLE sign_in_attempts; DROP TABLE audit_events;');
};
