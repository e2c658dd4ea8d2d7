#!/usr/bin/env bash
# `npm start` (or `npm run dev` with --dev): installs what is missing, starts PostgreSQL and the local
# stand-ins, migrates, seeds the demo data, builds and serves Spanlark on http://127.0.0.1:3000.
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"

MODE=prod
[ "${1:-}" = "--dev" ] && MODE=dev
PORT="${PORT:-3000}"

ensure_node_modules
command -v curl >/dev/null || ensure_deb curl curl
ensure_secret
trap stop_services EXIT
trap 'exit 130' INT TERM

start_database spanlark_dev
export APP_URL="${APP_URL:-http://127.0.0.1:$PORT}" NEXTAUTH_URL="${NEXTAUTH_URL:-http://127.0.0.1:$PORT}"
export STRIPE_WEBHOOK_URL="${STRIPE_WEBHOOK_URL:-$APP_URL/api/stripe/webhook}"
start_mail_sink
start_stripe_standin

node_modules/.bin/tsx scripts/db.ts migrate
node_modules/.bin/tsx scripts/db.ts seed
[ -f scripts/stripe-setup.ts ] && node_modules/.bin/tsx scripts/stripe-setup.ts

cat >&2 <<MSG

  Spanlark demo accounts (invented data):
    admin       admin@spanlark.test   / admin-demo-pass
    subscriber  sam@hollisrowe.test   / subscriber-demo-pass
    builder     dee@hollisrowe.test   / builder-demo-pass
  Mail sink (every e-mail the app sends): ${MAILDEV_URL}

MSG

if [ "$MODE" = dev ]; then
  log "starting the development server on http://127.0.0.1:$PORT (hot reload)"
  node_modules/.bin/next dev -H 127.0.0.1 -p "$PORT"
else
  log "building…"
  node_modules/.bin/next build
  log "serving on http://127.0.0.1:$PORT"
  # scripts/serve.mjs: Next.js behind a server that tells the app each request's socket address (rate limits).
  NODE_ENV=production node scripts/serve.mjs -H 127.0.0.1 -p "$PORT"  # SPANLARK_WORKERS processes (default: one per core)
fi
