#!/usr/bin/env bash
# `npm run dev`: the same services as `npm start`, with the Next.js dev server.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
prepare_app
exec npx next dev -H "$host" -p "$port"
