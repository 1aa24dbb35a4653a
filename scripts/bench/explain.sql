-- The shipments list queries of src/lib/server/services/shipment-list.ts for a staff user
-- (scope TRUE), page 1 of 25, with the replacements filled in. Keep in step with that file.
\set ON_ERROR_STOP on
\pset pager off

\echo
\echo '-- /shipments (sort=created, dir=desc): the page query'
EXPLAIN (ANALYZE, BUFFERS, COSTS OFF)
SELECT s.id, s.reference, s.status, c.name AS "customerName", o.code AS "originCode",
       d.code AS "destinationCode", s.chosen_mode AS "chosenMode",
       s.modes_considered AS "modesConsidered", s.incoterm, s.etd, s.eta,
       (SELECT count(*)::int FROM shipment_lines l WHERE l.shipment_id = s.id) AS "lineCount",
       s.created_at AS "createdAt"
  FROM shipments s
  JOIN organizations c ON c.id = s.customer_id
  JOIN places o ON o.id = s.origin_id
  JOIN places d ON d.id = s.destination_id
 WHERE TRUE
 ORDER BY s.created_at DESC NULLS LAST, s.id DESC
 LIMIT 25 OFFSET 0;

\echo '-- /shipments: the count query'
EXPLAIN (ANALYZE, BUFFERS, COSTS OFF)
SELECT count(*)::int AS total FROM shipments s WHERE TRUE;

\echo '-- /shipments?status=booked&sort=etd (dir=desc): the page query'
EXPLAIN (ANALYZE, BUFFERS, COSTS OFF)
SELECT s.id, s.reference, s.status, c.name AS "customerName", o.code AS "originCode",
       d.code AS "destinationCode", s.chosen_mode AS "chosenMode",
       s.modes_considered AS "modesConsidered", s.incoterm, s.etd, s.eta,
       (SELECT count(*)::int FROM shipment_lines l WHERE l.shipment_id = s.id) AS "lineCount",
       s.created_at AS "createdAt"
  FROM shipments s
  JOIN organizations c ON c.id = s.customer_id
  JOIN places o ON o.id = s.origin_id
  JOIN places d ON d.id = s.destination_id
 WHERE TRUE AND s.status = 'booked'
 ORDER BY s.etd DESC NULLS LAST, s.id DESC
 LIMIT 25 OFFSET 0;

\echo '-- /shipments?status=booked: the count query'
EXPLAIN (ANALYZE, BUFFERS, COSTS OFF)
SELECT count(*)::int AS total FROM shipments s WHERE TRUE AND s.status = 'booked';

-- What-if, not the app's query: the same page with the index its ORDER BY could use. Each block
-- runs in a transaction that is rolled back, so the bench database is left as the app made it.
\echo '-- what-if A: as the app, plus CREATE INDEX (created_at DESC NULLS LAST, id DESC)'
BEGIN;
CREATE INDEX IF NOT EXISTS bench_whatif_created_idx ON shipments (created_at DESC NULLS LAST, id DESC);
EXPLAIN (ANALYZE, COSTS OFF)
SELECT s.id, s.reference, s.status, c.name AS "customerName", o.code AS "originCode",
       d.code AS "destinationCode", s.chosen_mode AS "chosenMode",
       s.modes_considered AS "modesConsidered", s.incoterm, s.etd, s.eta,
       (SELECT count(*)::int FROM shipment_lines l WHERE l.shipment_id = s.id) AS "lineCount",
       s.created_at AS "createdAt"
  FROM shipments s
  JOIN organizations c ON c.id = s.customer_id
  JOIN places o ON o.id = s.origin_id
  JOIN places d ON d.id = s.destination_id
 WHERE TRUE
 ORDER BY s.created_at DESC NULLS LAST, s.id DESC
 LIMIT 25 OFFSET 0;
ROLLBACK;

\echo '-- what-if B: no new index, ORDER BY without NULLS LAST (created_at is NOT NULL)'
EXPLAIN (ANALYZE, COSTS OFF)
SELECT s.id, s.reference, s.status, c.name AS "customerName", o.code AS "originCode",
       d.code AS "destinationCode", s.chosen_mode AS "chosenMode",
       s.modes_considered AS "modesConsidered", s.incoterm, s.etd, s.eta,
       (SELECT count(*)::int FROM shipment_lines l WHERE l.shipment_id = s.id) AS "lineCount",
       s.created_at AS "createdAt"
  FROM shipments s
  JOIN organizations c ON c.id = s.customer_id
  JOIN places o ON o.id = s.origin_id
  JOIN places d ON d.id = s.destination_id
 WHERE TRUE
 ORDER BY s.created_at DESC, s.id DESC
 LIMIT 25 OFFSET 0;
