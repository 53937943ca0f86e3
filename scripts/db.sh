#!/usr/bin/env bash
# Runs Roundtide's private MariaDB server: loopback only, data under .data/.
# Usage: scripts/db.sh ensure|start|stop|status|reset
# Settings (env): ROUNDTIDE_DB_PORT (3307), ROUNDTIDE_DB_HOME (.data/mariadb),
#   ROUNDTIDE_DB_NAME (roundtide), ROUNDTIDE_DB_USER (roundtide), ROUNDTIDE_DB_PASSWORD (roundtide-local),
#   ROUNDTIDE_DB_BUFFER_POOL (1G: InnoDB's page cache; a year of a large facility's tasks and their
#   indexes outgrew 128M, and every insert then read index pages from disk)
set -euo pipefail

root_dir="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
port="${ROUNDTIDE_DB_PORT:-3307}"
home="${ROUNDTIDE_DB_HOME:-$root_dir/.data/mariadb}"
db_name="${ROUNDTIDE_DB_NAME:-roundtide}"
db_user="${ROUNDTIDE_DB_USER:-roundtide}"
db_password="${ROUNDTIDE_DB_PASSWORD:-roundtide-local}"
buffer_pool="${ROUNDTIDE_DB_BUFFER_POOL:-1G}"
data="$home/data"
run="$home/run"
log="$home/log"
pid_file="$run/mariadbd.pid"
socket="$run/mariadbd.sock"
# A Unix socket path must stay under ~107 bytes; fall back to /tmp for deep clones.
if [ "${#socket}" -gt 100 ]; then
  socket="/tmp/roundtide-$(printf '%s' "$home" | md5sum | cut -c1-12).sock"
fi
me="$(id -un)"

client() { mariadb --no-defaults --socket="$socket" -uroot "$@"; }

install_server() {
  if command -v mariadbd >/dev/null 2>&1 || [ -x /usr/sbin/mariadbd ]; then return; fi
  if [ "$(id -u)" -ne 0 ]; then
    echo "MariaDB is not installed. Run as root: apt-get update && apt-get install -y mariadb-server" >&2
    exit 1
  fi
  echo "Installing mariadb-server with apt-get…"
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq mariadb-server >/dev/null
}

is_running() {
  [ -f "$pid_file" ] && kill -0 "$(cat "$pid_file")" 2>/dev/null
}

init_data() {
  [ -d "$data/mysql" ] && return
  mkdir -p "$data" "$run" "$log"
  echo "Initialising a private MariaDB data folder in $data"
  mariadb-install-db --no-defaults --user="$me" --datadir="$data" \
    --auth-root-authentication-method=socket --auth-root-socket-user="$me" --skip-test-db >"$log/install.log" 2>&1
}

start_server() {
  if is_running; then return; fi
  mkdir -p "$run" "$log"
  PATH="$PATH:/usr/sbin" TZ=UTC nohup mariadbd --no-defaults --user="$me" --datadir="$data" \
    --socket="$socket" --pid-file="$pid_file" --log-error="$log/error.log" \
    --port="$port" --bind-address=127.0.0.1 --skip-networking=0 --skip-name-resolve \
    --character-set-server=utf8mb4 --collation-server=utf8mb4_unicode_ci \
    --default-time-zone=+00:00 --innodb-buffer-pool-size="$buffer_pool" --max-connections=400 \
    --innodb-print-all-deadlocks=ON \
    >/dev/null 2>&1 &
  for _ in $(seq 1 100); do
    if mariadb-admin --no-defaults --socket="$socket" -uroot --silent ping >/dev/null 2>&1; then return; fi
    sleep 0.1
  done
  echo "MariaDB did not start; see $log/error.log" >&2
  tail -n 20 "$log/error.log" >&2 || true
  exit 1
}

create_database() {
  local name="$1"
  client -e "CREATE DATABASE IF NOT EXISTS \`$name\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
    CREATE USER IF NOT EXISTS '$db_user'@'127.0.0.1' IDENTIFIED BY '$db_password';
    CREATE USER IF NOT EXISTS '$db_user'@'localhost' IDENTIFIED BY '$db_password';
    GRANT ALL PRIVILEGES ON \`$name\`.* TO '$db_user'@'127.0.0.1', '$db_user'@'localhost';
    GRANT ALL PRIVILEGES ON \`${name}\_%\`.* TO '$db_user'@'127.0.0.1', '$db_user'@'localhost';"
}

stop_server() {
  if ! is_running; then echo "MariaDB is not running."; return; fi
  local pid; pid="$(cat "$pid_file")"
  mariadb-admin --no-defaults --socket="$socket" -uroot shutdown || kill "$pid"
  for _ in $(seq 1 100); do kill -0 "$pid" 2>/dev/null || { echo "MariaDB stopped."; return; }; sleep 0.1; done
  echo "MariaDB did not stop in 10 s" >&2; exit 1
}

case "${1:-ensure}" in
  ensure|start)
    install_server; init_data; start_server; create_database "$db_name"
    echo "MariaDB ready on 127.0.0.1:$port (database $db_name)" ;;
  create-db) create_database "${2:?database name}" ;;
  # A server started before the setting grew keeps its old cache; InnoDB resizes it online.
  grow-buffer-pool) client -e "SET GLOBAL innodb_buffer_pool_size = GREATEST(@@innodb_buffer_pool_size, ${2:-1073741824})" ;;
  stop) stop_server ;;
  status) if is_running; then echo "running (pid $(cat "$pid_file"), port $port)"; else echo "stopped"; exit 3; fi ;;
  socket) echo "$socket" ;;
  reset) stop_server; rm -rf "$data"; echo "Removed $data" ;;
  *) echo "usage: $0 ensure|start|stop|status|reset|create-db NAME|grow-buffer-pool [BYTES]" >&2; exit 2 ;;
esac
