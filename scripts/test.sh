#!/usr/bin/env bash
# npm test: the same set-up as npm start, a fresh test database, then every test.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/ensure.sh
ensure_node_modules
ensure_postgres
ensure_chromium
exec node node_modules/tsx/dist/cli.mjs scripts/test.ts "$@"
