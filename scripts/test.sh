#!/usr/bin/env bash
# `npm test`: everything CI runs, from a fresh clone. Installs what is missing, starts MariaDB and the
# mail catcher and the payment fake, migrates the test database, then typecheck, lint, unit + integration tests (vitest,
# real MariaDB), production build, end-to-end tests (Playwright + Debian's Chromium). Ends with one
# line "N passed, N failed" that totals every runner; exits non-zero on any failure.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"

export DB_TEST_NAME="${DB_TEST_NAME:-borewise_test}"
export NEXT_DIST_DIR="${NEXT_DIST_DIR:-.next-test}"
export NEXT_TELEMETRY_DISABLED=1
results=test-results
passed=0
failed=0

check() { # check NAME COMMAND... : a step that counts as one test
  local name="$1"; shift
  step "$name"
  if "$@"; then passed=$((passed + 1)); else failed=$((failed + 1)); echo "FAILED: $name"; fi
}

count_json() { # count_json FILE KIND : add a runner's totals from its JSON report
  local file="$1" kind="$2" counts
  if [ ! -f "$file" ]; then failed=$((failed + 1)); echo "no $kind report ($file)"; return; fi
  counts="$(node scripts/count-results.mjs "$kind" "$file")"
  passed=$((passed + ${counts% *}))
  failed=$((failed + ${counts#* }))
  echo "$kind: ${counts% *} passed, ${counts#* } failed"
}

# tests/reliability: faults against `next start` servers with its own MariaDB (kill -9 is safe there)
# and its own mail catcher, both started and stopped by the suite (tests/reliability/support).
run_reliability() {
  step "reliability tests (own MariaDB on 127.0.0.1:${RELIABILITY_DB_PORT:-3418})"
  npx vitest run --config vitest.reliability.config.ts --reporter=default --reporter=json --outputFile="$results/reliability.json" || true
  count_json "$results/reliability.json" vitest
}

trap 'stop_started_services --database' EXIT
ensure_node_modules
ensure_chromium
ensure_poppler
start_database
start_mail_catcher
start_payment_fake "http://127.0.0.1:${E2E_PORT:-3100}"
step "migrating $DB_TEST_NAME"
migrate "$DB_TEST_NAME"
# The end-to-end tests sign in as the demo users, so the test database carries the demo shop too.
DB_NAME="$DB_TEST_NAME" npx tsx --import ./scripts/server-only-allowed.mjs scripts/seed.ts
rm -rf "$results"
mkdir -p "$results"

check "typecheck" npx tsc --noEmit
check "lint" npx eslint --max-warnings 0 .

step "unit and integration tests (vitest)"
npx vitest run --reporter=default --reporter=json --outputFile="$results/vitest.json" || true
count_json "$results/vitest.json" vitest

check "build" bash scripts/build.sh
if [ -f "$NEXT_DIST_DIR/BUILD_ID" ]; then
  run_reliability
  step "end-to-end tests (playwright, chromium)"
  npx playwright test || true
  count_json "$results/e2e-results.json" playwright
else
  failed=$((failed + 2))
  echo "reliability and end-to-end tests skipped: no build"
fi

echo
echo "$passed passed, $failed failed"
[ "$failed" -eq 0 ]
