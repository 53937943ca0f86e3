#!/usr/bin/env bash
# `npm run bench`: the private MariaDB and Debian's chromium (as scripts/test-env.sh ensures them),
# then scripts/bench/run.ts, which creates and drops its own database roundtide_bench.
# The test database is left alone, so the bench can run beside `npm test`.
set -euo pipefail
cd "$(dirname "$0")/.."

export TZ=UTC NODE_ENV=production LOG_LEVEL="${LOG_LEVEL:-warn}"
export ROUNDTIDE_DB_NAME=roundtide_bench
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

# Creates roundtide_bench and grants the app user on it; run.ts recreates it empty.
bash scripts/db.sh ensure >&2
exec npx tsx scripts/bench/run.ts
