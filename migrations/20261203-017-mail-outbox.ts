import type { Migration } from '../src/lib/server/db/migrator';

// E-mail goes through mail_outbox: a service writes the row in the transaction that makes the
// change, so a message is queued exactly when the change commits. The dispatcher
// (src/lib/server/mail/dispatcher.ts) claims due rows with FOR UPDATE SKIP LOCKED, sends them
// and marks them sent, or moves next_attempt_at back (exponential backoff) until it gives up.
// dedupe_key is unique: the same notice (e.g. one receipt per deposit) is queued once.
//
// user_invitations: single-use set-password links. Only the SHA-256 of the token is stored, so
// a copy of the table opens no account.
const KINDS = `'invitation', 'booking_confirmed', 'documents_issued', 'deposit_requested',
	'payment_received', 'deposit_refunded', 'document_reminder'`;

export const up: Migration = async ({ context: qi }) => {
	await qi.sequelize.query(`
		CREATE TABLE mail_outbox (
			id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
			kind text NOT NULL CHECK (kind IN (${KINDS})),
			recipient text NOT NULL CHECK (length(recipient) BETWEEN 3 AND 254),
			subject text NOT NULL CHECK (length(subject) BETWEEN 1 AND 300),
			html text NOT NULL,
			text text NOT NULL,
			status text NOT NULL DEFAULT 'queued' CHECK (status IN ('queued', 'sent', 'failed')),
			attempts integer NOT NULL DEFAULT 0 CHECK (attempts >= 0),
			next_attempt_at timestamptz NOT NULL DEFAULT now(),
			last_error text CHECK (last_error IS NULL OR length(last_error) <= 1000),
			dedupe_key text NOT NULL UNIQUE CHECK (length(dedupe_key) BETWEEN 1 AND 300),
			created_at timestamptz NOT NULL DEFAULT now(),
			sent_at timestamptz,
			CHECK ((status = 'sent') = (sent_at IS NOT NULL))
		);
		CREATE INDEX mail_outbox_due_idx ON mail_outbox (next_attempt_at) WHERE status = 'queued';
		CREATE INDEX mail_outbox_created_idx ON mail_outbox (created_at DESC);

		CREATE TABLE user_invitations (
			id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
			user_id uuid NOT NULL REFERENCES users (id) ON DELETE CASCADE,
			token_hash char(64) NOT NULL UNIQUE CHECK (token_hash ~ '^[0-9a-f]{64}$'),
			expires_at timestamptz NOT NULL,
			used_at timestamptz,
			invited_by uuid REFERENCES users (id) ON DELETE SET NULL,
			created_at timestamptz NOT NULL DEFAULT now()
		);
		CREATE INDEX user_invitations_user_idx ON user_invitations (user_id);
	`);
};

export const down: Migration = async ({ context: qi }) => {
	await qi.sequelize.query(`
		DROP TABLE user_invitations;
		DROP TABLE mail_outbox;
	`);
};
