#!/usr/bin/env bash
# Private MariaDB server for this checkout: init / start / stop / status.
# Usage: scripts/db.sh start|stop|status   (env: PF_DB_DIR, PF_DB_PORT, DB_NAME, DB_USER, DB_PASSWORD)
# The data directory lives inside the project (git-ignored); root is reachable only through
# the unix socket by the OS user who owns it; the app connects over TCP as a non-root user.
set -euo pipefail
cd "$(dirname "$0")/.."
D="${PF_DB_DIR:-.mariadb}"; [[ "$D" = /* ]] || D="$(pwd)/$D"
SOCK="$D/mysqld.sock"
PORT="${PF_DB_PORT:-33306}"
DB_NAME="${DB_NAME:-phosforge}"
DB_USER="${DB_USER:-phosforge}"
DB_PASSWORD="${DB_PASSWORD:-phosforge-local}"
ME="$(id -un)"
# Throwaway servers (tests, load runs) trade crash durability for speed; development data keeps full durability.
FAST_OPTS=""
[ "${PF_DB_FAST:-0}" = "1" ] && FAST_OPTS="--innodb-flush-log-at-trx-commit=0 --innodb-doublewrite=0 --sync-binlog=0"

ping_db() { mariadb-admin --no-defaults --socket="$SOCK" -uroot ping >/dev/null 2>&1; }

case "${1:-}" in
  start)
    if [ "$PORT" = "3306" ]; then echo "db.sh: refusing port 3306 (kept free for a system server)" >&2; exit 2; fi
    mkdir -p "$D" && chmod 700 "$D"
    if [ ! -d "$D/data/mysql" ]; then
      echo "db: initialising private data directory $D/data"
      mariadb-install-db --no-defaults --datadir="$D/data" --user="$ME" \
        --auth-root-authentication-method=socket --auth-root-socket-user="$ME" --skip-test-db >"$D/install.log" 2>&1 \
        || { cat "$D/install.log" >&2; exit 1; }
    fi
    if ping_db; then echo "db: already running on 127.0.0.1:$PORT"; else
      nohup mariadbd --no-defaults --datadir="$D/data" --socket="$SOCK" --pid-file="$D/mysqld.pid" \
        --port="$PORT" --bind-address=127.0.0.1 --skip-name-resolve --user="$ME" \
        --log-error="$D/error.log" --character-set-server=utf8mb4 --collation-server=utf8mb4_unicode_ci \
        --innodb-buffer-pool-size=128M --max-connections=300 --max-allowed-packet=64M $FAST_OPTS >/dev/null 2>&1 &
      for _ in $(seq 1 600); do ping_db && break; sleep 0.1; done
      ping_db || { echo "db: server did not answer; see $D/error.log" >&2; tail -20 "$D/error.log" >&2; exit 1; }
      echo "db: MariaDB up on 127.0.0.1:$PORT (data in $D)"
    fi
    mariadb --no-defaults --socket="$SOCK" -uroot -e "
      CREATE DATABASE IF NOT EXISTS \`$DB_NAME\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
      CREATE USER IF NOT EXISTS '$DB_USER'@'127.0.0.1' IDENTIFIED BY '$DB_PASSWORD';
      ALTER USER '$DB_USER'@'127.0.0.1' IDENTIFIED BY '$DB_PASSWORD';
      GRANT ALL PRIVILEGES ON \`$DB_NAME\`.* TO '$DB_USER'@'127.0.0.1';
      GRANT ALL PRIVILEGES ON \`${DB_NAME}\\_%\`.* TO '$DB_USER'@'127.0.0.1';
      FLUSH PRIVILEGES;"
    ;;
  stop)
    if ping_db; then mariadb-admin --no-defaults --socket="$SOCK" -uroot shutdown && echo "db: stopped"; else echo "db: not running"; fi
    ;;
  status)
    if ping_db; then echo "running on 127.0.0.1:$PORT"; else echo "stopped"; exit 1; fi
    ;;
  sql)
    shift; mariadb --no-defaults --socket="$SOCK" -uroot "$@"
    ;;
  *) echo "usage: $0 start|stop|status|sql" >&2; exit 2 ;;
esac
