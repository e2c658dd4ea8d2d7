#!/usr/bin/env bash
# `npm run lighthouse`: Lighthouse mobile on the home page, the sizing flow and a crew link, in Debian's Chromium,
# against the built app with the demo data (its own database, spanlark_lighthouse, and port LIGHTHOUSE_PORT,
# default 3200). SKIP_BUILD=1 serves the build already in .next; RUNS=N runs each page N times (default 3).
# Not part of `npm test`: scores on a shared machine vary from run to run; README's Performance section keeps them.
set -uo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"

PORT="${LIGHTHOUSE_PORT:-3200}"
ensure_node_modules || exit 1
ensure_deb /usr/bin/chromium chromium || exit 1
ensure_secret
trap stop_services EXIT
trap 'exit 130' INT TERM

start_database spanlark_lighthouse || exit 1
export APP_URL="http://127.0.0.1:$PORT" NEXTAUTH_URL="http://127.0.0.1:$PORT" STRIPE_WEBHOOK_URL="http://127.0.0.1:$PORT/api/stripe/webhook"
start_mail_sink || exit 1
start_stripe_standin || exit 1
{ node_modules/.bin/tsx scripts/db.ts migrate && node_modules/.bin/tsx scripts/db.ts seed && node_modules/.bin/tsx scripts/stripe-setup.ts; } > .data/logs/lighthouse-db.log 2>&1 ||
  { cat .data/logs/lighthouse-db.log >&2; exit 1; }
if [ "${SKIP_BUILD:-0}" != 1 ]; then
  log "building…"
  node_modules/.bin/next build > .data/logs/lighthouse-build.log 2>&1 || { tail -40 .data/logs/lighthouse-build.log >&2; exit 1; }
fi
NODE_ENV=production LOG_LEVEL=warn node scripts/serve.mjs -H 127.0.0.1 -p "$PORT" > .data/logs/lighthouse-app.log 2>&1 &
SERVICE_PIDS+=($!)
wait_for_url "$APP_URL/api/health" "the app" || exit 1
log "Lighthouse (mobile) on $APP_URL"
node_modules/.bin/tsx scripts/lighthouse/run.ts "$APP_URL"
