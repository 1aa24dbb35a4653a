#!/usr/bin/env bash
# npm run bench:measure: performance figures against the issue's targets.
#   Part A  measure() of a 500-line shipment, in-process (target: under 20 ms).
#   Part B  the shipments list with 10,000 shipments, p95 at 10 concurrent requests on loopback
#           (target: under 150 ms), on a throw-away PostgreSQL cluster and `node build`.
# Prints figures and ratios; it is not a test and exits 0 even when a figure is over target.
#
# Usage: scripts/bench/measure.sh [all|a|b]      (default all)
# Env:   BENCH_ITERATIONS (Part A runs per variant, default 200), BENCH_DURATION (s, default 10),
#        BENCH_EXTRA_SQL (a .sql file run on the bench database after seeding, for what-if indexes),
#        BENCH_NODE_ARGS (extra node flags for the app, e.g. "--cpu-prof --cpu-prof-dir=/tmp/prof")
set -euo pipefail
# shellcheck source=scripts/lib.sh
source "$(dirname -- "${BASH_SOURCE[0]}")/../lib.sh" # cd to the repo root; say, ensure_* helpers

PARTS=${1:-all}
[[ $PARTS =~ ^(all|a|b)$ ]] || {
	echo "usage: scripts/bench/measure.sh [all|a|b]" >&2
	exit 2
}

# Only the bench cluster, never demo or test: its own name, port and database.
export LANDFALL_PG_NAME=bench
export LANDFALL_PG_PORT=54350
export LANDFALL_PG_DB=landfall_bench
APP_HOST=127.0.0.1
APP_PORT=4395
BASE=http://$APP_HOST:$APP_PORT

WORK=$(mktemp -d "${TMPDIR:-/tmp}/landfall-bench.XXXXXX")
export BENCH_RESULTS=$WORK/results.tsv
: >"$BENCH_RESULTS"
# shellcheck source=scripts/bench/app.sh
source scripts/bench/app.sh

cleanup() {
	local code=$?
	bench_stop
	rm -rf -- "$WORK"
	exit "$code"
}
bench_prepare
START=$SECONDS
# Figures are only worth comparing on an otherwise idle machine: say so when it is not.
# After the run the load is mostly our own, so only the "before" figure warns.
check_load() {
	local load1
	load1=$(cut -d' ' -f1 /proc/loadavg)
	echo "load average $1: $(cut -d' ' -f1-3 /proc/loadavg) on $(nproc) CPUs"
	if [[ $1 == before ]] && awk -v l="$load1" -v n="$(nproc)" 'BEGIN { exit !(l > n * 0.75) }'; then
		echo "WARNING: the machine is busy with other work; these figures are inflated by it." >&2
	fi
}
check_load before

# --- Part A ----------------------------------------------------------------------------------
if [[ $PARTS != b ]]; then
	say "Part A: measure() of a 500-line shipment, in-process"
	"$TSX" scripts/bench/measure-cpu.ts "${BENCH_ITERATIONS:-200}"
fi

# --- Part B ----------------------------------------------------------------------------------
if [[ $PARTS != a ]]; then
	if bench_port_in_use; then
		echo "port $APP_PORT on $APP_HOST is in use; stop what listens there first" >&2
		exit 1
	fi

	bench_fresh_cluster

	say "Inserting 10,000 shipments (3 lines each)"
	t0=$SECONDS
	bash scripts/pg.sh psql -X -q -v ON_ERROR_STOP=1 -f scripts/bench/seed-shipments.sql
	# A steady-state database has been vacuumed and analysed (autovacuum would do it a minute
	# later): visibility map for index-only counts, statistics for the planner.
	bash scripts/pg.sh psql -X -q -v ON_ERROR_STOP=1 -c 'VACUUM (ANALYZE) shipments, shipment_lines'
	echo "  (seeded in $((SECONDS - t0)) s)"
	if [[ -n ${BENCH_EXTRA_SQL:-} ]]; then
		# What-if runs, e.g. an index not yet in the migrations: the bench database only.
		say "Applying BENCH_EXTRA_SQL=$BENCH_EXTRA_SQL (what-if: not the app's own schema)"
		bash scripts/pg.sh psql -X -q -v ON_ERROR_STOP=1 -f "$BENCH_EXTRA_SQL"
	fi

	bench_start_app "${BENCH_NODE_ARGS:-}" || exit 1

	BENCH_BASE=$BASE "$TSX" scripts/bench/list-http.ts

	say "EXPLAIN ANALYZE of the list queries (after the load, so the cache is warm)"
	bash scripts/pg.sh psql -X -q -v ON_ERROR_STOP=1 -f scripts/bench/explain.sql

	bench_app_log
fi

# --- Summary ---------------------------------------------------------------------------------
say "Summary ($((SECONDS - START)) s)"
check_load after
{
	printf 'target\tgoal\tp50\tp95\tratio\tverdict\tbasis\n'
	cat "$BENCH_RESULTS"
} | awk -F'\t' '{ printf "  %-40s %-7s %-10s %-10s %-6s %-7s %s\n", $1, $2, $3, $4, $5, $6, $7 }'
echo "  ratio = p95 / goal; PASS when under 1.00. 'n/a': errors or non-2xx answers (counted OVER)."
