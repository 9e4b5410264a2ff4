#!/usr/bin/env bash
# npm start: everything a fresh machine needs, then the app with demo data.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/ensure.sh
ensure_node_modules
ensure_postgres
exec node node_modules/tsx/dist/cli.mjs scripts/start.ts "$@"
