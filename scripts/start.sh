#!/usr/bin/env bash
# `npm start`: from a fresh clone, install what is missing, start MariaDB, the mail catcher and the payment fake,
# migrate, seed the demo shop into an empty database, build when needed, and serve Borewise.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"

prepare_app

# Build when there is no build yet or any source is newer than it.
build_id="${NEXT_DIST_DIR:-.next}/BUILD_ID"
if [ ! -f "$build_id" ] || [ -n "$(find src fonts public package-lock.json next.config.mjs tailwind.config.ts -newer "$build_id" ! -path public/sw.js ! -path public/sw.js.map -print -quit 2>/dev/null)" ]; then
  step "building"
  bash scripts/build.sh
fi

step "serving"
cat <<MSG
Borewise is at $APP_URL  (health: $APP_URL/api/health)
MSG
if [ -f .data/demo-sign-ins.txt ]; then
  echo "Demo sign-ins (invented demo shop):"
  cat .data/demo-sign-ins.txt
fi
# Not exec: on Ctrl-C or SIGTERM the server finishes its mail and closes its MariaDB connections
# (src/server/shutdown.ts, which NEXT_MANUAL_SIG_HANDLE hands the signal to), then the mail catcher
# this command started is stopped too.
export NEXT_MANUAL_SIG_HANDLE=true
node node_modules/next/dist/bin/next start -H "$host" -p "$port" &
server_pid=$!
trap 'kill -TERM "$server_pid" 2>/dev/null || true' TERM INT
status=0
wait "$server_pid" || status=$?
# A signal ends the first wait (status > 128); wait again for the server's own exit status.
if [ "$status" -gt 128 ]; then status=0; wait "$server_pid" || status=$?; fi
stop_started_services
exit "$status"
