# Sourced by start.sh, test.sh and dev.sh: installs what a fresh machine lacks.
# npm packages (when package-lock.json is newer than the installed tree), Debian's postgresql
# (when its server binaries are missing) and, for tests, Debian's chromium.

as_root() {
  if [ "$(id -u)" = 0 ]; then "$@"; elif command -v sudo >/dev/null 2>&1; then sudo "$@"; else
    echo "Parlour: need root to run: $*" >&2; return 1; fi
}

apt_updated=0
apt_install() {
  if [ "$apt_updated" = 0 ]; then as_root apt-get update -qq; apt_updated=1; fi
  DEBIAN_FRONTEND=noninteractive as_root apt-get install -y -qq "$@"
}

ensure_node_modules() {
  if [ ! -f node_modules/.package-lock.json ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
    echo "Parlour: installing npm packages…"
    npm ci --no-audit --no-fund --loglevel=error
  fi
}

ensure_postgres() {
  if ! ls /usr/lib/postgresql/*/bin/initdb >/dev/null 2>&1; then
    echo "Parlour: installing PostgreSQL from Debian's packages…"
    apt_install postgresql
  fi
}

ensure_chromium() {
  if [ ! -x /usr/bin/chromium ]; then
    echo "Parlour: installing Chromium from Debian's packages…"
    apt_install chromium
  fi
}
