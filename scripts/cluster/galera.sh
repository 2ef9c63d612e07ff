#!/usr/bin/env bash
# Three MariaDB Galera nodes on loopback, each with a private data directory inside the project
# (git-ignored) and ports of its own. Galera itself (galera-4, Debian) does the replication.
# Usage: scripts/cluster/galera.sh start|stop|status|kill <n>|start-node <n>|sql <n> [args]|wait-synced [n…]
# Env: PF_CLUSTER_DIR (default .cluster), PF_CLUSTER_PORT (SQL port of node 1; nodes n use +n−1),
#      PF_CLUSTER_GCOMM_PORT (group port of node 1), DB_NAME, DB_USER, DB_PASSWORD.
# Ports of node n: SQL $PF_CLUSTER_PORT+n−1; group communication $PF_CLUSTER_GCOMM_PORT+n−1; IST +10; SST (rsync) +20.
# Started as root, the servers drop to the `mysql` OS user (rsync state transfers refuse to run as root).
set -euo pipefail
cd "$(dirname "$0")/../.."
CD="${PF_CLUSTER_DIR:-.cluster}"; [[ "$CD" = /* ]] || CD="$(pwd)/$CD"
SQL0="${PF_CLUSTER_PORT:-33411}"
GC0="${PF_CLUSTER_GCOMM_PORT:-34561}"
DB_NAME="${DB_NAME:-phosforge_cluster}"
DB_USER="${DB_USER:-phosforge}"
DB_PASSWORD="${DB_PASSWORD:-phosforge-local}"
PROVIDER="${PF_GALERA_PROVIDER:-/usr/lib/galera/libgalera_smm.so}"
NODES=(1 2 3)
if [ "$(id -u)" = "0" ]; then RUN_AS=mysql; else RUN_AS="$(id -un)"; fi
ME="$(id -un)"

dir() { echo "$CD/node$1"; }
sock() { echo "$(dir "$1")/mysqld.sock"; }
sql_port() { echo $((SQL0 + $1 - 1)); }
gc_port() { echo $((GC0 + $1 - 1)); }
ist_port() { echo $((GC0 + $1 + 9)); }
peers() { local out="" n; for n in "${NODES[@]}"; do out+="${out:+,}127.0.0.1:$(gc_port "$n")"; done; echo "$out"; }
ping_node() { mariadb-admin --no-defaults --socket="$(sock "$1")" -uroot ping >/dev/null 2>&1; }
sql() { local n="$1"; shift; mariadb --no-defaults --socket="$(sock "$n")" -uroot "$@"; }
status_of() { sql "$1" -N -e "SELECT variable_value FROM information_schema.global_status WHERE variable_name='$2'" 2>/dev/null || true; }

init_node() {
  local d; d="$(dir "$1")"
  [ -d "$d/data/mysql" ] && return 0
  mkdir -p "$d"
  mariadb-install-db --no-defaults --datadir="$d/data" --user="$RUN_AS" \
    --auth-root-authentication-method=socket --auth-root-socket-user="$ME" --skip-test-db >"$d/install.log" 2>&1 \
    || { cat "$d/install.log" >&2; exit 1; }
}

start_node() {
  local n="$1"; shift
  local d; d="$(dir "$n")"
  init_node "$n"
  [ "$RUN_AS" = "$ME" ] || chown -R "$RUN_AS" "$d"
  chmod 755 "$CD" "$d"
  if ping_node "$n"; then return 0; fi
  nohup mariadbd --no-defaults --datadir="$d/data" --socket="$(sock "$n")" --pid-file="$d/mysqld.pid" \
    --port="$(sql_port "$n")" --bind-address=127.0.0.1 --skip-name-resolve --user="$RUN_AS" --log-error="$d/error.log" \
    --character-set-server=utf8mb4 --collation-server=utf8mb4_unicode_ci --innodb-buffer-pool-size=96M --max-connections=300 \
    --max-allowed-packet=64M \
    --binlog-format=ROW --default-storage-engine=InnoDB --innodb-autoinc-lock-mode=2 --log-bin-trust-function-creators=1 \
    --wsrep-on=ON --wsrep-provider="$PROVIDER" --wsrep-cluster-name=phosforge \
    --wsrep-cluster-address="gcomm://$(peers)" --wsrep-node-name="node$n" --wsrep-node-address="127.0.0.1:$(gc_port "$n")" \
    --wsrep-provider-options="gmcast.listen_addr=tcp://127.0.0.1:$(gc_port "$n");ist.recv_addr=127.0.0.1:$(ist_port "$n");gcache.size=96M" \
    --wsrep-sst-receive-address="127.0.0.1:$(($(gc_port "$n") + 20))" --wsrep-sst-method=rsync "$@" >/dev/null 2>&1 &
  for _ in $(seq 1 900); do ping_node "$n" && return 0; kill -0 $! 2>/dev/null || break; sleep 0.2; done
  echo "galera: node $n did not start; see $d/error.log" >&2; tail -20 "$d/error.log" >&2; return 1
}

synced() { [ "$(status_of "$1" wsrep_local_state_comment)" = "Synced" ] && [ "$(status_of "$1" wsrep_cluster_size)" = "${2:-3}" ]; }

wait_synced() {
  local nodes=("$@") n ok
  [ ${#nodes[@]} -gt 0 ] || nodes=("${NODES[@]}")
  for _ in $(seq 1 600); do
    ok=1; for n in "${nodes[@]}"; do synced "$n" "${#nodes[@]}" || ok=0; done
    [ $ok = 1 ] && return 0; sleep 0.2
  done
  echo "galera: nodes ${nodes[*]} did not reach Synced with cluster size ${#nodes[@]}" >&2; return 1
}

# The node to bootstrap from: a fresh cluster starts on node 1; a stopped one on the node Galera marked
# safe_to_bootstrap (the last to leave), else the one with the highest committed seqno.
bootstrap_node() {
  local n best=1 seq top=-2
  for n in "${NODES[@]}"; do
    local g; g="$(dir "$n")/data/grastate.dat"
    [ -f "$g" ] || continue
    grep -q '^safe_to_bootstrap: 1' "$g" && { echo "$n"; return; }
    seq="$(sed -n 's/^seqno: *//p' "$g")"
    [ "${seq:--1}" -gt "$top" ] && { top="$seq"; best="$n"; }
  done
  echo "$best"
}

case "${1:-}" in
  start)
    if ping_node 1 || ping_node 2 || ping_node 3; then
      for n in "${NODES[@]}"; do start_node "$n"; done
    else
      b="$(bootstrap_node)"
      g="$(dir "$b")/data/grastate.dat"; [ -f "$g" ] && sed -i 's/^safe_to_bootstrap: 0/safe_to_bootstrap: 1/' "$g"
      start_node "$b" --wsrep-new-cluster
      for n in "${NODES[@]}"; do [ "$n" = "$b" ] || start_node "$n"; done
    fi
    wait_synced
    sql 1 -e "
      CREATE DATABASE IF NOT EXISTS \`$DB_NAME\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
      CREATE USER IF NOT EXISTS '$DB_USER'@'127.0.0.1' IDENTIFIED BY '$DB_PASSWORD';
      ALTER USER '$DB_USER'@'127.0.0.1' IDENTIFIED BY '$DB_PASSWORD';
      GRANT ALL PRIVILEGES ON \`$DB_NAME\`.* TO '$DB_USER'@'127.0.0.1';
      GRANT ALL PRIVILEGES ON \`${DB_NAME}\\_%\`.* TO '$DB_USER'@'127.0.0.1';"
    echo "galera: 3 nodes Synced — SQL ports $(sql_port 1), $(sql_port 2), $(sql_port 3) (data in $CD)"
    ;;
  stop)
    # Last node down is marked safe to bootstrap, so the next start begins with node 1.
    for n in 3 2 1; do ping_node "$n" && mariadb-admin --no-defaults --socket="$(sock "$n")" -uroot shutdown || true; done
    echo "galera: stopped"
    ;;
  start-node) start_node "${2:?node}"; ;;
  kill) n="${2:?node}"; p="$(dir "$n")/mysqld.pid"; [ -f "$p" ] && kill -KILL "$(cat "$p")" 2>/dev/null || true ;;
  status)
    for n in "${NODES[@]}"; do
      echo "node $n: $(status_of "$n" wsrep_local_state_comment) size $(status_of "$n" wsrep_cluster_size)"
    done ;;
  sql) n="${2:?node}"; shift 2; sql "$n" "$@" ;;
  wait-synced) shift; wait_synced "$@" ;;
  *) echo "usage: $0 start|stop|status|kill <n>|start-node <n>|sql <n> …|wait-synced [n…]" >&2; exit 2 ;;
esac
