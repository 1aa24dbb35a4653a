import type { Migration } from '../src/lib/server/db/migrator';

// Supporting documents (UN38.3 summaries, safety data sheets, supplier declarations, proofs of
// origin…) kept for a shipment or for a product: exactly one of the two. The file itself is
// stored here (bytea) with its SHA-256, so a backup holds everything and any app process can
// serve it. Only PDF, PNG and JPEG, recognised by content (src/lib/uploads/file-check.ts), at
// most 10 MiB. Retired rather than deleted, so a paper issued on the strength of one can be
// explained later. Every download is logged.
const KINDS = `'un38_3_summary', 'safety_data_sheet', 'restricted_substances', 'conflict_minerals', 'proof_of_origin', 'other'`;

export const up: Migration = async ({ context: qi }) => {
	await qi.sequelize.query(`
		CREATE TABLE supporting_documents (
			id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
			shipment_id uuid REFERENCES shipments (id) ON DELETE RESTRICT,
			product_id uuid REFERENCES products (id) ON DELETE RESTRICT,
			kind text NOT NULL CHECK (kind IN (${KINDS})),
			title text NOT NULL CHECK (char_length(title) BETWEEN 1 AND 200),
			file_name text NOT NULL CHECK (char_length(file_name) BETWEEN 1 AND 120),
			content_type text NOT NULL CHECK (content_type IN ('application/pdf', 'image/png', 'image/jpeg')),
			size_bytes integer NOT NULL CHECK (size_bytes BETWEEN 1 AND 10485760),
			sha256 char(64) NOT NULL CHECK (sha256 ~ '^[0-9a-f]{64}$'),
			content bytea NOT NULL,
			issued_on date,
			expires_on date CHECK (expires_on IS NULL OR issued_on IS NULL OR expires_on >= issued_on),
			reminder_sent_at timestamptz,
			uploaded_by uuid REFERENCES users (id) ON DELETE SET NULL,
			created_at timestamptz NOT NULL DEFAULT now(),
			retired_at timestamptz,
			retired_by uuid REFERENCES users (id) ON DELETE SET NULL,
			CHECK ((shipment_id IS NULL) <> (product_id IS NULL)),
			CHECK (length(content) = size_bytes)
		);
		CREATE INDEX supporting_documents_shipment_idx ON supporting_documents (shipment_id) WHERE shipment_id IS NOT NULL;
		CREATE INDEX supporting_documents_product_idx ON supporting_documents (product_id, kind) WHERE product_id IS NOT NULL;
		CREATE INDEX supporting_documents_expiry_idx ON supporting_documents (expires_on)
			WHERE retired_at IS NULL AND reminder_sent_at IS NULL AND expires_on IS NOT NULL;

		CREATE TABLE supporting_document_downloads (
			id bigserial PRIMARY KEY,
			document_id uuid NOT NULL REFERENCES supporting_documents (id) ON DELETE CASCADE,
			user_id uuid REFERENCES users (id) ON DELETE SET NULL,
			via text NOT NULL CHECK (via IN ('file', 'api')),
			ip text,
			downloaded_at timestamptz NOT NULL DEFAULT now()
		);
		CREATE INDEX supporting_document_downloads_idx ON supporting_document_downloads (document_id, downloaded_at);
	`);
};

export const down: Migration = async ({ context: qi }) => {
	await qi.sequelize.query(`
		DROP TABLE supporting_document_downloads;
		DROP TABLE supporting_documents;
	`);
};
