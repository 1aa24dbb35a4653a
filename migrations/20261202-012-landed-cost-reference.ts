import type { Migration } from '../src/lib/server/db/migrator';

// Reference data for landed cost (finance and administrators edit it). Every row names its source
// and the dates it is valid, and carries a version for optimistic locking. The parts of a rate
// card or rule that differ by mode or country are jsonb, checked by the zod schemas in
// src/lib/schemas/landed-cost.ts before they are written; what is queried by is a column.
// Saved scenarios freeze the whole engine input per mode, so they keep the rows they used.
const row = `
	source text NOT NULL CHECK (length(btrim(source)) BETWEEN 1 AND 500),
	valid_from date NOT NULL,
	valid_to date CHECK (valid_to IS NULL OR valid_to >= valid_from),
	version integer NOT NULL DEFAULT 0,
	created_at timestamptz NOT NULL DEFAULT now(),
	updated_at timestamptz NOT NULL DEFAULT now()`;

export const up: Migration = async ({ context: qi }) => {
	await qi.sequelize.query(`
		CREATE TABLE rate_cards (
			id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
			mode text NOT NULL CHECK (mode IN ('air', 'sea_fcl', 'sea_lcl', 'road', 'courier')),
			lane_from text NOT NULL CHECK (lane_from ~ '^[A-Z]{2}([A-Z0-9]{3})?$'),
			lane_to text NOT NULL CHECK (lane_to ~ '^[A-Z]{2}([A-Z0-9]{3})?$'),
			currency char(3) NOT NULL,
			transit_days integer NOT NULL CHECK (transit_days BETWEEN 0 AND 365),
			distance_km numeric(10, 1) CHECK (distance_km IS NULL OR distance_km > 0),
			-- Mode-specific rates, surcharges, origin and destination charges (RateCard in
			-- src/lib/landed-cost/types.ts without the columns above).
			terms jsonb NOT NULL,
			${row}
		);
		CREATE INDEX rate_cards_lane_idx ON rate_cards (lane_from, lane_to, mode, valid_from);

		CREATE TABLE tariff_rows (
			id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
			destination_country char(2) NOT NULL,
			hs_prefix text NOT NULL CHECK (hs_prefix ~ '^[0-9]{2,10}$'),
			agreement text CHECK (agreement IS NULL OR length(agreement) BETWEEN 1 AND 40),
			origin_countries char(2)[],
			duty jsonb NOT NULL,
			CHECK ((agreement IS NULL) = (origin_countries IS NULL)),
			${row}
		);
		CREATE INDEX tariff_rows_lookup_idx ON tariff_rows (destination_country, hs_prefix);

		CREATE TABLE country_rules (
			id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
			country char(2) NOT NULL,
			currency char(3) NOT NULL,
			valuation_basis text NOT NULL CHECK (valuation_basis IN ('CIF', 'FOB')),
			vat jsonb NOT NULL,
			rounding jsonb NOT NULL DEFAULT '{}',
			${row}
		);
		CREATE INDEX country_rules_country_idx ON country_rules (country, valid_from);

		CREATE TABLE customs_fees (
			id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
			country char(2) NOT NULL,
			code text NOT NULL CHECK (code ~ '^[A-Z0-9-]{2,20}$'),
			label text NOT NULL,
			kind text NOT NULL CHECK (kind IN ('ad_valorem', 'fixed')),
			rate_percent numeric(9, 6),
			amount numeric(14, 4),
			min_amount numeric(14, 4),
			max_amount numeric(14, 4),
			modes text[],
			CHECK ((kind = 'ad_valorem') = (rate_percent IS NOT NULL)),
			CHECK ((kind = 'fixed') = (amount IS NOT NULL)),
			${row}
		);
		CREATE INDEX customs_fees_country_idx ON customs_fees (country, code, valid_from);

		CREATE TABLE de_minimis_rules (
			id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
			country char(2) NOT NULL,
			duty_up_to numeric(14, 2),
			vat_up_to numeric(14, 2),
			currency char(3) NOT NULL,
			${row}
		);

		CREATE TABLE exchange_rates (
			id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
			base char(3) NOT NULL,
			quote char(3) NOT NULL CHECK (quote <> base),
			rate numeric(20, 10) NOT NULL CHECK (rate > 0),
			${row},
			UNIQUE (base, quote, valid_from)
		);

		CREATE TABLE emission_factors (
			id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
			mode text NOT NULL CHECK (mode IN ('air', 'sea_fcl', 'sea_lcl', 'road', 'courier')),
			g_co2e_per_tonne_km numeric(10, 3) NOT NULL CHECK (g_co2e_per_tonne_km > 0),
			${row}
		);

		-- One row: finance's assumptions (insurance, cost of money in transit, brokerage per country).
		CREATE TABLE landed_cost_settings (
			id integer PRIMARY KEY CHECK (id = 1),
			insurance_rate_percent numeric(7, 4) NOT NULL CHECK (insurance_rate_percent >= 0),
			insurance_uplift_percent numeric(7, 4) NOT NULL CHECK (insurance_uplift_percent >= 0),
			minimum_premium numeric(14, 2),
			insurance_source text NOT NULL,
			carrying_rate_percent numeric(7, 4) NOT NULL CHECK (carrying_rate_percent >= 0),
			allocation text NOT NULL CHECK (allocation IN ('weight', 'value')),
			brokerage jsonb NOT NULL DEFAULT '{}',
			version integer NOT NULL DEFAULT 0,
			updated_at timestamptz NOT NULL DEFAULT now()
		);

		CREATE TABLE landed_cost_scenarios (
			id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
			shipment_id uuid NOT NULL REFERENCES shipments (id) ON DELETE CASCADE,
			name text NOT NULL CHECK (length(btrim(name)) BETWEEN 1 AND 100),
			-- Per mode: the frozen engine input (with the rows it used) and its result.
			inputs jsonb NOT NULL,
			results jsonb NOT NULL,
			created_by uuid REFERENCES users (id) ON DELETE SET NULL,
			created_at timestamptz NOT NULL DEFAULT now()
		);
		CREATE INDEX landed_cost_scenarios_shipment_idx ON landed_cost_scenarios (shipment_id, created_at);
	`);
};

export const down: Migration = async ({ context: qi }) => {
	await qi.sequelize.query(`
		DROP TABLE landed_cost_scenarios, landed_cost_settings, emission_factors, exchange_rates,
			de_minimis_rules, customs_fees, country_rules, tariff_rows, rate_cards;
	`);
};
