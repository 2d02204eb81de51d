#!/usr/bin/env bash
# `npm run test:cluster` (not part of `npm test`): a three-node Galera cluster on loopback
# (scripts/cluster.sh), migrated, two `next start` instances on two nodes, the floor's run-submission
# load while one node is kill -9'd and rejoins; prints what was lost, doubled and retried. Stops the
# cluster and the apps it started, whatever happens. Needs a build (NEXT_DIST_DIR, default .next).
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."
export DB_NAME=borewise_cluster DB_TEST_NAME=borewise_cluster CLUSTER_BASE_PORT="${CLUSTER_BASE_PORT:-3431}"
dist="${NEXT_DIST_DIR:-.next}"
[ -f "$dist/BUILD_ID" ] || { echo "test:cluster: no build in $dist; run: NEXT_DIST_DIR=$dist npm run build" >&2; exit 1; }
trap 'bash scripts/cluster.sh stop' EXIT
bash scripts/cluster.sh start
DB_PORT="$CLUSTER_BASE_PORT" npx tsx scripts/migrate.ts
npx vitest run --config vitest.cluster.config.ts
