#!/usr/bin/env bash
# pg.sh: runs Landfall's own local PostgreSQL cluster. It never touches the
# system cluster on port 5432.
#
# Usage: scripts/pg.sh start|stop|status|reset|url|psql [psql args...]|backup [FILE]|restore FILE
#
# Settings come from the environment:
#   LANDFALL_PG_NAME  cluster name            (default demo; tests use test)
#   LANDFALL_PG_PORT  TCP port on 127.0.0.1   (default 54320)
#   LANDFALL_PG_DB    application database    (default landfall)
#   LANDFALL_PG_USER  application role        (default landfall)
#
# Progress goes to stderr as "[pg] ..." lines, so `url` prints only the URL.
set -euo pipefail

log() { printf '[pg] %s\n' "$*" >&2; }
die() {
	log "error: $*"
	exit 1
}

SCRIPT_DIR=$(cd -P -- "$(dirname -- "${BASH_SOURCE[0]}")" && pwd)
REPO_ROOT=$(dirname -- "$SCRIPT_DIR")
NAME=${LANDFALL_PG_NAME:-demo}
PORT=${LANDFALL_PG_PORT:-54320}
DB=${LANDFALL_PG_DB:-landfall}
ROLE=${LANDFALL_PG_USER:-landfall}
HOST=127.0.0.1
SUPERUSER=postgres
STATE_DIR=$REPO_ROOT/.data # git-ignored
FALLBACK_ROOT=/var/tmp/landfall-pg
LOCATION_FILE=$STATE_DIR/pg-$NAME.location

# Names end up in paths, SQL and the URL. Plain names keep all three simple.
[[ $NAME =~ ^[A-Za-z0-9_-]+$ ]] || die "LANDFALL_PG_NAME must be letters, digits, _ or - (got '$NAME')"
[[ $DB =~ ^[A-Za-z_][A-Za-z0-9_]*$ ]] || die "LANDFALL_PG_DB must be a plain identifier (got '$DB')"
[[ $ROLE =~ ^[A-Za-z_][A-Za-z0-9_]*$ ]] || die "LANDFALL_PG_USER must be a plain identifier (got '$ROLE')"
[[ $PORT =~ ^[0-9]{1,5}$ ]] || die "LANDFALL_PG_PORT must be a number (got '$PORT')"
PORT=$((10#$PORT)) # so "054320" is not read as octal later
((PORT >= 1024 && PORT <= 65535)) || die "LANDFALL_PG_PORT must be from 1024 to 65535 (got $PORT)"
# 5432 belongs to the system cluster that Debian may create. We never use it.
((PORT != 5432)) || die "port 5432 is reserved for the system PostgreSQL; pick another LANDFALL_PG_PORT"

URL="postgres://$ROLE@$HOST:$PORT/$DB"

is_root() { [[ $(id -u) -eq 0 ]]; }

# --- binaries ---------------------------------------------------------------

BIN=""

# Finds a bindir with the server tools. Returns 1 if there is none.
find_bindir() {
	local candidate tool ok
	local -a candidates=()
	if command -v pg_config >/dev/null 2>&1; then
		candidates+=("$(pg_config --bindir 2>/dev/null || true)")
	fi
	# Newest major version first. pg_config may come from libpq-dev without a server.
	while IFS= read -r candidate; do candidates+=("$candidate"); done < <(
		compgen -G '/usr/lib/postgresql/*/bin' | sort -t/ -k5,5 -rV || true
	)
	for candidate in "${candidates[@]}"; do
		[[ -n $candidate ]] || continue
		ok=1
		for tool in initdb pg_ctl postgres pg_isready psql; do
			[[ -x $candidate/$tool ]] || ok=0
		done
		if ((ok)); then
			BIN=$candidate
			return 0
		fi
	done
	return 1
}

ensure_bindir() {
	find_bindir && return 0
	is_root || die "PostgreSQL server binaries not found. Install the Debian package 'postgresql' (sudo apt-get install postgresql) and re-run."
	log "PostgreSQL not found; installing the Debian package 'postgresql'"
	# Debian may create and start its own cluster on 5432. We leave it alone.
	if ! DEBIAN_FRONTEND=noninteractive apt-get install -y -qq postgresql >&2; then
		# The package lists are probably missing or stale. Refresh them once and retry.
		apt-get update -qq >&2
		DEBIAN_FRONTEND=noninteractive apt-get install -y -qq postgresql >&2
	fi
	find_bindir || die "installed 'postgresql' but still cannot find initdb/pg_ctl"
}

# --- OS user -------------------------------------------------------------------

# initdb and postgres refuse to run as root. As root, run them as an
# unprivileged user. Otherwise run them as ourselves.
OS_USER=""

pick_os_user() {
	is_root || {
		OS_USER=$(id -un)
		return 0
	}
	# An existing cluster must keep running as the user that owns it.
	if [[ -f $DATA/PG_VERSION ]]; then
		OS_USER=$(stat -c %U -- "$DATA")
		[[ $OS_USER != root && $OS_USER != UNKNOWN ]] || die "$DATA is owned by '$OS_USER'; run 'reset' to rebuild it"
		return 0
	fi
	if id -u postgres >/dev/null 2>&1; then
		OS_USER=postgres
	else
		OS_USER=landfall-pg
		if ! id -u "$OS_USER" >/dev/null 2>&1; then
			log "creating system user $OS_USER to own the cluster"
			useradd --system --no-create-home --home-dir /nonexistent --shell /usr/sbin/nologin "$OS_USER"
		fi
	fi
}

# Runs a command as OS_USER. cd / because the caller's working directory may
# be unreadable for that user, and the PostgreSQL tools complain about that.
as_pg() {
	if is_root; then
		(cd / && runuser -u "$OS_USER" -- "$@")
	else
		"$@"
	fi
}

# --- where the cluster lives ------------------------------------------------------

DATA=""
LOG=""

# Sets DATA and LOG. Creates nothing.
resolve_data_dir() {
	if [[ -f $LOCATION_FILE ]]; then
		DATA=$(<"$LOCATION_FILE")
		# Only accept the exact form this script writes, so reset can never rm -rf anything else.
		[[ $DATA =~ ^$FALLBACK_ROOT/[0-9a-f]{12}-$NAME$ ]] ||
			die "unexpected path in $LOCATION_FILE ('$DATA'); delete that file and retry"
	else
		DATA=$STATE_DIR/pg-$NAME
	fi
	LOG=$DATA.log
}

# Creates the data folder on first start. It falls back to /var/tmp when the
# server's OS user cannot reach the repo, e.g. a clone under /root (mode 700).
prepare_data_dir() {
	[[ $DATA != *"'"* ]] || die "data folder path must not contain a single quote: $DATA"
	mkdir -p -- "$DATA"
	if is_root; then
		if [[ ! -f $DATA/PG_VERSION ]]; then
			chown "$OS_USER": "$DATA"
			chmod 700 "$DATA"
		fi
		if ! as_pg test -x "$DATA" || ! as_pg test -w "$DATA"; then
			[[ ! -f $DATA/PG_VERSION ]] || die "user $OS_USER cannot reach the existing cluster at $DATA"
			[[ $DATA == "$STATE_DIR/pg-$NAME" ]] || die "user $OS_USER cannot write to $DATA"
			rmdir -- "$DATA"
			local hash
			hash=$(printf '%s' "$REPO_ROOT" | sha1sum | cut -c1-12)
			DATA=$FALLBACK_ROOT/$hash-$NAME
			LOG=$DATA.log
			log "user $OS_USER cannot reach $REPO_ROOT; placing the cluster in $DATA"
			mkdir -p -- "$FALLBACK_ROOT"
			chmod 755 "$FALLBACK_ROOT" # others' clusters sit here too; each folder is 700
			mkdir -p -- "$DATA"
			chown "$OS_USER": "$DATA"
			chmod 700 "$DATA"
			printf '%s\n' "$DATA" >"$LOCATION_FILE"
		fi
		# pg_ctl opens the log as OS_USER, so it must own the log file.
		touch -- "$LOG"
		chown "$OS_USER": "$LOG"
	else
		chmod 700 "$DATA"
	fi
}

# --- is it running? ---------------------------------------------------------------

# Process state letter from /proc (Z = zombie), or empty if unknown.
proc_state() {
	local stat
	stat=$(cat -- "/proc/$1/stat" 2>/dev/null) || return 0
	stat=${stat##*) } # the command name in (...) may contain spaces
	printf '%s' "${stat%% *}"
}

# Returns 0 if PID is surely not a live postmaster: it is gone, a zombie, or
# another program. Zombies matter because a container's PID 1 may never reap
# them, and kill -0 (used by pg_ctl and postgres) still treats them as alive.
pid_is_dead_or_foreign() {
	local pid=$1 state
	kill -0 "$pid" 2>/dev/null || return 0
	state=$(proc_state "$pid")
	[[ $state == Z || $state == X ]] && return 0
	[[ -r /proc/$pid/comm && $(<"/proc/$pid/comm") != postgres ]] && return 0
	return 1
}

# Prints the postmaster PID and returns 0 if this cluster is running.
# postmaster.pid can be stale after a crash or kill -9, so we check the process.
running_pid() {
	local pid cwd
	[[ -f $DATA/postmaster.pid ]] || return 1
	pid=$(head -n 1 -- "$DATA/postmaster.pid" 2>/dev/null || true)
	[[ $pid =~ ^[0-9]+$ ]] || return 1
	pid_is_dead_or_foreign "$pid" && return 1
	# A live postmaster has chdir'd into its data folder. Another cluster does not match.
	cwd=$(readlink -- "/proc/$pid/cwd" 2>/dev/null || true)
	[[ -z $cwd || $cwd == "$(readlink -f -- "$DATA")" ]] || return 1
	printf '%s\n' "$pid"
}

# The port the running cluster really listens on (line 4 of postmaster.pid).
running_port() { sed -n 4p -- "$DATA/postmaster.pid" 2>/dev/null || true; }

port_in_use() {
	# bash's /dev/tcp connects only if something is listening.
	timeout 3 bash -c ": <>/dev/tcp/$HOST/$PORT" 2>/dev/null
}

# After kill -9 of the postmaster, its children exit soon after. A new postmaster
# refuses to start while they still hold the old shared memory, so we wait for them.
wait_for_leftover_processes() {
	local target p i
	target=$(readlink -f -- "$DATA")
	for ((i = 0; i < 30; i++)); do
		local busy=0
		for p in /proc/[0-9]*; do
			[[ $(readlink -- "$p/cwd" 2>/dev/null || true) == "$target" ]] && busy=1 && break
		done
		((busy)) || return 0
		((i == 0)) && log "waiting for old server processes to exit"
		sleep 0.5
	done
	log "warning: old server processes still present; trying to start anyway"
}

superuser_psql() {
	"$BIN/psql" -X -q -v ON_ERROR_STOP=1 -h "$HOST" -p "$PORT" -U "$SUPERUSER" -d postgres "$@"
}

ensure_role_and_db() {
	# \gexec runs the generated statement only when the role or database is missing.
	superuser_psql -v role="$ROLE" -v db="$DB" >/dev/null <<'SQL'
SELECT format('CREATE ROLE %I LOGIN CREATEDB', :'role')
 WHERE NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = :'role')
\gexec
SELECT format('CREATE DATABASE %I OWNER %I', :'db', :'role')
 WHERE NOT EXISTS (SELECT 1 FROM pg_database WHERE datname = :'db')
\gexec
SQL
}

# --- commands --------------------------------------------------------------------

# Serialises start/stop/reset for one cluster, e.g. a test run racing a dev server.
take_lock() {
	mkdir -p -- "$STATE_DIR"
	exec 9>"$STATE_DIR/pg-$NAME.lock"
	flock -w 120 9 || die "another scripts/pg.sh is busy with cluster '$NAME'"
}

run_initdb() {
	local out locale
	log "initialising cluster '$NAME' in $DATA"
	# trust auth is acceptable only because the server listens on 127.0.0.1 and on
	# a socket inside its own mode-700 folder. Never widen listen_addresses with this.
	for locale in C.UTF-8 C; do
		if out=$(as_pg "$BIN/initdb" -D "$DATA" -U "$SUPERUSER" --auth=trust \
			--encoding=UTF8 --locale="$locale" 2>&1); then
			return 0
		fi
		# Most likely the locale is missing. Empty the folder so we can retry with plain C.
		find "$DATA" -mindepth 1 -delete
	done
	printf '%s\n' "$out" >&2
	die "initdb failed"
}

cmd_start() {
	local pid actual sockdir
	ensure_bindir
	resolve_data_dir
	pick_os_user
	prepare_data_dir

	if pid=$(running_pid); then
		actual=$(running_port)
		[[ $actual == "$PORT" ]] || die "cluster '$NAME' is already running on port $actual, not $PORT; run 'stop' first"
		log "already running (pid $pid, port $PORT)"
		ensure_role_and_db
		return 0
	fi

	[[ -f $DATA/PG_VERSION ]] || run_initdb
	local want have
	have=$(<"$DATA/PG_VERSION")
	want=$("$BIN/pg_ctl" --version | sed -E 's/.* ([0-9]+)(\.[0-9]+)*.*/\1/')
	[[ $have == "$want" ]] || die "cluster was made by PostgreSQL $have but $BIN is $want; run 'reset' to rebuild it (data is lost)"

	if port_in_use; then
		die "port $PORT on $HOST is already used by another program (see: ss -ltnp 'sport = :$PORT'); set LANDFALL_PG_PORT to a free port"
	fi

	# Remove a stale postmaster.pid left by a crash. postgres ignores one whose PID
	# is gone. It refuses to start if that PID is a zombie or belongs to another
	# program, so we delete the file, but only when that PID is surely not a server.
	if [[ -f $DATA/postmaster.pid ]]; then
		pid=$(head -n 1 -- "$DATA/postmaster.pid" 2>/dev/null || true)
		if [[ ! $pid =~ ^[0-9]+$ ]] || pid_is_dead_or_foreign "$pid"; then
			log "removing stale postmaster.pid (server PID ${pid:-?} is gone)"
			# The socket lock files in our socket folder name the same dead PID.
			rm -f -- "$DATA/postmaster.pid" "$DATA"/.s.PGSQL.*
		fi
	fi
	wait_for_leftover_processes

	# Socket inside the data folder: /var/run/postgresql may not exist. Unix socket
	# paths are limited to about 107 bytes, so if ours is too long we use TCP only.
	sockdir=$DATA
	((${#DATA} <= 90)) || sockdir=""
	log "starting cluster '$NAME' on $HOST:$PORT (log: $LOG)"
	# 9>&- keeps our lock fd out of the long-lived server, or the next call would block.
	if ! as_pg "$BIN/pg_ctl" -D "$DATA" -l "$LOG" -w -t 30 \
		-o "-c listen_addresses=$HOST -p $PORT -k '$sockdir'" start >/dev/null 9>&-; then
		log "server failed to start; last lines of $LOG:"
		tail -n 20 -- "$LOG" >&2 || true
		exit 1
	fi

	local i
	for ((i = 0; i < 30; i++)); do
		"$BIN/pg_isready" -q -h "$HOST" -p "$PORT" -U "$SUPERUSER" -d postgres && break
		sleep 1
	done
	((i < 30)) || die "server started but is not accepting connections on $HOST:$PORT (see $LOG)"

	ensure_role_and_db
	log "ready: $URL"
}

cmd_stop() {
	resolve_data_dir
	local pid
	if ! pid=$(running_pid); then
		log "cluster '$NAME' is not running"
		return 0
	fi
	find_bindir || die "cluster is running but the PostgreSQL binaries are missing"
	pick_os_user
	log "stopping cluster '$NAME' (pid $pid)"
	as_pg "$BIN/pg_ctl" -D "$DATA" -m fast -w -t 60 stop >/dev/null
	log "stopped"
}

cmd_status() {
	resolve_data_dir
	local pid actual code=3
	if pid=$(running_pid); then
		actual=$(running_port)
		echo "running (pid $pid, port $actual)"
		[[ $actual == "$PORT" ]] || echo "note:   LANDFALL_PG_PORT is $PORT but the server listens on $actual"
		code=0
	elif [[ -f $DATA/PG_VERSION ]]; then
		echo "stopped"
	else
		echo "stopped (not initialised yet; 'start' creates it)"
	fi
	echo "data:   $DATA"
	echo "log:    $LOG"
	echo "url:    $URL"
	return "$code"
}

cmd_reset() {
	cmd_stop
	resolve_data_dir
	log "deleting cluster '$NAME' at $DATA"
	rm -rf -- "$DATA"
	rm -f -- "$LOG" "$LOCATION_FILE"
	cmd_start
}

# Drops and recreates the app database only (the cluster keeps running): a clean slate between
# test stages without the cost of a new cluster.
cmd_reset_db() {
	find_bindir || die "PostgreSQL binaries not found; run 'scripts/pg.sh start' first"
	log "recreating database '$DB'"
	superuser_psql -v db="$DB" >/dev/null <<'SQL'
SELECT format('DROP DATABASE IF EXISTS %I WITH (FORCE)', :'db')
\gexec
SQL
	ensure_role_and_db
}

cmd_psql() {
	find_bindir || die "PostgreSQL binaries not found; run 'scripts/pg.sh start', which installs or names the Debian package 'postgresql'"
	"$BIN/pg_isready" -q -h "$HOST" -p "$PORT" -U "$SUPERUSER" -d postgres ||
		die "nothing is accepting connections on $HOST:$PORT; run 'scripts/pg.sh start' first"
	exec "$BIN/psql" -h "$HOST" -p "$PORT" -U "$ROLE" -d "$DB" "$@"
}

require_running() {
	find_bindir || die "PostgreSQL binaries not found; run 'scripts/pg.sh start' first"
	"$BIN/pg_isready" -q -h "$HOST" -p "$PORT" -U "$SUPERUSER" -d postgres ||
		die "nothing is accepting connections on $HOST:$PORT; start Landfall (npm start) or 'scripts/pg.sh start' first"
}

# A consistent snapshot in pg_dump's custom format (compressed; pg_restore can pick from it).
# pg_dump runs as the app role: it owns every table, so nothing is left out.
cmd_backup() {
	require_running
	local file=${1:-$REPO_ROOT/backups/$DB-$(date -u +%Y%m%dT%H%M%SZ).dump}
	mkdir -p "$(dirname -- "$file")"
	"$BIN/pg_dump" -h "$HOST" -p "$PORT" -U "$ROLE" -d "$DB" --format=custom --no-owner --file="$file.partial"
	mv -- "$file.partial" "$file" # never leave a half-written file under the final name
	log "backed up '$DB' to $file ($(du -h -- "$file" | cut -f1))"
	printf '%s
' "$file"
}

# Replaces the database's contents with the backup's, all or nothing: the schema is dropped and
# rebuilt inside one transaction, so a failed restore leaves the database as it was.
cmd_restore() {
	local file=${1:-}
	[[ -n $file ]] || die "usage: scripts/pg.sh restore FILE (a file written by 'scripts/pg.sh backup')"
	[[ -f $file ]] || die "no such backup file: $file"
	require_running
	"$BIN/pg_restore" --list "$file" >/dev/null 2>&1 || die "$file is not a pg_dump custom-format backup"
	log "restoring '$DB' from $file"
	{
		printf 'DROP SCHEMA IF EXISTS public CASCADE;\nCREATE SCHEMA public;\n'
		"$BIN/pg_restore" --no-owner --file=- "$file"
	} | "$BIN/psql" -q -X -v ON_ERROR_STOP=1 --single-transaction -h "$HOST" -p "$PORT" -U "$ROLE" -d "$DB" >/dev/null
	log "restored"
}

usage() {
	cat >&2 <<EOF
usage: scripts/pg.sh start|stop|status|reset|reset-db|url|psql [psql args...]
  start   create (first time) and start the cluster, ensure role and database
  stop    stop the cluster (no-op if stopped)
  status  print state, data folder, log and URL; exit 0 if running, 3 if not
  reset   stop, delete the cluster entirely, start fresh
  reset-db  drop and recreate the app database in the running cluster
  url     print the connection URL only
  psql    open psql on the database (extra args are passed on)
  backup [FILE]   pg_dump the database (default backups/DB-UTC-TIME.dump); prints the file
  restore FILE    replace the database's contents with a backup, in one transaction
env: LANDFALL_PG_NAME=$NAME LANDFALL_PG_PORT=$PORT LANDFALL_PG_DB=$DB LANDFALL_PG_USER=$ROLE
EOF
}

cmd=${1:-}
[[ $# -gt 0 ]] && shift
case $cmd in
start)
	take_lock
	cmd_start
	;;
stop)
	take_lock
	cmd_stop
	;;
reset)
	take_lock
	cmd_reset
	;;
reset-db) cmd_reset_db ;;
status) cmd_status ;;
url) printf '%s\n' "$URL" ;;
psql) cmd_psql "$@" ;;
backup) cmd_backup "$@" ;;
restore) cmd_restore "$@" ;;
-h | --help | help)
	usage
	;;
*)
	usage
	exit 2
	;;
esac
