#!/usr/bin/env bash
# `npm run bench`: speed and size, reported as figures and ratios (never asserted by unit tests).
# 1. vitest bench: the trade computation (tests/bench/*.bench.ts).
# 2. HTTP: the production build under autocannon on loopback (scripts/bench-http.mjs).
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"

export NEXT_DIST_DIR="${NEXT_DIST_DIR:-.next-test}"
export DB_NAME="${DB_BENCH_NAME:-borewise_test}"

trap 'stop_started_services --database' EXIT
ensure_node_modules
start_database
migrate "$DB_NAME"

step "computation benchmarks (vitest bench)"
mkdir -p test-results
npx vitest bench --run --outputJson test-results/bench.json
node scripts/bench-medians.mjs test-results/bench.json

step "building for the HTTP benchmark"
npx next build >/dev/null
step "first-load JavaScript per route (build stats)"
node scripts/bench-bundles.mjs
step "HTTP benchmarks (autocannon, loopback)"
node scripts/bench-http.mjs
