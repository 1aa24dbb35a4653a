# Shared by the HTTP parts of the benchmarks (measure.sh, landed.sh); source it after lib.sh and
# after setting LANDFALL_PG_NAME/PORT/DB, APP_HOST, APP_PORT, BASE and WORK. Each benchmark has
# its own cluster and port, so they never touch the demo, test or each other's data.
# shellcheck shell=bash
APP_PID=""
CLUSTER_STARTED=0

# The traps (the caller defines cleanup, which should call bench_stop) and the tools every
# benchmark needs; sets TSX.
bench_prepare() {
	trap cleanup EXIT
	trap 'exit 130' INT TERM
	[[ -x node_modules/.bin/tsx && -d node_modules/autocannon ]] || ensure_node_modules
	TSX=node_modules/.bin/tsx
}

# Stops what bench_start_app and bench_fresh_cluster started (for the EXIT trap).
bench_stop() {
	if [[ -n $APP_PID ]] && kill -0 "$APP_PID" 2>/dev/null; then
		kill "$APP_PID" 2>/dev/null || true
		for _ in 1 2 3 4 5 6 7 8 9 10; do
			kill -0 "$APP_PID" 2>/dev/null || break
			sleep 0.5
		done
		kill -9 "$APP_PID" 2>/dev/null || true
		wait "$APP_PID" 2>/dev/null || true
	fi
	if ((CLUSTER_STARTED)); then bash scripts/pg.sh stop || true; fi
}

# True when something already listens on the app's port.
bench_port_in_use() {
	timeout 2 bash -c ": <>/dev/tcp/$APP_HOST/$APP_PORT" 2>/dev/null
}

# A new cluster, migrated and seeded with the demo; exports DATABASE_URL.
bench_fresh_cluster() {
	say "Fresh PostgreSQL cluster '$LANDFALL_PG_NAME' on port $LANDFALL_PG_PORT"
	CLUSTER_STARTED=1
	bash scripts/pg.sh reset
	DATABASE_URL=$(bash scripts/pg.sh url)
	export DATABASE_URL
	"$TSX" scripts/migrate.ts
	"$TSX" scripts/seed.ts
}

# Builds when build/ is missing or older than its sources, then starts `node build` on $BASE
# ($1: extra node flags) and waits until it is healthy; returns 1 (log shown) when it is not.
bench_start_app() {
	if [[ ! -f build/index.js ]] || [[ -n $(find src static data svelte.config.js vite.config.ts \
		package-lock.json -newer build/index.js -type f -print -quit) ]]; then
		say "Building the app (build/ is missing or older than its sources)"
		node_modules/.bin/vite build --logLevel error
	fi
	say "Starting node build on $BASE"
	# MAIL_DISPATCH=off: the demo's queued mail stays queued, never sent to anyone's catcher
	# (bench:faults sets BENCH_MAIL_DISPATCH=on: its own catcher is the point).
	# shellcheck disable=SC2086 # the extra flags are words
	PORT=$APP_PORT HOST=$APP_HOST ORIGIN=$BASE DATABASE_URL=$DATABASE_URL MAIL_DISPATCH=${BENCH_MAIL_DISPATCH:-off} \
		AUTH_SECRET=bench-secret-0123456789abcdefghij NODE_ENV=production \
		node ${1:-} build >"$WORK/app.log" 2>&1 &
	APP_PID=$!
	for ((i = 0; i < 120; i++)); do
		curl -fsS --max-time 2 "$BASE/api/health" >/dev/null 2>&1 && break
		kill -0 "$APP_PID" 2>/dev/null || break
		sleep 0.5
	done
	if ! curl -fsS --max-time 2 "$BASE/api/health" >/dev/null 2>&1; then
		echo "the app did not become healthy; its log:" >&2
		tail -n 40 "$WORK/app.log" >&2 || true
		return 1
	fi
}

# Errors or warnings the app logged during the run.
bench_app_log() {
	if grep -qiE 'error|warn' "$WORK/app.log"; then
		echo "--- app log (errors or warnings) ---"
		grep -iE -m 20 'error|warn' "$WORK/app.log" || true
	fi
}
