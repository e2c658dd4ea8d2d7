#!/usr/bin/env bash
# `npm test`: type check, lint, format check, unit and integration tests (vitest, against a fresh PostgreSQL database),
# then browser tests in Debian's Chromium against the built app. Ends with one line totalling every runner:
# "N passed, N failed, N skipped"; exits non-zero when anything failed.
# `npm test -- --quick` skips the build and the browser tests.
set -uo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"

QUICK=0
[ "${1:-}" = "--quick" ] && QUICK=1
E2E_PORT="${E2E_PORT:-3100}"
RESULTS=.data/test-results
rm -rf "$RESULTS"; mkdir -p "$RESULTS" tests/artifacts

ensure_node_modules || exit 1
command -v curl >/dev/null || ensure_deb curl curl || exit 1
[ "$QUICK" = 1 ] || ensure_deb /usr/bin/chromium chromium || exit 1
ensure_secret
trap stop_services EXIT
trap 'exit 130' INT TERM

unset DATABASE_URL_FOR_TESTS
start_database spanlark_test || exit 1
if [ -z "${EXTERNAL_DATABASE:-}" ]; then
  bash scripts/pg.sh recreate-db spanlark_test >/dev/null
  bash scripts/pg.sh recreate-db spanlark_e2e >/dev/null
  E2E_DATABASE_URL="$(bash scripts/pg.sh url spanlark_e2e)"
  export E2E_OWNS_PG=1   # browser tests may add databases to this cluster, or stop and start it (database-down, instances)
else
  E2E_DATABASE_URL="${E2E_DATABASE_URL:-$DATABASE_URL}"
fi
export TEST_DATABASE_URL="$DATABASE_URL" NODE_ENV=test
export APP_URL="http://127.0.0.1:$E2E_PORT" NEXTAUTH_URL="http://127.0.0.1:$E2E_PORT" E2E_BASE_URL="http://127.0.0.1:$E2E_PORT"
export STRIPE_WEBHOOK_URL="$APP_URL/api/stripe/webhook"
start_mail_sink || exit 1
start_stripe_standin || exit 1

STAGES=()
record() { STAGES+=("$1:$2"); }   # name:status

log "type check (tsc --noEmit)"
if node_modules/.bin/tsc --noEmit -p .; then record typecheck 0; else record typecheck 1; fi

log "lint (eslint)"
if node_modules/.bin/eslint . --max-warnings=0; then record lint 0; else record lint 1; fi

log "format (prettier --check)"
if node_modules/.bin/prettier --check . --log-level=warn; then record format 0; else record format 1; fi

log "unit and integration tests (vitest)"
node_modules/.bin/tsx scripts/db.ts migrate >/dev/null || record migrate 1
node_modules/.bin/vitest run --reporter=default --reporter=json --outputFile="$RESULTS/unit.json"
record vitest $?

if [ "$QUICK" = 0 ]; then
  log "building the app for the browser tests"
  if node_modules/.bin/next build > .data/logs/next-build.log 2>&1; then
    record build 0
    (
      export DATABASE_URL="$E2E_DATABASE_URL"
      node_modules/.bin/tsx scripts/db.ts migrate && node_modules/.bin/tsx scripts/db.ts seed &&
        { [ ! -f scripts/stripe-setup.ts ] || node_modules/.bin/tsx scripts/stripe-setup.ts; }
    ) > .data/logs/e2e-db.log 2>&1 || { record e2e-db 1; cat .data/logs/e2e-db.log >&2; }
    DATABASE_URL="$E2E_DATABASE_URL" NODE_ENV=production LOG_LEVEL=warn SPANLARK_WORKERS="${SPANLARK_WORKERS:-1}" \
      node scripts/serve.mjs -H 127.0.0.1 -p "$E2E_PORT" > .data/logs/e2e-app.log 2>&1 &
    SERVICE_PIDS+=($!)
    if wait_for_url "$E2E_BASE_URL/api/health" "the app"; then
      log "browser tests (Chromium, 390x844)"
      node_modules/.bin/vitest run -c vitest.e2e.config.ts --reporter=default --reporter=json --outputFile="$RESULTS/e2e.json"
      record e2e $?
    else
      record e2e-start 1; tail -50 .data/logs/e2e-app.log >&2
    fi
  else
    record build 1; tail -60 .data/logs/next-build.log >&2
  fi
fi

# Stop the services first, so the summary line is the last thing printed.
stop_services >/dev/null 2>&1
trap - EXIT

node --input-type=module - "$RESULTS" "${STAGES[@]}" <<'JS'
import { existsSync, readFileSync } from "node:fs";
const [dir, ...stages] = process.argv.slice(2);
let passed = 0, failed = 0, skipped = 0;
const lines = [];
for (const stage of stages) {
  const [name, status] = stage.split(":");
  const file = `${dir}/${name === "vitest" ? "unit" : name}.json`;
  if ((name === "vitest" || name === "e2e") && existsSync(file)) {
    const r = JSON.parse(readFileSync(file, "utf8"));
    const s = (r.numPendingTests ?? 0) + (r.numTodoTests ?? 0);
    // A suite that failed to load counts as a failure even when no test inside it ran.
    const broken = (r.testResults ?? []).filter((t) => t.status === "failed" && (t.assertionResults ?? []).length === 0).length;
    passed += r.numPassedTests; failed += r.numFailedTests + broken; skipped += s;
    lines.push(`  ${name}: ${r.numPassedTests} passed, ${r.numFailedTests + broken} failed, ${s} skipped`);
    if (status !== "0" && r.numFailedTests + broken === 0) { failed += 1; lines.push(`  ${name}: runner exited ${status}`); }
    // Name each failure here too, so a log cut to its last lines still says what failed and why.
    for (const t of r.testResults ?? []) {
      const where = t.name.replace(`${process.cwd()}/`, "");
      const first = (m) => String(m ?? "").split("\n").find((l) => l.trim()) ?? "";
      if (t.status === "failed" && (t.assertionResults ?? []).length === 0) lines.push(`    FAILED ${where}: ${first(t.message).slice(0, 300)}`);
      for (const a of t.assertionResults ?? []) {
        if (a.status === "failed") lines.push(`    FAILED ${where} > ${a.fullName}: ${first((a.failureMessages ?? [])[0]).slice(0, 300)}`);
      }
    }
  } else {
    if (status === "0") passed += 1; else failed += 1;
    lines.push(`  ${name}: ${status === "0" ? "passed" : "FAILED"}`);
  }
}
console.log(`\nSpanlark test summary\n${lines.join("\n")}`);
console.log(`${passed} passed, ${failed} failed, ${skipped} skipped`);
process.exit(failed > 0 ? 1 : 0);
JS
