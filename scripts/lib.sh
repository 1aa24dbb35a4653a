# Shared by start.sh and test.sh: system packages, node modules, environment. Source it.
# shellcheck shell=bash

REPO_ROOT=$(cd -P -- "$(dirname -- "${BASH_SOURCE[0]}")/.." && pwd)
cd "$REPO_ROOT" || exit 1
mkdir -p .data

say() { printf '\n\033[1m== %s\033[0m\n' "$*" >&2; }

# Debian packages the project needs; installed with apt when missing and we are root.
ensure_system_packages() {
	local missing=()
	local pkg
	for pkg in "$@"; do
		dpkg-query -W -f='${Status}' "$pkg" 2>/dev/null | grep -q 'install ok installed' || missing+=("$pkg")
	done
	((${#missing[@]} == 0)) && return 0
	if [[ $(id -u) -ne 0 ]]; then
		echo "Missing Debian packages: ${missing[*]}. Install them (sudo apt-get install ${missing[*]}) and run again." >&2
		exit 1
	fi
	say "Installing Debian packages: ${missing[*]}"
	apt-get update -qq
	DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends "${missing[@]}" >/dev/null
}

# npm ci when node_modules is missing or the lock file changed since the last install.
ensure_node_modules() {
	local stamp=.data/npm-lock.sha1
	local want
	want=$(sha1sum package-lock.json | cut -d' ' -f1)
	if [[ -d node_modules && -f $stamp && $(cat "$stamp") == "$want" ]]; then return 0; fi
	say "Installing npm packages (npm ci)"
	npm ci --no-audit --no-fund --loglevel=error
	echo "$want" >"$stamp"
}

# .env (if present) overrides; a per-clone random AUTH_SECRET otherwise (never committed).
load_env() {
	if [[ -f .env ]]; then
		set -a
		# shellcheck disable=SC1091
		source .env
		set +a
	fi
	if [[ -z ${AUTH_SECRET:-} ]]; then
		[[ -s .data/auth-secret ]] || node -e "process.stdout.write(require('crypto').randomBytes(32).toString('base64url'))" >.data/auth-secret
		AUTH_SECRET=$(cat .data/auth-secret)
		export AUTH_SECRET
	fi
}

# Builds the app when any of its sources changed since the last build.
ensure_build() {
	local stamp=.data/build.sha1
	local want
	want=$(find src static data svelte.config.js vite.config.ts tailwind.config.ts package-lock.json -type f -print0 |
		sort -z | xargs -0 sha1sum | sha1sum | cut -d' ' -f1)
	if [[ -f build/index.js && -f $stamp && $(cat "$stamp") == "$want" ]]; then return 0; fi
	say "Building the app"
	node_modules/.bin/vite build --logLevel error
	echo "$want" >"$stamp"
}

# 0 once URL ($2) answers 2xx; 1 when process $1 has exited first or after about 10 s.
wait_for_health() {
	local pid=$1 url=$2 i
	for i in $(seq 1 50); do
		node -e "fetch(process.argv[1]).then((r) => process.exit(r.ok ? 0 : 1), () => process.exit(1))" \
			"$url" && return 0
		kill -0 "$pid" 2>/dev/null || return 1
		sleep 0.2
	done
	return 1
}

# Card payments: the local Stripe fake (scripts/stripe-fake) on loopback, unless a real Stripe
# key is configured (STRIPE_SECRET_KEY set without STRIPE_API_HOST: Stripe's own test mode).
# Exports the STRIPE_* variables the app reads. Call after ORIGIN is set; stop_stripe_fake stops it.
start_stripe_fake() {
	if [[ -n ${STRIPE_SECRET_KEY:-} && -z ${STRIPE_API_HOST:-} ]]; then
		say "Card payments: Stripe itself (STRIPE_SECRET_KEY is set, no STRIPE_API_HOST)"
		return 0
	fi
	export STRIPE_FAKE_PORT=${STRIPE_FAKE_PORT:-4312}
	export STRIPE_SECRET_KEY=${STRIPE_SECRET_KEY:-sk_test_landfall_local_fake}
	export STRIPE_WEBHOOK_SECRET=${STRIPE_WEBHOOK_SECRET:-whsec_landfall_local_fake}
	export STRIPE_API_HOST=127.0.0.1 STRIPE_API_PORT=$STRIPE_FAKE_PORT STRIPE_API_PROTOCOL=http
	export STRIPE_FAKE_WEBHOOK_URL=${STRIPE_FAKE_WEBHOOK_URL:-$ORIGIN/api/v1/stripe/webhook}
	say "Starting the local Stripe fake on http://127.0.0.1:$STRIPE_FAKE_PORT"
	# node --import tsx: one process, so stopping it by its id stops the fake.
	node --import tsx scripts/stripe-fake/main.ts &
	STRIPE_FAKE_PID=$!
	wait_for_health "$STRIPE_FAKE_PID" "http://127.0.0.1:$STRIPE_FAKE_PORT/health" && return 0
	echo "The local Stripe fake did not start on port $STRIPE_FAKE_PORT (is the port taken?)." >&2
	exit 1
}

stop_stripe_fake() {
	if [[ -n ${STRIPE_FAKE_PID:-} ]]; then
		kill "$STRIPE_FAKE_PID" 2>/dev/null || true
		wait "$STRIPE_FAKE_PID" 2>/dev/null || true
		STRIPE_FAKE_PID=
	fi
}

# E-mail: the local SMTP catcher (scripts/mail-catcher) on loopback, unless a real SMTP server is
# configured (SMTP_HOST set to anything but loopback). Exports SMTP_HOST/SMTP_PORT for the app;
# caught mail is kept in .data/mail-catcher.json and shown at MAIL_CATCHER_URL.
start_mail_catcher() {
	if [[ -n ${SMTP_HOST:-} && ${SMTP_HOST} != 127.0.0.1 && ${SMTP_HOST} != localhost ]]; then
		say "E-mail: the SMTP server at $SMTP_HOST (SMTP_HOST is set)"
		return 0
	fi
	export MAIL_CATCHER_SMTP_PORT=${MAIL_CATCHER_SMTP_PORT:-${SMTP_PORT:-4325}}
	export MAIL_CATCHER_WEB_PORT=${MAIL_CATCHER_WEB_PORT:-4326}
	export MAIL_CATCHER_FILE=${MAIL_CATCHER_FILE:-$REPO_ROOT/.data/mail-catcher.json}
	export SMTP_HOST=127.0.0.1 SMTP_PORT=$MAIL_CATCHER_SMTP_PORT SMTP_SECURE=false
	MAIL_CATCHER_URL=http://127.0.0.1:$MAIL_CATCHER_WEB_PORT
	say "Starting the local mail catcher (SMTP 127.0.0.1:$MAIL_CATCHER_SMTP_PORT, web $MAIL_CATCHER_URL)"
	node --import tsx scripts/mail-catcher/main.ts &
	MAIL_CATCHER_PID=$!
	wait_for_health "$MAIL_CATCHER_PID" "$MAIL_CATCHER_URL/health" && return 0
	echo "The local mail catcher did not start on ports $MAIL_CATCHER_SMTP_PORT/$MAIL_CATCHER_WEB_PORT (is a port taken?)." >&2
	exit 1
}

stop_mail_catcher() {
	if [[ -n ${MAIL_CATCHER_PID:-} ]]; then
		kill "$MAIL_CATCHER_PID" 2>/dev/null || true
		wait "$MAIL_CATCHER_PID" 2>/dev/null || true
		MAIL_CATCHER_PID=
	fi
}
