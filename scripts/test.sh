#!/usr/bin/env bash
# Installs what the Hexloom tests need on a fresh Debian machine, then runs the whole suite:
# type checks of every workspace, unit/API/component tests, the real-browser tests, and the server suite once more on a
# throwaway PostgreSQL server.
set -euo pipefail
cd "$(dirname "$0")/.."

need_apt=()
[ -x /usr/bin/chromium ] || need_apt+=(chromium)
/usr/bin/python3 -c 'import scipy.signal, numpy' 2>/dev/null || need_apt+=(python3-scipy python3-numpy)
ls /usr/lib/postgresql/*/bin/initdb >/dev/null 2>&1 || need_apt+=(postgresql)
if [ ${#need_apt[@]} -gt 0 ]; then
  echo "Installing Debian packages: ${need_apt[*]}"
  SUDO=""; [ "$(id -u)" -eq 0 ] || SUDO="sudo"
  $SUDO apt-get update -q
  DEBIAN_FRONTEND=noninteractive $SUDO apt-get install -y -q --no-install-recommends "${need_apt[@]}"
fi

npm ci --no-audit --no-fund
npm run build
npm run typecheck
mkdir -p .artifacts
status=0
npx vitest run --reporter=default --reporter=json --outputFile.json="$PWD/.artifacts/vitest.json" || status=1

# The server suite again, on a throwaway PostgreSQL server (loopback port), with the two-server specs.
pg_dir=$(mktemp -d /tmp/hexloom-pg-XXXXXX)
trap 'bash scripts/postgres-cluster.sh stop "$pg_dir"' EXIT
pg_port=$(node -e 'const s = require("net").createServer().listen(0, "127.0.0.1", () => { console.log(s.address().port); s.close(); })')
pg_url=$(bash scripts/postgres-cluster.sh start "$pg_dir" "$pg_port")
HEXLOOM_TEST_DATABASE_URL="$pg_url" npx vitest run --config apps/server/vitest.pg.config.ts --reporter=default --reporter=json --outputFile.json="$PWD/.artifacts/vitest-postgres.json" || status=1

# One plain closing line for whoever reads the log.
node -e 'const a = require("./.artifacts/vitest.json"), b = require("./.artifacts/vitest-postgres.json"); const p = a.numPassedTests + b.numPassedTests, f = a.numFailedTests + b.numFailedTests; console.log(`${p} passed, ${f} failed (${a.numPassedTests} on PGlite and in the browser, ${b.numPassedTests} of the server suite on PostgreSQL)`); process.exit(f === 0 && a.numPassedTests > 0 && b.numPassedTests > 0 ? 0 : 1)' || status=1
exit $status
