#!/usr/bin/env bash
# npm start: installs what is missing, starts the demo PostgreSQL, migrates, seeds, builds, serves.
set -euo pipefail
# shellcheck source=scripts/lib.sh
source "$(dirname -- "${BASH_SOURCE[0]}")/lib.sh"

ensure_system_packages postgresql
ensure_node_modules
load_env

export LANDFALL_PG_NAME=${LANDFALL_PG_NAME:-demo}
export LANDFALL_PG_PORT=${LANDFALL_PG_PORT:-54320}
export LANDFALL_PG_DB=${LANDFALL_PG_DB:-landfall}
export PORT=${PORT:-4310}
export HOST=${HOST:-127.0.0.1}
export ORIGIN=${ORIGIN:-http://$HOST:$PORT}
# Uploads are at most 10 MiB (src/lib/uploads/file-check.ts); the multipart body is a little more.
export BODY_SIZE_LIMIT=${BODY_SIZE_LIMIT:-11M}

say "Starting PostgreSQL ($LANDFALL_PG_NAME cluster, port $LANDFALL_PG_PORT)"
bash scripts/pg.sh start
DATABASE_URL=${DATABASE_URL:-$(bash scripts/pg.sh url)}
export DATABASE_URL
trap 'stop_mail_catcher; stop_stripe_fake; bash scripts/pg.sh stop' EXIT

say "Migrating and seeding the demo"
node_modules/.bin/tsx scripts/migrate.ts
node_modules/.bin/tsx scripts/seed.ts
ensure_build
start_stripe_fake
start_mail_catcher
# ${X:+…}${X:-…} would print the process id when X is set: choose the words first.
payments_line="Stripe (test mode keys from .env)"
[[ -n ${STRIPE_FAKE_PID:-} ]] && payments_line="the local Stripe fake at http://127.0.0.1:$STRIPE_FAKE_PORT"
mail_line="sent through $SMTP_HOST:${SMTP_PORT:-}"
[[ -n ${MAIL_CATCHER_PID:-} ]] && mail_line="nothing leaves this machine; read the caught mail at $MAIL_CATCHER_URL"

cat >&2 <<MSG

  Landfall is starting at $ORIGIN
  Demo sign-ins (password for all: Landfall-demo-2026):
    admin@solvrae.example        administrator
    coordinator@solvrae.example  logistics coordinator
    finance@solvrae.example      finance
    broker@kaaiman.example       customs broker
    buyer@hallvik.example        customer (Hallvik Heimtechnik, DE)
    buyer@wattlebird.example     customer (Wattlebird Home Retail, AU)
  Card payments: $payments_line
    test cards on its page: 4242 4242 4242 4242 pays, 4000 0000 0000 0002 is declined
  E-mail: $mail_line
  Press Ctrl-C to stop the app, the payment fake, the mail catcher and the database.

MSG
node build
