# Shared by scripts/start.sh and scripts/test.sh: dependencies, services, clean shutdown.
# shellcheck shell=bash
ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$ROOT"
mkdir -p .data/logs
SERVICE_PIDS=()

log() { printf '\033[1m[spanlark]\033[0m %s\n' "$*" >&2; }

# Installs npm dependencies when node_modules is missing or older than the lock file.
ensure_node_modules() {
  if [ ! -d node_modules ] || [ ! -f node_modules/.package-lock.json ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
    log "installing npm dependencies (npm ci)…"
    npm ci --no-audit --no-fund --loglevel=error
  fi
}

# A Debian package, installed with apt-get when missing (as root), or a clear message otherwise.
ensure_deb() {
  local bin="$1" pkg="$2"
  if command -v "$bin" >/dev/null 2>&1 || [ -x "$bin" ]; then return 0; fi
  if [ "$(id -u)" = "0" ]; then
    log "installing $pkg from Debian's packages…"
    export DEBIAN_FRONTEND=noninteractive
    apt-get update -qq >/dev/null && apt-get install -y -qq "$pkg" >/dev/null
  else
    log "missing $pkg: install it with  sudo apt-get install -y $pkg"; return 1
  fi
}

# The session secret for next-auth: the environment's, or one generated once and kept in .data/.
ensure_secret() {
  if [ -z "${NEXTAUTH_SECRET:-}" ]; then
    [ -s .data/nextauth-secret ] || node -e "process.stdout.write(require('crypto').randomBytes(32).toString('hex'))" > .data/nextauth-secret
    NEXTAUTH_SECRET="$(cat .data/nextauth-secret)"
    export NEXTAUTH_SECRET
  fi
}

wait_for_url() {
  local url="$1" name="$2" i
  for i in $(seq 1 120); do
    if curl -fsS -o /dev/null "$url" 2>/dev/null; then return 0; fi
    sleep 0.5
  done
  log "$name did not answer at $url"; return 1
}

port_busy() { (exec 3<>"/dev/tcp/127.0.0.1/$1") 2>/dev/null; }

# The local mail sink (maildev): SMTP 1025, web and API 1080 (MAIL_WEB_PORT), loopback only.
start_mail_sink() {
  local web="${MAIL_WEB_PORT:-1080}"
  export MAILDEV_URL="http://127.0.0.1:$web"
  if port_busy "${SMTP_PORT:-1025}"; then log "mail sink already listening on ${SMTP_PORT:-1025}"; return 0; fi
  node_modules/.bin/maildev --smtp "${SMTP_PORT:-1025}" --web "$web" --ip 127.0.0.1 --web-ip 127.0.0.1 \
    > .data/logs/maildev.log 2>&1 &
  SERVICE_PIDS+=($!)
  wait_for_url "$MAILDEV_URL/api/healthz" "mail sink" && log "mail sink: SMTP 127.0.0.1:${SMTP_PORT:-1025}, inbox $MAILDEV_URL"
}

# The Stripe stand-in (scripts/stripe-standin/main.ts) unless a real Stripe key is configured.
start_stripe_standin() {
  if [ -n "${STRIPE_SECRET_KEY:-}" ] && [ -z "${STRIPE_API_HOST:-}" ]; then
    log "using the real Stripe API (STRIPE_SECRET_KEY set, no STRIPE_API_HOST)"; return 0
  fi
  export STRIPE_SECRET_KEY="${STRIPE_SECRET_KEY:-sk_test_local}" STRIPE_WEBHOOK_SECRET="${STRIPE_WEBHOOK_SECRET:-whsec_local}"
  export STRIPE_API_HOST=127.0.0.1 STRIPE_API_PORT="${STRIPE_STANDIN_PORT:-12111}" STRIPE_API_PROTOCOL=http
  [ -f scripts/stripe-standin/main.ts ] || return 0
  if port_busy "$STRIPE_API_PORT"; then log "Stripe stand-in already listening on $STRIPE_API_PORT"; return 0; fi
  STRIPE_STANDIN_PORT="$STRIPE_API_PORT" node_modules/.bin/tsx scripts/stripe-standin/main.ts > .data/logs/stripe-standin.log 2>&1 &
  SERVICE_PIDS+=($!)
  local i
  for i in $(seq 1 60); do port_busy "$STRIPE_API_PORT" && break; sleep 0.5; done
  log "Stripe stand-in on http://127.0.0.1:$STRIPE_API_PORT (webhooks to ${STRIPE_WEBHOOK_URL:-})"
}

stop_services() {
  local pid
  for pid in "${SERVICE_PIDS[@]}"; do kill "$pid" 2>/dev/null || true; done
  for pid in "${SERVICE_PIDS[@]}"; do wait "$pid" 2>/dev/null || true; done
  if [ -z "${EXTERNAL_DATABASE:-}" ]; then bash scripts/pg.sh stop || true; fi
}

# Starts the local PostgreSQL unless DATABASE_URL points elsewhere; sets DATABASE_URL for database $1.
start_database() {
  if [ -n "${DATABASE_URL:-}" ]; then
    EXTERNAL_DATABASE=1; log "using DATABASE_URL from the environment"; return 0
  fi
  bash scripts/pg.sh start
  bash scripts/pg.sh ensure-db "$1"
  DATABASE_URL="$(bash scripts/pg.sh url "$1")"
  export DATABASE_URL
}
