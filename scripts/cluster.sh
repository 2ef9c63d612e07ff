#!/usr/bin/env bash
# `npm run cluster`: three MariaDB Galera nodes on loopback (scripts/cluster/galera.sh), migrated and
# seeded once, two app instances — A on node 1, B on node 2 — and a proxy in front of them
# (scripts/cluster/proxy.ts). Ctrl-C stops the apps, the proxy, the fakes and the nodes; data is kept
# in .cluster/ for the next run. Ports: see the README ("Beyond one machine").
set -euo pipefail
cd "$(dirname "$0")/.."
bash scripts/ensure-tools.sh --cluster
export PF_PROFILE="${PF_PROFILE:-cluster}"
. scripts/profile.sh
. scripts/processes.sh
G=scripts/cluster/galera.sh
stop_cluster() {
  trap - INT TERM EXIT
  PF_EXTERNAL_DB=1 stop_started
  bash "$G" stop >/dev/null || true
}
trap 'echo; echo "stopping…"; stop_cluster' INT TERM EXIT

bash "$G" start
"${FAKES[@]}" >.runtime/fakes-cluster.log 2>&1 & pids+=($!)
wait_for_fakes
npm run --silent db:migrate
npm run --silent db:seed
if build_is_stale; then
  echo "build: vite build"
  npm run --silent build >.runtime/build.log 2>&1 || { tail -40 .runtime/build.log; exit 1; }
fi
node_port() { echo $((PF_CLUSTER_PORT + $1 - 1)); }
PORT="$PF_APP_A_PORT" DB_PORT="$(node_port 1)" DB_CAUSAL_READS=1 ORIGIN="$ORIGIN" node build >.runtime/app-a.log 2>&1 & pids+=($!)
PORT="$PF_APP_B_PORT" DB_PORT="$(node_port 2)" DB_CAUSAL_READS=1 ORIGIN="$ORIGIN" node build >.runtime/app-b.log 2>&1 & pids+=($!)
for p in "$PF_APP_A_PORT" "$PF_APP_B_PORT"; do
  wait_until "the app on port $p" 60 curl -fs "http://127.0.0.1:$p/api/health" -o /dev/null
done
node --import tsx scripts/cluster/proxy.ts "$PORT" "http://127.0.0.1:$PF_APP_A_PORT" "http://127.0.0.1:$PF_APP_B_PORT" & pids+=($!)
wait_for_app
cat <<TXT

  Phosforge on a three-node Galera cluster:  $ORIGIN  (proxy)
    app A  http://127.0.0.1:$PF_APP_A_PORT  → node 1 (127.0.0.1:$(node_port 1))
    app B  http://127.0.0.1:$PF_APP_B_PORT  → node 2 (127.0.0.1:$(node_port 2))
    node 3 (127.0.0.1:$(node_port 3)) holds a full copy and takes over as a donor or a writer
  Cluster state:  bash scripts/cluster/galera.sh status   (PF_CLUSTER_DIR=$PF_CLUSTER_DIR)
  Demo sign-ins as for npm start (password phosforge-demo). Ctrl-C stops everything.
TXT
wait "${pids[@]}"
