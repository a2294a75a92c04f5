#!/usr/bin/env bash
# Installs what `npm start` and `npm test` need on a fresh machine that has
# only Node.js and npm: the npm packages, Debian's PostgreSQL server and, for
# the browser tests, Debian's chromium. Then runs the TypeScript entry point.
#   scripts/bootstrap.sh start|test|dev|seed-reset [args...]
set -euo pipefail
cd "$(dirname "$0")/.."
what="$1"; shift

if [ ! -d node_modules ] || [ ! -x node_modules/.bin/tsx ]; then
  echo "› installing npm packages (npm ci)"
  npm ci --no-audit --no-fund
fi

apt_packages=()
if ! ls /usr/lib/postgresql/*/bin/pg_ctl >/dev/null 2>&1; then apt_packages+=(postgresql); fi
if [ "$what" = test ] && ! command -v chromium >/dev/null 2>&1; then apt_packages+=(chromium); fi
if [ ${#apt_packages[@]} -gt 0 ]; then
  if [ "$(id -u)" = 0 ] && command -v apt-get >/dev/null 2>&1; then
    echo "› installing Debian packages: ${apt_packages[*]}"
    export DEBIAN_FRONTEND=noninteractive
    apt-get update -qq
    apt-get install -y -qq "${apt_packages[@]}" >/dev/null
    # Debian starts a system cluster on install; ours is project-local, so stop that one.
    if [[ " ${apt_packages[*]} " == *" postgresql "* ]] && command -v pg_ctlcluster >/dev/null; then
      pg_ctlcluster --force "$(ls /usr/lib/postgresql | sort -n | tail -1)" main stop >/dev/null 2>&1 || true
    fi
  else
    echo "Pourscope needs these Debian packages: ${apt_packages[*]}" >&2
    echo "Install them as root, then run this again:" >&2
    echo "  sudo apt-get update && sudo apt-get install -y ${apt_packages[*]}" >&2
    exit 1
  fi
fi

export AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED=true
exec node node_modules/tsx/dist/cli.mjs "scripts/$what.ts" "$@"
