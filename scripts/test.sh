#!/usr/bin/env bash
# npm test: the whole suite, as CI runs it. Installs what is missing, starts a brand-new
# PostgreSQL cluster for the tests only, runs static checks, unit and integration tests, builds
# the app and drives it in Chromium; stops everything it started.
set -euo pipefail
# shellcheck source=scripts/lib.sh
source "$(dirname -- "${BASH_SOURCE[0]}")/lib.sh"

ensure_system_packages postgresql chromium poppler-utils
ensure_node_modules

say "Static checks: svelte-check, eslint, prettier"
node_modules/.bin/svelte-kit sync
node_modules/.bin/svelte-check --tsconfig ./tsconfig.json --fail-on-warnings --threshold warning --output machine | tail -n 3
node_modules/.bin/eslint .
node_modules/.bin/prettier --check . --log-level warn

# Never the demo cluster: a fresh one, its own name and port, wiped at every run.
export LANDFALL_PG_NAME=test
export LANDFALL_PG_PORT=${LANDFALL_TEST_PG_PORT:-54330}
export LANDFALL_PG_DB=landfall_test
say "Starting a fresh test PostgreSQL (port $LANDFALL_PG_PORT)"
bash scripts/pg.sh reset
trap 'bash scripts/pg.sh stop' EXIT
DATABASE_URL=$(bash scripts/pg.sh url)
export DATABASE_URL
export AUTH_SECRET=test-secret-not-for-production-0123456789
node_modules/.bin/tsx scripts/migrate.ts
node_modules/.bin/tsx scripts/seed.ts

say "Unit and integration tests (vitest)"
node_modules/.bin/vitest run

say "Building the app"
node_modules/.bin/vite build --logLevel error

say "End-to-end tests (Playwright, Debian Chromium)"
bash scripts/pg.sh reset-db
node_modules/.bin/tsx scripts/migrate.ts
node_modules/.bin/tsx scripts/seed.ts
node_modules/.bin/playwright test
