#!/usr/bin/env bash
# Borewise's private MariaDB: `scripts/db.sh start|stop|status|restart|backup|restore`.
# One instance per checkout, on 127.0.0.1 at its own port, data under .data/ (ignored by git).
# Defaults match src/env.ts; override with DB_PORT, DB_USER, DB_PASSWORD, DB_NAME, DB_TEST_NAME,
# DB_DATA_DIR.
set -euo pipefail

root_dir="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
port="${DB_PORT:-3407}"
app_user="${DB_USER:-borewise}"
app_password="${DB_PASSWORD:-borewise-dev}"
app_db="${DB_NAME:-borewise}"
test_db="${DB_TEST_NAME:-borewise_test}"
data_root="${DB_DATA_DIR:-$root_dir/.data/mariadb}"
datadir="$data_root/data"
pidfile="$data_root/mariadbd.pid"
logfile="$data_root/mariadbd.log"
# A unix socket path must stay under ~107 bytes; deep checkouts fall back to /tmp.
socket="$data_root/mariadbd.sock"
if [ "${#socket}" -gt 100 ]; then
  socket="/tmp/borewise-db-$(printf '%s' "$data_root" | sha1sum | cut -c1-12).sock"
fi

say() { printf 'db: %s\n' "$*"; }
fail() { printf 'db: %s\n' "$*" >&2; exit 1; }

find_server_binary() {
  for candidate in mariadbd /usr/sbin/mariadbd /usr/sbin/mysqld; do
    if command -v "$candidate" >/dev/null 2>&1; then command -v "$candidate"; return 0; fi
  done
  return 1
}

install_server() {
  if find_server_binary >/dev/null; then return 0; fi
  if [ "$(id -u)" -ne 0 ]; then
    fail "MariaDB is not installed. Run: sudo apt-get update && sudo apt-get install -y mariadb-server mariadb-client"
  fi
  say "installing mariadb-server from Debian (once)"
  # policy-rc.d keeps the package from starting a system-wide server on port 3306.
  local policy=/usr/sbin/policy-rc.d created_policy=0
  if [ ! -e "$policy" ]; then printf '#!/bin/sh\nexit 101\n' >"$policy"; chmod +x "$policy"; created_policy=1; fi
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends mariadb-server mariadb-client >/dev/null
  if [ "$created_policy" -eq 1 ]; then rm -f "$policy"; fi
}

client() { mariadb --no-defaults --protocol=socket --socket="$socket" -uroot "$@"; }

server_pid() {
  [ -f "$pidfile" ] || return 1
  local pid
  pid="$(cat "$pidfile" 2>/dev/null || true)"
  [ -n "$pid" ] && kill -0 "$pid" 2>/dev/null || return 1
  # A killed server can linger as a zombie, or its pid can be reused by another program.
  grep -Eq '^State:[[:space:]]+[^Z]' "/proc/$pid/status" 2>/dev/null || return 1
  grep -Eq '^(mariadbd|mysqld)$' "/proc/$pid/comm" 2>/dev/null || return 1
  printf '%s' "$pid"
}

answers() { client -e 'SELECT 1' >/dev/null 2>&1; }

port_taken() { (exec 3<>"/dev/tcp/127.0.0.1/$port") 2>/dev/null; }

init_datadir() {
  [ -d "$datadir/mysql" ] && return 0
  say "initialising data directory $datadir"
  mkdir -p "$datadir"
  mariadb-install-db --no-defaults --datadir="$datadir" --user="$(id -un)" \
    --auth-root-authentication-method=socket --auth-root-socket-user="$(id -un)" \
    --skip-test-db >"$data_root/install.log" 2>&1 || fail "initialising failed; see $data_root/install.log"
}

launch() {
  local bin
  bin="$(find_server_binary)"
  TZ=UTC setsid "$bin" --no-defaults --datadir="$datadir" --user="$(id -un)" \
    --bind-address=127.0.0.1 --port="$port" --socket="$socket" --pid-file="$pidfile" \
    --log-error="$logfile" --skip-name-resolve --default-time-zone=+00:00 \
    --innodb-flush-log-at-trx-commit=1 --innodb-buffer-pool-size=128M --innodb-use-native-aio=0 \
    --character-set-server=utf8mb4 --collation-server=utf8mb4_unicode_ci \
    --max-connections=300 </dev/null >/dev/null 2>&1 &
}

wait_until_answering() {
  for _ in $(seq 1 120); do
    answers && return 0
    sleep 0.5
  done
  fail "MariaDB did not answer within 60 s; see $logfile"
}

create_databases() {
  client <<SQL
CREATE DATABASE IF NOT EXISTS \`$app_db\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
CREATE DATABASE IF NOT EXISTS \`$test_db\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
CREATE USER IF NOT EXISTS '$app_user'@'127.0.0.1' IDENTIFIED BY '$app_password';
CREATE USER IF NOT EXISTS '$app_user'@'localhost' IDENTIFIED BY '$app_password';
GRANT ALL PRIVILEGES ON \`$app_db\`.* TO '$app_user'@'127.0.0.1', '$app_user'@'localhost';
GRANT ALL PRIVILEGES ON \`$test_db\`.* TO '$app_user'@'127.0.0.1', '$app_user'@'localhost';
SQL
}

start() {
  install_server
  mkdir -p "$data_root"
  if server_pid >/dev/null && answers; then
    say "already running on 127.0.0.1:$port (pid $(server_pid))"
    create_databases
    return 0
  fi
  if ! server_pid >/dev/null; then
    # After a crash or kill -9 the pid file and socket stay behind; they belong to no process.
    rm -f "$pidfile" "$socket"
    if port_taken; then
      fail "port $port on 127.0.0.1 is taken by another server; stop it or set DB_PORT to a free port"
    fi
    init_datadir
    launch
  fi
  wait_until_answering
  create_databases
  say "running on 127.0.0.1:$port (pid $(server_pid)), databases $app_db and $test_db"
}

stop() {
  local pid
  if ! pid="$(server_pid)"; then
    rm -f "$pidfile" "$socket"
    say "not running"
    return 0
  fi
  kill -TERM "$pid"
  for _ in $(seq 1 120); do
    kill -0 "$pid" 2>/dev/null || { say "stopped"; return 0; }
    sleep 0.5
  done
  fail "MariaDB (pid $pid) did not stop within 60 s"
}

status() {
  if server_pid >/dev/null && answers; then
    say "running on 127.0.0.1:$port (pid $(server_pid)), data in $datadir"
  else
    say "not running (port $port)"
    return 3
  fi
}

# A consistent snapshot of the app database without locking writers (InnoDB, --single-transaction),
# with its triggers, gzipped. `backup [FILE]`; default .data/backups/<db>-<UTC time>.sql.gz.
backup() {
  server_pid >/dev/null && answers || fail "not running; start it first (npm run db -- start)"
  local file="${1:-$root_dir/.data/backups/$app_db-$(date -u +%Y%m%dT%H%M%SZ).sql.gz}"
  mkdir -p "$(dirname "$file")"
  mariadb-dump --no-defaults --protocol=socket --socket="$socket" -uroot --single-transaction --quick \
    --routines --triggers --events --hex-blob --default-character-set=utf8mb4 --databases "$app_db" |
    gzip >"$file.partial"
  mv "$file.partial" "$file"
  say "backed up $app_db to $file"
}

# `restore FILE [DATABASE]`: loads a backup into a database that does not exist yet (default
# <db>_restored), so a restore never overwrites live data; point DB_NAME at it once checked.
restore() {
  local file="${1:-}" target="${2:-${app_db}_restored}"
  [ -f "$file" ] || fail "usage: scripts/db.sh restore FILE [DATABASE]"
  [[ "$target" =~ ^[A-Za-z0-9_]+$ ]] || fail "database names are letters, digits and _"
  server_pid >/dev/null && answers || fail "not running; start it first (npm run db -- start)"
  if [ -n "$(client -N -e "SELECT 1 FROM information_schema.schemata WHERE schema_name = '$target'")" ]; then
    fail "database $target exists; restore goes into a fresh database"
  fi
  client -e "CREATE DATABASE \`$target\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
    GRANT ALL PRIVILEGES ON \`$target\`.* TO '$app_user'@'127.0.0.1', '$app_user'@'localhost';"
  # The dump names its database; load it under the target name instead.
  gzip -dc "$file" | sed -e "/^CREATE DATABASE /d" -e "s/^USE \`[^\`]*\`;/USE \`$target\`;/" | client "$target"
  say "restored $file into $target"
}

case "${1:-}" in
  start) start ;;
  stop) stop ;;
  status) status ;;
  restart) stop; start ;;
  backup) backup "${2:-}" ;;
  restore) restore "${2:-}" "${3:-}" ;;
  *) echo "usage: scripts/db.sh start|stop|status|restart|backup [FILE]|restore FILE [DATABASE]" >&2; exit 2 ;;
esac
