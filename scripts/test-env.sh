#!/usr/bin/env bash
# Prepares what the test suites need, then runs the given command:
# the private MariaDB (installed with apt-get when missing), a fresh test database,
# and Debian's chromium for the browser tests.
set -euo pipefail
cd "$(dirname "$0")/.."

export TZ=UTC NODE_ENV=test LOG_LEVEL="${LOG_LEVEL:-silent}"
export ROUNDTIDE_DB_NAME="${ROUNDTIDE_TEST_DB_NAME:-roundtide_test}"
export CHROMIUM_PATH="${CHROMIUM_PATH:-/usr/bin/chromium}"

if [ ! -x "$CHROMIUM_PATH" ]; then
  if [ "$(id -u)" -eq 0 ]; then
    echo "Installing Debian's chromium for the browser tests…"
    apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium >/dev/null
  else
    echo "Browser tests need chromium. Run as root: apt-get update && apt-get install -y chromium" >&2
    exit 1
  fi
fi

bash scripts/db.sh ensure >/dev/null
npx tsx tests/support/prepare-test-db.ts
exec npx "$@"
