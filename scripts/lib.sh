#!/usr/bin/env bash
# Shared steps of the start, dev and test commands: install what is missing, start the services.
set -euo pipefail

root_dir="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$root_dir"
export TZ=UTC
export NEXT_TELEMETRY_DISABLED=1

step() { printf '\n== %s\n' "$*"; }

ensure_node_modules() {
  # Reinstall when the lockfile changed since the last install.
  if [ ! -d node_modules ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
    step "installing node modules (npm ci)"
    PLAYWRIGHT_SKIP_BROWSER_DOWNLOAD=1 npm ci --no-audit --no-fund
  fi
}

ensure_chromium() {
  if command -v chromium >/dev/null 2>&1; then return 0; fi
  if [ "$(id -u)" -ne 0 ]; then
    echo "Chromium is missing. Run: sudo apt-get update && sudo apt-get install -y chromium" >&2
    return 1
  fi
  step "installing chromium from Debian (once)"
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends chromium fonts-liberation >/dev/null
}

# pdftotext/pdffonts read the machining record's PDF back in its tests (src/server/pdf/pdf-text.ts).
ensure_poppler() {
  if command -v pdftotext >/dev/null 2>&1; then return 0; fi
  if [ "$(id -u)" -ne 0 ]; then
    echo "pdftotext is missing. Run: sudo apt-get update && sudo apt-get install -y poppler-utils" >&2
    return 1
  fi
  step "installing poppler-utils from Debian (once)"
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends poppler-utils >/dev/null
}

# What this command started itself (services already running are left alone): stop_started_services
# stops them again when the command ends.
started_database=0
started_mail_catcher_pid=""
started_payment_fake_pid=""

start_database() {
  step "database"
  bash scripts/db.sh status >/dev/null 2>&1 || started_database=1
  bash scripts/db.sh start
}

migrate() {
  local name="$1"
  DB_NAME="$name" npx tsx scripts/migrate.ts
}

port_open() { (exec 3<>"/dev/tcp/127.0.0.1/$1") 2>/dev/null; }

# `await_port PORT NAME LOG READY`: waits up to 30 s for a service this command started to answer.
await_port() {
  for _ in $(seq 1 60); do
    port_open "$1" && { echo "$4"; return 0; }
    sleep 0.5
  done
  echo "$2 did not start; see $3" >&2
  return 1
}

# `stop_group PID NAME`: stops a service started in its own process group (setsid), if still running.
stop_group() {
  [ -n "$1" ] && kill -0 "$1" 2>/dev/null || return 0
  kill -TERM -- "-$1" 2>/dev/null || kill -TERM "$1" 2>/dev/null || true
  for _ in $(seq 1 20); do kill -0 "$1" 2>/dev/null || break; sleep 0.25; done
  echo "$2 stopped"
}

# The local SMTP catcher receives every mail in development and tests (README: Mail).
start_mail_catcher() {
  [ -f scripts/mail-catcher.ts ] || return 0
  local port="${MAIL_CATCHER_HTTP_PORT:-2580}"
  if port_open "$port"; then return 0; fi
  step "mail catcher"
  mkdir -p .data
  # Its own process group, so stopping it stops npx's child too.
  setsid nohup npx tsx scripts/mail-catcher.ts >.data/mail-catcher.log 2>&1 &
  started_mail_catcher_pid=$!
  await_port "$port" "mail catcher" .data/mail-catcher.log "mail catcher on 127.0.0.1 (SMTP ${SMTP_PORT:-2525}, HTTP $port)"
}

# The local fake of the card-payment provider (README: Payments), unless real keys are set. Its
# webhooks go to $1 (the app's URL). Exports the SDK's base URL and the fake's keys for the app.
start_payment_fake() {
  local app_url="$1"
  if [ -n "${STRIPE_SECRET_KEY:-}" ] && [ -z "${PAYMENT_API_BASE:-}" ]; then return 0; fi
  local port="${PAYMENT_FAKE_PORT:-12111}"
  export PAYMENT_FAKE_PORT="$port"
  export PAYMENT_API_BASE="${PAYMENT_API_BASE:-http://127.0.0.1:$port}"
  export STRIPE_SECRET_KEY="${STRIPE_SECRET_KEY:-sk_test_borewise_fake}"
  export STRIPE_WEBHOOK_SECRET="${STRIPE_WEBHOOK_SECRET:-whsec_borewise_fake}"
  if port_open "$port"; then return 0; fi
  step "payment fake"
  mkdir -p .data
  PAYMENT_FAKE_WEBHOOK_URL="$app_url/api/payments/webhook" setsid nohup npx tsx scripts/payment-fake.ts >.data/payment-fake.log 2>&1 &
  started_payment_fake_pid=$!
  await_port "$port" "payment fake" .data/payment-fake.log "payment fake on 127.0.0.1:$port, webhooks to $app_url"
}

# `stop_started_services [--database]`: the mail catcher and payment fake this command started, and with --database
# the MariaDB it started (npm test and npm run bench; npm start keeps the database serving).
stop_started_services() {
  stop_group "$started_mail_catcher_pid" "mail catcher"
  started_mail_catcher_pid=""
  stop_group "$started_payment_fake_pid" "payment fake"
  started_payment_fake_pid=""
  if [ "${1:-}" = "--database" ] && [ "$started_database" -eq 1 ]; then
    bash scripts/db.sh stop || true
    started_database=0
  fi
}

# What `npm start` and `npm run dev` both need before serving: services up, database migrated and,
# when empty, seeded with the demo shop. Sets host, port and APP_URL.
prepare_app() {
  host="${HOST:-127.0.0.1}"
  port="${PORT:-3000}"
  export APP_URL="${APP_URL:-http://$host:$port}"
  ensure_node_modules
  start_database
  start_mail_catcher
  start_payment_fake "$APP_URL"
  step "migrating ${DB_NAME:-borewise}"
  migrate "${DB_NAME:-borewise}"
  step "demo data"
  npx tsx --import ./scripts/server-only-allowed.mjs scripts/seed.ts
}
