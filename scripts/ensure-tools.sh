#!/usr/bin/env bash
# Installs what is missing on a fresh Debian machine: MariaDB server (and, for tests,
# Chromium + poppler-utils), then node_modules when missing or older than the lock.
# Usage: scripts/ensure-tools.sh [--cluster] [--test]   (--cluster: Galera and rsync for the cluster scripts)
set -euo pipefail
cd "$(dirname "$0")/.."
pkgs=()
command -v mariadbd >/dev/null 2>&1 || [ -x /usr/sbin/mariadbd ] || pkgs+=(mariadb-server)
if [ "${1:-}" = "--cluster" ] || [ "${PF_PROFILE:-}" = "cluster" ] || [ "${PF_PROFILE:-}" = "cluster-test" ]; then
  [ -f /usr/lib/galera/libgalera_smm.so ] || pkgs+=(galera-4)
  command -v rsync >/dev/null 2>&1 || pkgs+=(rsync)
fi
if [ "${1:-}" = "--test" ] || [ "${2:-}" = "--test" ]; then
  [ -x /usr/bin/chromium ] || pkgs+=(chromium)
  command -v pdftotext >/dev/null 2>&1 || pkgs+=(poppler-utils)
fi
if [ ${#pkgs[@]} -gt 0 ]; then
  if [ -n "${DATABASE_URL:-}" ] && [ "${pkgs[*]}" = "mariadb-server" ]; then :; else
    echo "setup: installing ${pkgs[*]} (Debian packages)"
    SUDO=""; [ "$(id -u)" = "0" ] || SUDO="sudo"
    $SUDO apt-get update -qq
    DEBIAN_FRONTEND=noninteractive $SUDO apt-get install -y -qq "${pkgs[@]}" >/dev/null
  fi
fi
export PATH="/usr/sbin:$PATH"
if [ ! -d node_modules ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  echo "setup: npm ci"
  npm ci --no-audit --no-fund --loglevel=error
fi
