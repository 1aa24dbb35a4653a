#!/usr/bin/env bash
# npm run bench:faults: the app under load while its services fail, on a throw-away cluster.
#   1. PostgreSQL is stopped and started again in the middle of a read/write load: requests in the
#      gap get a clean 503, the same app process recovers by itself, and no partial write remains.
#   2. The SMTP catcher is stopped while bookings queue their e-mails: the outbox retries and every
#      e-mail arrives exactly once once it is back.
# Prints what it saw and a verdict per check; exits 1 when a check fails. (The Stripe side of the
# same question is tested in tests/integration/payment-faults.test.ts, in npm test.)
set -euo pipefail
# shellcheck source=scripts/lib.sh
source "$(dirname -- "${BASH_SOURCE[0]}")/../lib.sh" # cd to the repo root; say, ensure_* helpers

export LANDFALL_PG_NAME=bench-faults
export LANDFALL_PG_PORT=54357
export LANDFALL_PG_DB=landfall_bench
APP_HOST=127.0.0.1
APP_PORT=4399
BASE=http://$APP_HOST:$APP_PORT
WORK=$(mktemp -d "${TMPDIR:-/tmp}/landfall-bench-faults.XXXXXX")
# The catcher keeps what it caught in a file, so a restart loses nothing (scripts/mail-catcher).
export MAIL_CATCHER_SMTP_PORT=12701 MAIL_CATCHER_WEB_PORT=12702
export MAIL_CATCHER_FILE=$WORK/caught.json
export SMTP_HOST=127.0.0.1 SMTP_PORT=$MAIL_CATCHER_SMTP_PORT SMTP_SECURE=false
export MAIL_POLL_MS=200 MAIL_RETRY_BASE_MS=500 BENCH_MAIL_DISPATCH=on
# shellcheck source=scripts/bench/app.sh
source scripts/bench/app.sh

cleanup() {
	local code=$?
	bench_stop
	rm -rf -- "$WORK"
	exit "$code"
}
bench_prepare
if bench_port_in_use; then
	echo "port $APP_PORT on $APP_HOST is in use; stop what listens there first" >&2
	exit 1
fi
bench_fresh_cluster
bench_start_app || exit 1
BENCH_BASE=$BASE BENCH_APP_PID=$APP_PID "$TSX" scripts/bench/faults.ts
bench_app_log
