-- 10,000 benchmark shipments (3 lines each) in one set-based pass, on top of the demo seed.
-- References SHP-2025-00001…SHP-2025-10000; statuses, customers, places, modes and ETDs spread
-- at random (fixed seed) over about two years. Run by scripts/bench/measure.sh via psql.
\set ON_ERROR_STOP on
SELECT setseed(0.20261201);

BEGIN;

CREATE TEMP TABLE bench_ref ON COMMIT DROP AS
SELECT
	(SELECT id FROM organizations WHERE kind = 'exporter' ORDER BY name LIMIT 1) AS exporter,
	(SELECT array_agg(id ORDER BY name) FROM organizations WHERE kind = 'customer') AS customers,
	(SELECT id FROM organizations WHERE kind = 'broker' ORDER BY name LIMIT 1) AS broker,
	(SELECT array_agg(id ORDER BY code) FROM places WHERE country_code IN ('MY', 'VN')) AS origins,
	(SELECT array_agg(id ORDER BY code) FROM places WHERE country_code NOT IN ('MY', 'VN')) AS destinations,
	(SELECT array_agg(id ORDER BY sku) FROM products) AS products,
	(SELECT id FROM users WHERE lower(email) = 'coordinator@solvrae.example') AS creator;

DO $$
DECLARE r bench_ref;
BEGIN
	SELECT * INTO r FROM bench_ref;
	IF r.exporter IS NULL OR r.broker IS NULL OR r.creator IS NULL
		OR cardinality(r.customers) IS NULL OR cardinality(r.origins) IS NULL
		OR cardinality(r.destinations) IS NULL OR cardinality(r.products) IS NULL THEN
		RAISE EXCEPTION 'demo seed missing (exporter, customers, broker, places, products or coordinator)';
	END IF;
END $$;

INSERT INTO shipments (
	reference, exporter_id, customer_id, broker_id, incoterm, incoterm_place, origin_id,
	destination_id, modes_considered, chosen_mode, currency, status, carrier, booking_number,
	etd, eta, notes, created_by, created_at, updated_at
)
SELECT
	'SHP-2025-' || lpad(x.g::text, 5, '0'),
	r.exporter,
	r.customers[1 + floor(x.r_customer * cardinality(r.customers))::int],
	CASE WHEN x.r_broker < 0.4 THEN r.broker END,
	(ARRAY['FOB', 'CIF', 'DAP', 'FCA', 'EXW', 'DDP', 'CPT'])[1 + floor(x.r_incoterm * 7)::int],
	'Port Klang',
	r.origins[1 + floor(x.r_origin * cardinality(r.origins))::int],
	r.destinations[1 + floor(x.r_destination * cardinality(r.destinations))::int],
	m.modes,
	CASE WHEN st.status = 'draft' THEN NULL ELSE m.modes[1] END,
	CASE WHEN x.r_currency < 0.7 THEN 'USD' ELSE 'EUR' END,
	st.status,
	CASE WHEN st.status = 'draft' THEN NULL ELSE 'Bench Line' END,
	CASE WHEN st.status = 'draft' THEN NULL ELSE 'BK' || lpad(x.g::text, 7, '0') END,
	d.etd,
	d.etd + 3 + floor(x.r_transit * 40)::int,
	'benchmark data',
	r.creator,
	d.created_at,
	d.created_at
FROM (
	SELECT g, random() AS r_customer, random() AS r_broker, random() AS r_incoterm,
	       random() AS r_origin, random() AS r_destination, random() AS r_modes,
	       random() AS r_currency, random() AS r_status, random() AS r_etd, random() AS r_transit,
	       random() AS r_created, random() AS r_undated
	  FROM generate_series(1, 10000) AS g
) AS x
CROSS JOIN bench_ref AS r
CROSS JOIN LATERAL (
	SELECT CASE
		WHEN x.r_status < 0.10 THEN 'draft'
		WHEN x.r_status < 0.25 THEN 'booked'
		WHEN x.r_status < 0.35 THEN 'documents_issued'
		WHEN x.r_status < 0.50 THEN 'in_transit'
		WHEN x.r_status < 0.60 THEN 'arrived'
		WHEN x.r_status < 0.70 THEN 'cleared'
		WHEN x.r_status < 0.95 THEN 'delivered'
		ELSE 'cancelled'
	END AS status
) AS st
CROSS JOIN LATERAL (
	SELECT string_to_array((ARRAY[
		'sea_fcl', 'sea_lcl,air', 'air,courier', 'sea_fcl,sea_lcl', 'road', 'courier'
	])[1 + floor(x.r_modes * 6)::int], ',') AS modes
) AS m
CROSS JOIN LATERAL (
	SELECT
		CASE WHEN st.status = 'draft' AND x.r_undated < 0.3 THEN NULL
		     ELSE current_date - 600 + floor(x.r_etd * 730)::int END AS etd,
		(current_date - 600 + floor(x.r_etd * 730)::int - 3 - floor(x.r_created * 50)::int)::timestamptz
			+ x.r_created * interval '20 hours' AS created_at
) AS d;

INSERT INTO shipment_lines (shipment_id, position, product_id, quantity, unit_price)
SELECT s.id, p.position, pr.id, pick.quantity, pr.unit_price
  FROM shipments AS s
 CROSS JOIN generate_series(1, 3) AS p(position)
 CROSS JOIN LATERAL (
	SELECT floor(random() * (SELECT count(*) FROM products))::int AS k,
	       1 + floor(random() * 5000)::int AS quantity
	 WHERE p.position > 0 AND s.id IS NOT NULL
 ) AS pick
  JOIN (SELECT id, unit_price, (row_number() OVER (ORDER BY sku) - 1)::int AS k FROM products) AS pr
    ON pr.k = pick.k
 WHERE s.reference LIKE 'SHP-2025-%';

-- Keep the app's own numbering clear of the benchmark references.
INSERT INTO shipment_reference_counters (exporter_id, year, last_value)
SELECT exporter, 2025, 10000 FROM bench_ref
ON CONFLICT (exporter_id, year) DO UPDATE SET last_value = GREATEST(shipment_reference_counters.last_value, 10000);

COMMIT;

ANALYZE organizations, places, products, users, shipments, shipment_lines;

SELECT (SELECT count(*) FROM shipments) AS shipments,
       (SELECT count(*) FROM shipment_lines) AS lines,
       (SELECT count(*) FROM shipments WHERE status = 'booked') AS booked,
       (SELECT min(etd) FROM shipments) AS first_etd,
       (SELECT max(etd) FROM shipments) AS last_etd;
