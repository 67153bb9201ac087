#!/usr/bin/env bash
# Installs what the Hexloom tests need on a fresh Debian machine, then runs the whole suite:
# type checks of every workspace, unit/API/component tests, and the real-browser tests.
set -euo pipefail
cd "$(dirname "$0")/.."

need_apt=()
[ -x /usr/bin/chromium ] || need_apt+=(chromium)
/usr/bin/python3 -c 'import scipy.signal, numpy' 2>/dev/null || need_apt+=(python3-scipy python3-numpy)
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
npx vitest run --reporter=default --reporter=json --outputFile.json=.artifacts/vitest.json
# One plain closing line for whoever reads the log.
node -e 'const r = require("./.artifacts/vitest.json"); console.log(`${r.numPassedTests} passed, ${r.numFailedTests} failed`); process.exit(r.numFailedTests === 0 && r.numPassedTests > 0 ? 0 : 1)'
