#!/usr/bin/env bash
# `npm run bench`: the private MariaDB and Debian's chromium (as scripts/test-env.sh ensures them),
# then scripts/bench/run.ts, which creates and drops its own database (ROUNDTIDE_BENCH_DB_NAME,
# roundtide_bench by default) and serves the app on ROUNDTIDE_BENCH_PORT (a free port by default).
# The test database is left alone, so the bench can run beside `npm test`; two benches at once
# (two worktrees) need two names.
set -euo pipefail
cd "$(dirname "$0")/.."

export TZ=UTC NODE_ENV=production LOG_LEVEL="${LOG_LEVEL:-warn}"
export ROUNDTIDE_BENCH_DB_NAME="${ROUNDTIDE_BENCH_DB_NAME:-roundtide_bench}"
export ROUNDTIDE_DB_NAME="$ROUNDTIDE_BENCH_DB_NAME"
export CHROMIUM_PATH="${CHROMIUM_PATH:-/usr/bin/chromium}"
export CHROME_PATH="${CHROME_PATH:-$CHROMIUM_PATH}"

if [ ! -x "$CHROMIUM_PATH" ]; then
  if [ "$(id -u)" -eq 0 ]; then
    echo "Installing Debian's chromium for the browser measurements…" >&2
    apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium >/dev/null
  else
    echo "The bench needs chromium. Run as root: apt-get update && apt-get install -y chromium" >&2
    exit 1
  fi
fi

# Creates the bench database and grants the app user on it; run.ts recreates it empty.
bash scripts/db.sh ensure >&2
# The growth table's largest facility holds a million tasks: a server started by an older
# checkout with a small page cache would measure the disk, not the app.
bash scripts/db.sh grow-buffer-pool >&2
exec npx tsx scripts/bench/run.ts
