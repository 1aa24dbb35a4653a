import type { Migration } from '../src/lib/server/db/migrator';

// Customs papers. The shipment gains the fields only the papers print (payment terms, signatory…).
// document_counters hands out numbers per exporter, kind and year: the counter row is taken and
// bumped in the issuing transaction, so a rolled-back issue gives its number back (no gaps) and
// concurrent issues queue on the row (no duplicates). Each issue stores the snapshot it printed,
// the PDF and its SHA-256; a reissue adds revision B, C… of the same number and marks the
// previous one superseded.
export const up: Migration = async ({ context: qi }) => {
	await qi.sequelize.query(`
		ALTER TABLE shipments
			ADD COLUMN payment_terms text CHECK (payment_terms IS NULL OR length(payment_terms) <= 200),
			ADD COLUMN export_reason text CHECK (export_reason IS NULL OR length(export_reason) <= 100),
			ADD COLUMN freight_amount numeric(14, 4) CHECK (freight_amount IS NULL OR freight_amount >= 0),
			ADD COLUMN insurance_amount numeric(14, 4) CHECK (insurance_amount IS NULL OR insurance_amount >= 0),
			ADD COLUMN marks text CHECK (marks IS NULL OR length(marks) <= 500),
			ADD COLUMN signatory_name text CHECK (signatory_name IS NULL OR length(signatory_name) <= 100),
			ADD COLUMN signatory_title text CHECK (signatory_title IS NULL OR length(signatory_title) <= 100),
			ADD COLUMN signing_place text CHECK (signing_place IS NULL OR length(signing_place) <= 100);

		CREATE TABLE document_counters (
			exporter_id uuid NOT NULL REFERENCES organizations (id) ON DELETE RESTRICT,
			kind text NOT NULL,
			year integer NOT NULL CHECK (year BETWEEN 2000 AND 2999),
			last_sequence integer NOT NULL CHECK (last_sequence > 0),
			PRIMARY KEY (exporter_id, kind, year)
		);

		CREATE TABLE shipment_documents (
			id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
			shipment_id uuid NOT NULL REFERENCES shipments (id) ON DELETE RESTRICT,
			exporter_id uuid NOT NULL REFERENCES organizations (id) ON DELETE RESTRICT,
			kind text NOT NULL CHECK (kind IN ('commercial_invoice', 'packing_list')),
			year integer NOT NULL,
			sequence integer NOT NULL CHECK (sequence > 0),
			number text NOT NULL,
			revision_index integer NOT NULL CHECK (revision_index >= 0),
			revision text NOT NULL CHECK (revision ~ '^[A-Z]{1,3}$'),
			reason text CHECK (reason IS NULL OR length(reason) BETWEEN 1 AND 500),
			shipment_version integer NOT NULL,
			content_hash char(64) NOT NULL CHECK (content_hash ~ '^[0-9a-f]{64}$'),
			snapshot jsonb NOT NULL,
			pdf bytea NOT NULL,
			sha256 char(64) NOT NULL CHECK (sha256 ~ '^[0-9a-f]{64}$'),
			byte_size integer NOT NULL,
			pages integer NOT NULL CHECK (pages > 0),
			issued_by uuid REFERENCES users (id) ON DELETE SET NULL,
			issued_at timestamptz NOT NULL DEFAULT now(),
			superseded_at timestamptz,
			superseded_by uuid REFERENCES shipment_documents (id),
			-- A reissue says why; the first issue has nothing to explain.
			CHECK ((revision_index = 0) = (reason IS NULL)),
			UNIQUE (exporter_id, kind, year, sequence, revision_index),
			UNIQUE (number, revision)
		);
		-- One current paper of each kind per shipment.
		CREATE UNIQUE INDEX shipment_documents_current_idx
			ON shipment_documents (shipment_id, kind) WHERE superseded_at IS NULL;
		CREATE INDEX shipment_documents_shipment_idx ON shipment_documents (shipment_id, kind, revision_index);

		CREATE TABLE document_downloads (
			id bigserial PRIMARY KEY,
			document_id uuid NOT NULL REFERENCES shipment_documents (id) ON DELETE CASCADE,
			user_id uuid REFERENCES users (id) ON DELETE SET NULL,
			via text NOT NULL CHECK (via IN ('file', 'zip', 'api')),
			downloaded_at timestamptz NOT NULL DEFAULT now()
		);
		CREATE INDEX document_downloads_document_idx ON document_downloads (document_id, downloaded_at);
	`);
};

export const down: Migration = async ({ context: qi }) => {
	await qi.sequelize.query(`
		DROP TABLE document_downloads;
		DROP TABLE shipment_documents;
		DROP TABLE document_counters;
		ALTER TABLE shipments
			DROP COLUMN payment_terms, DROP COLUMN export_reason, DROP COLUMN freight_amount,
			DROP COLUMN insurance_amount, DROP COLUMN marks, DROP COLUMN signatory_name,
			DROP COLUMN signatory_title, DROP COLUMN signing_place;
	`);
};
