#!/usr/bin/env bash
# npm run dev: database, mail stand-in and API server, plus Vite's dev server with /api proxied.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/ensure.sh
ensure_node_modules
ensure_postgres
exec node node_modules/tsx/dist/cli.mjs scripts/start.ts --dev "$@"
