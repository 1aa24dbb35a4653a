#!/usr/bin/env bash
# npm run bench:landed: landed-cost performance figures.
#   Part A  the engine on a 500-line shipment, in process, four modes against 50 ms
#           (scripts/bench/landed.ts).
#   Part B  GET /api/v1/shipments/{Hallvik's demo shipment}/landed-cost?mode=sea_lcl on loopback,
#           requests/s and p50/p95 as a ratio to no-op routes of the same server, measured in the
#           same run (scripts/bench/landed-http.ts), on a throw-away PostgreSQL cluster and
#           `node build`.
# A benchmark, not a test: it prints figures and exits 0 whatever they are, and also when a part
# could not run (it says why).
#
# Usage: scripts/bench/landed.sh [all|a|b]      (default all)
# Env:   BENCH_LANDED_RUNS, BENCH_LANDED_LINES (Part A), BENCH_DURATION, BENCH_CONNECTIONS,
#        BENCH_MODE (Part B)
set -euo pipefail
# shellcheck source=scripts/lib.sh
source "$(dirname -- "${BASH_SOURCE[0]}")/../lib.sh" # cd to the repo root; say, ensure_* helpers

PARTS=${1:-all}
[[ $PARTS =~ ^(all|a|b)$ ]] || {
	echo "usage: scripts/bench/landed.sh [all|a|b]" >&2
	exit 2
}

# Only this benchmark's cluster, never demo, test or bench:measure: its own name and ports.
export LANDFALL_PG_NAME=bench-landed
export LANDFALL_PG_PORT=54355
export LANDFALL_PG_DB=landfall_bench
APP_HOST=127.0.0.1
APP_PORT=4393
BASE=http://$APP_HOST:$APP_PORT

WORK=$(mktemp -d "${TMPDIR:-/tmp}/landfall-bench-landed.XXXXXX")
# shellcheck source=scripts/bench/app.sh
source scripts/bench/app.sh

cleanup() {
	local code=$?
	bench_stop
	rm -rf -- "$WORK"
	if ((code != 0)); then echo "bench:landed stopped early (exit $code); see the messages above." >&2; fi
	exit 0
}
bench_prepare
echo "load average before: $(cut -d' ' -f1-3 /proc/loadavg) on $(nproc) CPUs"

if [[ $PARTS != b ]]; then
	say "Part A: the landed-cost engine on a 500-line shipment, in process"
	"$TSX" scripts/bench/landed.ts || echo "Part A did not finish (exit $?)." >&2
fi

if [[ $PARTS != a ]]; then
	if bench_port_in_use; then
		echo "Part B not run: port $APP_PORT on $APP_HOST is in use; stop what listens there first" >&2
		exit 1
	fi
	say "Part B: the landed-cost API against no-op routes, over HTTP on loopback"
	bench_fresh_cluster
	SHIPMENT_ID=$(bash scripts/pg.sh psql -X -q -t -A -v ON_ERROR_STOP=1 \
		-c "SELECT id FROM shipments WHERE notes = 'Demo scenario: hallvik-speakers'")
	[[ -n $SHIPMENT_ID ]] || {
		echo "Part B not run: the demo Hallvik shipment is missing after seeding" >&2
		exit 1
	}

	bench_start_app || {
		echo "Part B not run: the app did not start" >&2
		exit 1
	}

	BENCH_BASE=$BASE BENCH_SHIPMENT_ID=$SHIPMENT_ID "$TSX" scripts/bench/landed-http.ts ||
		echo "Part B did not finish (exit $?)." >&2

	bench_app_log
fi
echo "load average after: $(cut -d' ' -f1-3 /proc/loadavg) on $(nproc) CPUs"
