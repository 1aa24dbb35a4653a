import type { Migration } from '../src/lib/server/db/migrator';

// Freight deposits a customer pays by card through Stripe Checkout. Amounts are whole ISO 4217
// minor units (bigint), as Stripe takes them. A percent deposit keeps the percentage and the
// freight estimate it was computed from, so the figure can be explained later. The state moves
// only through services/deposits.ts; a payment learnt from a webhook that does not match is
// recorded with mismatch_reason and leaves the state alone.
//
// stripe_events holds every webhook event id once: the INSERT … ON CONFLICT DO NOTHING runs in
// the transaction that applies the event, so a duplicated or concurrent delivery changes nothing.
const STATES = `'requested', 'paid', 'expired', 'cancelled', 'refunded'`;
const MODES = `'air', 'sea_fcl', 'sea_lcl', 'road', 'courier'`;

export const up: Migration = async ({ context: qi }) => {
	await qi.sequelize.query(`
		CREATE TABLE deposits (
			id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
			shipment_id uuid NOT NULL REFERENCES shipments (id) ON DELETE RESTRICT,
			-- The customer who pays: the shipment's customer when requested.
			organization_id uuid NOT NULL REFERENCES organizations (id) ON DELETE RESTRICT,
			amount_minor bigint NOT NULL CHECK (amount_minor > 0),
			currency char(3) NOT NULL CHECK (currency ~ '^[A-Z]{3}$'),
			basis text NOT NULL CHECK (basis IN ('amount', 'percent')),
			percent numeric(7, 4) CHECK (percent IS NULL OR (percent > 0 AND percent <= 100)),
			estimate_amount numeric(16, 4) CHECK (estimate_amount IS NULL OR estimate_amount >= 0),
			estimate_currency char(3) CHECK (estimate_currency IS NULL OR estimate_currency ~ '^[A-Z]{3}$'),
			estimate_mode text CHECK (estimate_mode IS NULL OR estimate_mode IN (${MODES})),
			estimate_date date,
			due_date date NOT NULL,
			note text CHECK (note IS NULL OR length(note) <= 500),
			state text NOT NULL DEFAULT 'requested' CHECK (state IN (${STATES})),
			checkout_session_id text UNIQUE CHECK (checkout_session_id IS NULL OR checkout_session_id ~ '^cs_'),
			checkout_url text,
			payment_intent_id text UNIQUE CHECK (payment_intent_id IS NULL OR payment_intent_id ~ '^pi_'),
			refund_id text UNIQUE CHECK (refund_id IS NULL OR refund_id ~ '^re_'),
			paid_amount_minor bigint CHECK (paid_amount_minor IS NULL OR paid_amount_minor >= 0),
			paid_currency char(3),
			paid_at timestamptz,
			mismatch_reason text CHECK (mismatch_reason IS NULL OR length(mismatch_reason) <= 500),
			last_failure text CHECK (last_failure IS NULL OR length(last_failure) <= 500),
			refunded_at timestamptz,
			requested_by uuid REFERENCES users (id) ON DELETE SET NULL,
			created_at timestamptz NOT NULL DEFAULT now(),
			updated_at timestamptz NOT NULL DEFAULT now(),
			version integer NOT NULL DEFAULT 0,
			-- A percent deposit says which percentage of which estimate it is; an amount has neither.
			CHECK ((basis = 'percent') = (percent IS NOT NULL)),
			CHECK ((basis = 'percent') = (estimate_amount IS NOT NULL AND estimate_currency IS NOT NULL
				AND estimate_mode IS NOT NULL AND estimate_date IS NOT NULL)),
			CHECK (state <> 'paid' OR (payment_intent_id IS NOT NULL AND paid_amount_minor IS NOT NULL)),
			CHECK (state <> 'refunded' OR refund_id IS NOT NULL)
		);
		CREATE INDEX deposits_shipment_idx ON deposits (shipment_id, created_at);
		CREATE INDEX deposits_organization_idx ON deposits (organization_id, state);
		CREATE INDEX deposits_due_idx ON deposits (due_date) WHERE state = 'requested';

		CREATE TABLE stripe_events (
			id text PRIMARY KEY CHECK (id ~ '^evt_'),
			type text NOT NULL,
			deposit_id uuid REFERENCES deposits (id) ON DELETE SET NULL,
			received_at timestamptz NOT NULL DEFAULT now(),
			handled_at timestamptz,
			outcome text CHECK (outcome IS NULL OR length(outcome) <= 500)
		);
		CREATE INDEX stripe_events_deposit_idx ON stripe_events (deposit_id) WHERE deposit_id IS NOT NULL;
	`);
};

export const down: Migration = async ({ context: qi }) => {
	await qi.sequelize.query(`
		DROP TABLE stripe_events;
		DROP TABLE deposits;
	`);
};
