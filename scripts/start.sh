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
exec npx next start -H "$host" -p "$port"
