#!/usr/bin/env bash
# `npm run dev`: the same services as `npm start`, with the Next.js dev server.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
host="${HOST:-127.0.0.1}"
port="${PORT:-3000}"
export APP_URL="${APP_URL:-http://$host:$port}"
ensure_node_modules
start_database
start_mail_catcher
migrate "${DB_NAME:-borewise}"
npx tsx --conditions=react-server scripts/seed.ts
exec npx next dev -H "$host" -p "$port"
