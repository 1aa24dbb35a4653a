#!/usr/bin/env bash
# npm run bench: every benchmark of the project, one results file (docs/bench-results.md and .json).
#   1. In process, quick modes: measure() of 500 lines (bench:measure Part A), the landed-cost
#      engine on 500 lines (bench:landed Part A), the 300-line invoice PDF (bench:docs), and the
#      load planner on a few Bischoff & Ratcliff problems (bench:load).
#   2. Over HTTP on loopback, on a throw-away cluster with the demo and 10,000 shipments and
#      `node build`: the issue's routes at 20 connections against a no-op route, with the server's
#      memory (http-suite.ts); then bench:measure Part B (list-http.ts) and bench:landed Part B
#      (landed-http.ts) against the same server, shorter.
#   3. report.ts writes the results file with the machine's facts and the load before the run.
# A benchmark, not a test: it exits 0 when figures miss their targets (the file says so), and
# non-zero only when a part could not run.
#
# Env: BENCH_DURATION (s per HTTP route, default 10), BENCH_CONNECTIONS (default 20),
#      BENCH_FULL=1 (the other benchmarks with their own, longer defaults),
#      BENCH_RESULTS_DIR (where the results go, default docs)
set -euo pipefail
# shellcheck source=scripts/lib.sh
source "$(dirname -- "${BASH_SOURCE[0]}")/../lib.sh" # cd to the repo root; say, ensure_* helpers

# Only this benchmark's cluster and port, never demo, test or the other benchmarks'.
export LANDFALL_PG_NAME=benchall
export LANDFALL_PG_PORT=54352
export LANDFALL_PG_DB=landfall_benchall
APP_HOST=127.0.0.1
APP_PORT=4397
BASE=http://$APP_HOST:$APP_PORT
export BENCH_DURATION=${BENCH_DURATION:-10}
export BENCH_CONNECTIONS=${BENCH_CONNECTIONS:-20}
RESULTS_DIR=${BENCH_RESULTS_DIR:-docs}

WORK=$(mktemp -d "${TMPDIR:-/tmp}/landfall-bench-all.XXXXXX")
export BENCH_RESULTS=$WORK/results.tsv # rows of recordResult() from every benchmark
: >"$BENCH_RESULTS"
# shellcheck source=scripts/bench/app.sh
source scripts/bench/app.sh

cleanup() {
	local code=$?
	if ((code != 0)) && [[ -s $WORK/app.log ]]; then
		echo "--- the app's log, last lines ---" >&2
		tail -n 30 "$WORK/app.log" >&2
	fi
	bench_stop
	rm -rf -- "$WORK"
	if ((code != 0)); then echo "npm run bench stopped early (exit $code); see the messages above." >&2; fi
	exit "$code"
}
bench_prepare
START=$SECONDS
# Other work on the machine inflates every figure: the report warns when the load was high.
BENCH_LOAD_BEFORE=$(cut -d' ' -f1-3 /proc/loadavg)
export BENCH_LOAD_BEFORE
echo "load average before: $BENCH_LOAD_BEFORE on $(nproc) CPUs"

# Quick modes, so the whole run stays well under ten minutes; BENCH_FULL=1 keeps their defaults.
if [[ ${BENCH_FULL:-0} != 1 ]]; then
	MEASURE_RUNS=100
	export BENCH_LANDED_RUNS=${BENCH_LANDED_RUNS:-30} BENCH_DOCS_RUNS=${BENCH_DOCS_RUNS:-10}
	export BENCH_LOAD_SETS=${BENCH_LOAD_SETS:-1,8,15} BENCH_LOAD_INSTANCES=${BENCH_LOAD_INSTANCES:-3}
fi

# Each part's output is kept for the report (tee: it is shown as it runs, too).
part() {
	local name=$1
	shift
	say "$name"
	"$@" 2>&1 | tee "$WORK/$name.out"
}

# --- 1. In process ---------------------------------------------------------------------------
part measure-cpu "$TSX" scripts/bench/measure-cpu.ts "${MEASURE_RUNS:-200}"
part landed "$TSX" scripts/bench/landed.ts
part docs "$TSX" scripts/bench/docs.ts
part load "$TSX" scripts/bench/load.ts

# --- 2. Over HTTP ----------------------------------------------------------------------------
if bench_port_in_use; then
	echo "port $APP_PORT on $APP_HOST is in use; stop what listens there first" >&2
	exit 1
fi
bench_fresh_cluster
say "Inserting 10,000 shipments (3 lines each)"
bash scripts/pg.sh psql -X -q -v ON_ERROR_STOP=1 -f scripts/bench/seed-shipments.sql
# A steady-state database has been vacuumed and analysed (as in bench:measure).
bash scripts/pg.sh psql -X -q -v ON_ERROR_STOP=1 -c 'VACUUM (ANALYZE) shipments, shipment_lines'
demo_shipment() {
	bash scripts/pg.sh psql -X -q -t -A -v ON_ERROR_STOP=1 \
		-c "SELECT id FROM shipments WHERE notes = 'Demo scenario: $1'"
}
SHIPMENT_ID=$(demo_shipment hallvik-speakers)
CEDAR_ID=$(demo_shipment cedarpoint-mixed)
[[ -n $SHIPMENT_ID && -n $CEDAR_ID ]] || {
	echo "the demo Hallvik or Cedarpoint shipment is missing after seeding" >&2
	exit 1
}

bench_start_app || exit 1
part http-suite env BENCH_BASE="$BASE" BENCH_APP_PID="$APP_PID" BENCH_SHIPMENT_ID="$SHIPMENT_ID" \
	BENCH_CEDAR_ID="$CEDAR_ID" BENCH_OUT="$WORK/http-suite.json" "$TSX" scripts/bench/http-suite.ts
# The two older HTTP benchmarks, on the same server and data, shorter (their own figures).
part list-http env BENCH_BASE="$BASE" BENCH_DURATION=5 "$TSX" scripts/bench/list-http.ts
part landed-http env BENCH_BASE="$BASE" BENCH_SHIPMENT_ID="$SHIPMENT_ID" BENCH_DURATION=5 \
	"$TSX" scripts/bench/landed-http.ts
part app-log bench_app_log
bench_stop
APP_PID=""
CLUSTER_STARTED=0

# Services failing under load (its own cluster, app and catcher; PASS/FAIL lines in the report).
part faults bash scripts/bench/faults.sh || echo "bench:faults: a check failed (see above)." >&2

# --- 3. The results file ---------------------------------------------------------------------
say "Results ($((SECONDS - START)) s)"
BENCH_WORK=$WORK BENCH_ELAPSED_S=$((SECONDS - START)) "$TSX" scripts/bench/report.ts "$RESULTS_DIR"
