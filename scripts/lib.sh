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
