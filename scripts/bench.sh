#!/usr/bin/env bash
# `npm run bench`: speed and size, reported as figures and ratios (never asserted by unit tests).
# 1. vitest bench: the trade computation (tests/bench/*.bench.ts).
# 2. First-load JavaScript of every page against the smallest (scripts/bench-bundles.mjs).
# 3. HTTP: the production build under autocannon on loopback beside the health route (scripts/bench-http.mjs).
# 4. Learning: the shop simulator's figures (scripts/simulate-learning.ts).
# 5. The route figure: logging a run with 10 vs 100 000 earlier runs for its stone (scripts/bench-run-history.ts).
# Everything printed also goes to one report, bench/report.md (ignored by git), printed again at the end.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"

export NEXT_DIST_DIR="${NEXT_DIST_DIR:-.next-test}"
export DB_NAME="${DB_BENCH_NAME:-borewise_test}"

trap 'stop_started_services --database' EXIT
ensure_node_modules
start_database
migrate "$DB_NAME"

report=bench/report.md
mkdir -p bench test-results
{
  echo "# Borewise benchmark report"
  echo
  echo "$(date -u '+%Y-%m-%d %H:%M UTC'), $(nproc) cores, Node $(node --version), load average at start: $(cut -d' ' -f1-3 /proc/loadavg)"
} >"$report"
section() { # section TITLE : a heading in the report and on the console
  step "$1"
  printf '\n## %s\n' "$1" >>"$report"
}

section "Plan computation (vitest bench, medians)"
npx vitest bench --run --outputJson test-results/bench.json >/dev/null
node scripts/bench-medians.mjs test-results/bench.json | tee -a "$report"

step "building for the HTTP benchmark"
bash scripts/build.sh >/dev/null
section "First-load JavaScript per page (build stats)"
node scripts/bench-bundles.mjs | tee -a "$report"
section "HTTP (autocannon, loopback)"
node scripts/bench-http.mjs | tee -a "$report"
section "Learning from logged runs (shop simulator)"
{ echo; echo '```'; npx tsx scripts/simulate-learning.ts; echo '```'; } | tee -a "$report"
section "Logging a run with 10 vs 100 000 earlier runs for its stone"
npx tsx --import ./scripts/server-only-allowed.mjs scripts/bench-run-history.ts | tee -a "$report"

echo
echo "== report ($report)"
cat "$report"
