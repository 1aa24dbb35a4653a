#!/usr/bin/env bash
# pg.test.sh: self-test for scripts/pg.sh.
# It uses its own cluster (name selftest, port 54399, never demo or test) and
# removes everything it created when it ends, whether it passes or fails.
set -euo pipefail

HERE=$(cd -P -- "$(dirname -- "${BASH_SOURCE[0]}")" && pwd)
REPO=$(dirname -- "$HERE")
PG=$HERE/pg.sh
export LANDFALL_PG_NAME=selftest LANDFALL_PG_PORT=54399
# Not the defaults, to prove the settings are honoured.
export LANDFALL_PG_DB=selftest_db LANDFALL_PG_USER=selftest_user
WANT_URL=postgres://selftest_user@127.0.0.1:54399/selftest_db

WORK=$(mktemp -d)
OUT=$WORK/out
ERR=$WORK/err
COPY_PARENT="" # the mode-700 folder for the fallback test
LISTENER=""    # PID of the fake program holding the port
CHECKS=0

ok() {
	CHECKS=$((CHECKS + 1))
	printf 'ok   %s\n' "$*"
}
fail() {
	printf 'FAIL %s\n' "$*" >&2
	printf -- '--- stdout:\n%s\n--- stderr:\n%s\n' "$(cat "$OUT" 2>/dev/null)" "$(cat "$ERR" 2>/dev/null)" >&2
	exit 1
}

# run WANT_RC DESCRIPTION CMD...: runs CMD, keeps its output in $OUT/$ERR, checks the exit code.
run() {
	local want=$1 desc=$2 rc=0
	shift 2
	"$@" >"$OUT" 2>"$ERR" || rc=$?
	[[ $rc -eq $want ]] || fail "$desc (exit $rc, expected $want)"
	ok "$desc"
}
out_is() { [[ $(<"$OUT") == "$1" ]] || fail "stdout should be '$1'"; }
out_has() { grep -qF -- "$1" "$OUT" || fail "stdout should contain '$1'"; }
err_has() { grep -qF -- "$1" "$ERR" || fail "stderr should contain '$1'"; }

# sql QUERY: one-line, unaligned result of QUERY on the app database.
sql() { "$PG" psql -X -At -v ON_ERROR_STOP=1 -c "$1"; }

# Stops and deletes the selftest cluster of the repo at $1, wherever it lives.
remove_cluster() {
	local root=$1 loc
	[[ -x $root/scripts/pg.sh ]] || return 0
	"$root/scripts/pg.sh" stop >/dev/null 2>&1 || true
	if [[ -f $root/.data/pg-selftest.location ]]; then
		loc=$(<"$root/.data/pg-selftest.location")
		if [[ $loc =~ ^/var/tmp/landfall-pg/[0-9a-f]{12}-selftest$ ]]; then
			rm -rf -- "$loc" "$loc.log"
		fi
	fi
	rm -rf -- "$root/.data/pg-selftest"
	rm -f -- "$root/.data/pg-selftest".{log,lock,location}
	# Drop .data only if we created it and it is now empty.
	rmdir -- "$root/.data" 2>/dev/null || true
}

cleanup() {
	[[ -z $LISTENER ]] || kill "$LISTENER" 2>/dev/null || true
	if [[ -n $COPY_PARENT ]]; then
		remove_cluster "$COPY_PARENT/repo"
		rm -rf -- "$COPY_PARENT"
	fi
	remove_cluster "$REPO"
	rm -rf -- "$WORK"
}
trap cleanup EXIT

# Waits until PID has exited (a zombie counts: it no longer runs).
wait_dead() {
	local i state
	for ((i = 0; i < 50; i++)); do
		kill -0 "$1" 2>/dev/null || return 0
		state=$(sed -E 's/.*\) ([A-Z]).*/\1/' "/proc/$1/stat" 2>/dev/null || true)
		[[ $state == Z ]] && return 0
		sleep 0.1
	done
	fail "process $1 did not exit"
}

# Start from nothing, even if an earlier run was interrupted.
remove_cluster "$REPO"

echo "# basic lifecycle"
run 3 "status before first start exits 3" "$PG" status
out_has "stopped"
run 0 "start creates and starts the cluster" "$PG" start
err_has "[pg] ready: $WANT_URL"
run 0 "second start succeeds (idempotent)" "$PG" start
err_has "already running"
run 0 "status while running exits 0" "$PG" status
out_has "running (pid"
out_has "data:   $REPO/.data/pg-selftest"
out_has "url:    $WANT_URL"
run 0 "url prints the URL" "$PG" url
out_is "$WANT_URL"
[[ ! -s $ERR ]] || fail "url should print nothing on stderr"
ok "url prints nothing else"
run 0 "psql -c 'select 1'" "$PG" psql -X -At -c 'select 1'
out_is 1
run 0 "app role owns the app database and may create databases" sql \
	"select current_user, current_database(), rolcreatedb from pg_roles where rolname = current_user"
out_is "selftest_user|selftest_db|t"
run 0 "server listens on 127.0.0.1 only" sql "show listen_addresses"
out_is 127.0.0.1
run 0 "create a marker table" sql "create table marker (id int)"
[[ $(stat -c %a "$REPO/.data/pg-selftest") == 700 ]] || fail "data folder should be mode 700"
ok "data folder is mode 700"

run 0 "stop" "$PG" stop
err_has "stopped"
run 0 "second stop succeeds (idempotent)" "$PG" stop
err_has "not running"
run 3 "status while stopped exits 3" "$PG" status
out_has "stopped"
run 0 "start after stop" "$PG" start
run 0 "data survives stop/start" sql "select to_regclass('marker') is not null"
out_is t

echo "# reset"
run 0 "reset gives a fresh cluster" "$PG" reset
run 0 "marker table is gone after reset" sql "select to_regclass('marker') is null"
out_is t
run 0 "role and database exist after reset" sql "select current_user"
out_is selftest_user

echo "# crash recovery"
pid=$(head -n 1 "$REPO/.data/pg-selftest/postmaster.pid")
kill -9 "$pid"
wait_dead "$pid"
ok "killed postmaster $pid with SIGKILL"
run 3 "status after kill -9 says stopped" "$PG" status
run 0 "start recovers after kill -9" "$PG" start
run 0 "database answers after recovery" sql "select 1"
out_is 1
run 0 "stop after recovery" "$PG" stop

echo "# port already taken"
if command -v python3 >/dev/null 2>&1; then
	python3 -c '
import socket, time
s = socket.socket(); s.setsockopt(socket.SOL_SOCKET, socket.SO_REUSEADDR, 1)
s.bind(("127.0.0.1", 54399)); s.listen(); time.sleep(120)' &
	LISTENER=$!
elif command -v node >/dev/null 2>&1; then
	node -e 'require("net").createServer().listen(54399, "127.0.0.1"); setTimeout(() => {}, 120000)' &
	LISTENER=$!
fi
if [[ -n $LISTENER ]]; then
	for ((i = 0; i < 50; i++)); do
		(: <>/dev/tcp/127.0.0.1/54399) 2>/dev/null && break
		sleep 0.1
	done
	run 1 "start fails when another program holds the port" "$PG" start
	err_has "already used by another program"
	kill "$LISTENER"
	wait "$LISTENER" 2>/dev/null || true
	LISTENER=""
else
	echo "skip port test (needs python3 or node)"
fi

echo "# clone the server's OS user cannot reach"
if [[ $(id -u) -eq 0 ]]; then
	COPY_PARENT=$(mktemp -d /root/pgtest-XXXXXX 2>/dev/null || mktemp -d /tmp/pgtest-XXXXXX)
	chmod 700 "$COPY_PARENT"
	mkdir "$COPY_PARENT/repo"
	cp -a "$HERE" "$COPY_PARENT/repo/scripts"
	CPG=$COPY_PARENT/repo/scripts/pg.sh
	hash=$(printf '%s' "$COPY_PARENT/repo" | sha1sum | cut -c1-12)
	want_loc=/var/tmp/landfall-pg/$hash-selftest
	run 0 "start in a mode-700 folder" "$CPG" start
	err_has "placing the cluster in $want_loc"
	[[ $(<"$COPY_PARENT/repo/.data/pg-selftest.location") == "$want_loc" ]] ||
		fail "location file should name $want_loc"
	ok "location file names $want_loc"
	[[ -f $want_loc/PG_VERSION && ! -e $COPY_PARENT/repo/.data/pg-selftest ]] ||
		fail "cluster should be in $want_loc only"
	ok "cluster lives in /var/tmp, not in the repo"
	run 0 "psql works on the relocated cluster" "$CPG" psql -X -At -c 'select 1'
	out_is 1
	run 0 "stop relocated cluster" "$CPG" stop
	run 3 "status finds the relocated cluster via the location file" "$CPG" status
	out_has "data:   $want_loc"
	run 0 "start again uses the saved location" "$CPG" start
	! grep -q placing "$ERR" || fail "should not decide the location twice"
	run 0 "reset works on the relocated cluster" "$CPG" reset
	err_has "placing the cluster in $want_loc"
	run 0 "psql after reset of relocated cluster" "$CPG" psql -X -At -c 'select 1'
	out_is 1
	run 0 "stop relocated cluster again" "$CPG" stop
	remove_cluster "$COPY_PARENT/repo"
	[[ ! -e $want_loc ]] || fail "$want_loc should be gone after cleanup"
	ok "relocated cluster cleaned up"
else
	echo "skip fallback test (only relevant when run as root)"
fi

echo "# all $CHECKS checks passed"
