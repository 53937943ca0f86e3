#!/usr/bin/env bash
# Proof under load and faults (npm run test:reliability): Vitest with vitest.reliability.config.ts
# against app processes started as children. Everything runs on a MariaDB server of its own
# (own data folder, port and database, recreated from the demo seed each run), because the
# tests SIGKILL it; the developer's database and roundtide_test are never touched.
# The two-process test needs Debian's redis-server (installed with apt-get when missing and root).
# Settings (env): ROUNDTIDE_RELIABILITY_DB_HOME (.data/mariadb-reliability),
#   ROUNDTIDE_RELIABILITY_DB_PORT (3318), ROUNDTIDE_RELIABILITY_REDIS_PORT (6390),
#   RELIABILITY_LOAD_SECONDS (60), RELIABILITY_APP_LOG_LEVEL (warn).
set -euo pipefail
cd "$(dirname "$0")/.."
root="$(pwd)"

export TZ=UTC NODE_ENV=test LOG_LEVEL="${LOG_LEVEL:-warn}"
export ROUNDTIDE_RELIABILITY=1
export ROUNDTIDE_DB_HOME="${ROUNDTIDE_RELIABILITY_DB_HOME:-$root/.data/mariadb-reliability}"
export ROUNDTIDE_DB_PORT="${ROUNDTIDE_RELIABILITY_DB_PORT:-3318}"
export ROUNDTIDE_DB_NAME=roundtide_reliability
export ROUNDTIDE_RELIABILITY_REDIS_PORT="${ROUNDTIDE_RELIABILITY_REDIS_PORT:-6390}"
unset ROUNDTIDE_REDIS_URL ROUNDTIDE_PUBLIC_URL ROUNDTIDE_SMTP_PORT ROUNDTIDE_SMTP_HOST ROUNDTIDE_MAIL_MODE

if [ "$ROUNDTIDE_DB_PORT" = "3307" ] || [ "$(realpath -m "$ROUNDTIDE_DB_HOME")" = "$root/.data/mariadb" ]; then
  echo "The reliability tests kill their database server; give them their own (not port 3307 or .data/mariadb)." >&2
  exit 1
fi

if ! command -v redis-server >/dev/null 2>&1; then
  if [ "$(id -u)" -eq 0 ]; then
    echo "Installing Debian's redis-server for the two-process test…"
    apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq redis-server >/dev/null
  else
    echo "The two-process test needs redis-server. Run as root: apt-get update && apt-get install -y redis-server" >&2
    exit 1
  fi
fi

stop_all() {
  # The tests stop their own Redis; this catches an interrupted run. The database server goes too.
  local redis_pid=".data/redis-reliability/redis.pid"
  if [ -f "$redis_pid" ] && kill -0 "$(cat "$redis_pid")" 2>/dev/null; then kill "$(cat "$redis_pid")" || true; fi
  bash scripts/db.sh stop >/dev/null 2>&1 || true
}
trap stop_all EXIT

started=$SECONDS
bash scripts/db.sh ensure >/dev/null
# A fresh database each run: every table dropped, migrated, and the demo facility loaded.
npx tsx seed/index.ts --reset
echo "Reliability database $ROUNDTIDE_DB_NAME ready on 127.0.0.1:$ROUNDTIDE_DB_PORT in $((SECONDS - started)) s"

status=0
npx vitest run --config vitest.reliability.config.ts "$@" || status=$?
echo "Reliability run finished in $((SECONDS - started)) s (exit $status)"
exit "$status"
