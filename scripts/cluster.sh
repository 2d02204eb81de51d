#!/usr/bin/env bash
# A three-node Galera cluster of MariaDB on loopback, for `npm run test:cluster` only (never for a shop:
# see README "Scaling past one machine"). `scripts/cluster.sh start|stop|kill N|rejoin N|status`.
# Node N (1..3) listens for SQL on CLUSTER_BASE_PORT+N-1 (default 3431..3433), for group traffic on
# 45N7 (IST on 45N8) and for a full state transfer (SST, rsync) on 45N9. Data under .data/cluster/nodeN.
set -euo pipefail

root_dir="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
base_port="${CLUSTER_BASE_PORT:-3431}"
data_root="${CLUSTER_DATA_DIR:-$root_dir/.data/cluster}"
app_user="${DB_USER:-borewise}"
app_password="${DB_PASSWORD:-borewise-dev}"
app_db="${DB_NAME:-borewise_cluster}"
provider=/usr/lib/galera/libgalera_smm.so
members="gcomm://127.0.0.1:4517,127.0.0.1:4527,127.0.0.1:4537"

say() { printf 'cluster: %s\n' "$*"; }
fail() { printf 'cluster: %s\n' "$*" >&2; exit 1; }

install_galera() {
  [ -f "$provider" ] && command -v rsync >/dev/null && return 0
  [ "$(id -u)" -eq 0 ] || fail "galera-4 is not installed. Run: sudo apt-get install -y galera-4 rsync"
  say "installing galera-4 and rsync from Debian (once)"
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends galera-4 rsync lsof >/dev/null
}

dir_of() { printf '%s/node%s' "$data_root" "$1"; }
port_of() { printf '%s' "$((base_port + $1 - 1))"; }
sock_of() { printf '/tmp/borewise-cluster-%s-%s.sock' "$(printf '%s' "$data_root" | sha1sum | cut -c1-8)" "$1"; }
client() { local n="$1"; shift; mariadb --no-defaults --protocol=socket --socket="$(sock_of "$n")" -uroot "$@"; }

node_pid() {
  local pidfile pid
  pidfile="$(dir_of "$1")/mariadbd.pid"
  [ -f "$pidfile" ] || return 1
  pid="$(cat "$pidfile" 2>/dev/null || true)"
  [ -n "$pid" ] && grep -Eq '^State:[[:space:]]+[^Z]' "/proc/$pid/status" 2>/dev/null || return 1
  grep -Eq '^(mariadbd|mysqld)$' "/proc/$pid/comm" 2>/dev/null || return 1
  grep -q -- "--port=$(port_of "$1")" "/proc/$pid/cmdline" 2>/dev/null || return 1
  printf '%s' "$pid"
}

node_args() {
  local n="$1" dir
  dir="$(dir_of "$n")"
  printf '%s\n' --no-defaults --datadir="$dir/data" --user="$(id -un)" --bind-address=127.0.0.1 \
    --port="$(port_of "$n")" --socket="$(sock_of "$n")" --pid-file="$dir/mariadbd.pid" --log-error="$dir/mariadbd.log" \
    --skip-name-resolve --default-time-zone=+00:00 --character-set-server=utf8mb4 --collation-server=utf8mb4_unicode_ci \
    --innodb-buffer-pool-size=64M --innodb-use-native-aio=0 --innodb-flush-log-at-trx-commit=0 --max-connections=200 \
    --binlog-format=ROW --log-bin-trust-function-creators=1 --default-storage-engine=InnoDB --innodb-autoinc-lock-mode=2 \
    --wsrep-on=ON --wsrep-provider="$provider" --wsrep-cluster-name=borewise-test --wsrep-cluster-address="$members" \
    --wsrep-node-name="node$n" --wsrep-node-address="127.0.0.1:45${n}7" \
    --wsrep-provider-options="gmcast.listen_addr=tcp://127.0.0.1:45${n}7;ist.recv_addr=127.0.0.1:45${n}8;gcache.size=64M" \
    --wsrep-sst-method=rsync --wsrep-sst-receive-address="127.0.0.1:45${n}9" --wsrep-slave-threads=2
}

init_node() {
  local dir
  dir="$(dir_of "$1")"
  [ -d "$dir/data/mysql" ] && return 0
  mkdir -p "$dir/data"
  mariadb-install-db --no-defaults --datadir="$dir/data" --user="$(id -un)" --auth-root-authentication-method=socket \
    --auth-root-socket-user="$(id -un)" --skip-test-db >"$dir/install.log" 2>&1 || fail "initialising node $1 failed; see $dir/install.log"
}

launch() {
  local n="$1"; shift
  local args
  # A full state transfer (SST) runs rsync's daemon as nobody when we are root: let it write the
  # joiner's files (test data on loopback only).
  [ "$(id -u)" -eq 0 ] && chmod -R a+rwX "$(dir_of "$n")/data"
  mapfile -t args < <(node_args "$n")
  rm -f "$(sock_of "$n")" "$(dir_of "$n")/mariadbd.pid"
  TZ=UTC setsid /usr/sbin/mariadbd "${args[@]}" "$@" </dev/null >/dev/null 2>&1 &
}

synced() { [ "$(client "$1" -N -e "SHOW STATUS LIKE 'wsrep_local_state_comment'" 2>/dev/null | cut -f2)" = "Synced" ]; }

wait_synced() {
  for _ in $(seq 1 240); do
    synced "$1" && return 0
    sleep 0.5
    # mariadbd writes its pid file only once up: a gone process after that is a failed join.
    [ -f "$(dir_of "$1")/mariadbd.pid" ] && ! node_pid "$1" >/dev/null && break
  done
  fail "node $1 did not reach Synced within 120 s; see $(dir_of "$1")/mariadbd.log"
}

# The position a killed node stopped at, so it rejoins with an incremental transfer (IST) when the
# donor's write cache still holds the gap, and a full one (SST) only when it does not.
recovered_position() {
  local n="$1" args log
  mapfile -t args < <(node_args "$n")
  log="$(dir_of "$n")/recover.log"
  /usr/sbin/mariadbd "${args[@]}" --wsrep-recover --log-error="$log" </dev/null >/dev/null 2>&1 || true
  sed -n 's/.*Recovered position: *\([0-9a-f-]*:-\{0,1\}[0-9]*\).*/\1/p' "$log" | tail -1
}

start() {
  install_galera
  for n in 1 2 3; do node_pid "$n" >/dev/null && fail "node $n is already running; run: scripts/cluster.sh stop"; done
  rm -rf "$data_root"
  for n in 1 2 3; do init_node "$n"; done
  launch 1 --wsrep-new-cluster
  wait_synced 1
  for n in 2 3; do launch "$n"; wait_synced "$n"; done
  client 1 <<SQL
CREATE DATABASE IF NOT EXISTS \`$app_db\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
CREATE USER IF NOT EXISTS '$app_user'@'127.0.0.1' IDENTIFIED BY '$app_password';
GRANT ALL PRIVILEGES ON \`$app_db\`.* TO '$app_user'@'127.0.0.1';
SQL
  say "three nodes synced on 127.0.0.1:$(port_of 1)-$(port_of 3), database $app_db"
}

kill_node() {
  local pid
  pid="$(node_pid "$1")" || fail "node $1 is not running"
  kill -9 "$pid"
  for _ in $(seq 1 100); do node_pid "$1" >/dev/null || { say "node $1 killed (pid $pid)"; return 0; }; sleep 0.1; done
  fail "node $1 (pid $pid) did not die"
}

rejoin() {
  local n="$1" position
  node_pid "$n" >/dev/null && fail "node $n is running"
  position="$(recovered_position "$n")"
  if [ -n "$position" ]; then launch "$n" --wsrep-start-position="$position"; else launch "$n"; fi
  wait_synced "$n"
  local how="SST"
  grep -q "IST received" "$(dir_of "$n")/mariadbd.log" && how="IST"
  say "node $n rejoined from ${position:-unknown position} by $how"
}

stop() {
  for n in 3 2 1; do
    local pid
    if pid="$(node_pid "$n")"; then
      kill -TERM "$pid"
      for _ in $(seq 1 120); do kill -0 "$pid" 2>/dev/null || break; sleep 0.5; done
      kill -0 "$pid" 2>/dev/null && kill -9 "$pid"
    fi
    rm -f "$(sock_of "$n")"
  done
  say "stopped"
}

status() {
  for n in 1 2 3; do
    if node_pid "$n" >/dev/null; then
      say "node $n on $(port_of "$n"): $(client "$n" -N -e "SHOW STATUS WHERE Variable_name IN ('wsrep_local_state_comment','wsrep_cluster_size')" | tr '\t\n' '= ')"
    else say "node $n: not running"; fi
  done
}

case "${1:-}" in
  start) start ;;
  stop) stop ;;
  kill) kill_node "${2:?node}" ;;
  rejoin) rejoin "${2:?node}" ;;
  status) status ;;
  *) echo "usage: scripts/cluster.sh start|stop|kill N|rejoin N|status" >&2; exit 2 ;;
esac
