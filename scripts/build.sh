#!/usr/bin/env bash
# The production build: `next build` (Turbopack), then the floor's service worker. Serwist's
# configurator mode reads the finished build (NEXT_DIST_DIR included) and writes public/sw.js with the
# build's static files in its precache list, so the worker always matches the build beside it.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."
npx next build "$@"
npx serwist build serwist.config.mjs
