#!/usr/bin/env bash
# `npm run load:cluster`: the same load run (scripts/load/run.ts) against a fresh three-node Galera
# cluster with two app instances behind the proxy, then against the single server (`npm run load`),
# one after the other on this machine. Env as for npm run load (LOAD_SECONDS, LOAD_CONNECTIONS,
# LOAD_ONLY; default here: evaluate, list formulations, create draft, create batch).
set -uo pipefail
cd "$(dirname "$0")/../.."
bash scripts/ensure-tools.sh --cluster || exit 1
export LOAD_ONLY="${LOAD_ONLY:-evaluate,list formulations,create draft,create batch}"
(
  export PF_PROFILE=cluster-test
  . scripts/profile.sh
  . scripts/processes.sh
  G=scripts/cluster/galera.sh
  finish() { trap - INT TERM EXIT; PF_EXTERNAL_DB=1 stop_started; bash "$G" stop >/dev/null 2>&1 || true; }
  trap finish INT TERM EXIT
  bash "$G" stop >/dev/null 2>&1 || true
  rm -rf "$PF_CLUSTER_DIR" ".runtime/s3-$PF_PROFILE"
  bash "$G" start >/dev/null || exit 1
  "${FAKES[@]}" >/dev/null 2>&1 & pids+=($!)
  wait_for_fakes || exit 1
  npm run --silent db:migrate >/dev/null && npm run --silent db:seed >/dev/null || exit 1
  if build_is_stale; then npm run --silent build >.runtime/build.log 2>&1 || exit 1; fi
  for n in 1 2; do
    p=$((PF_APP_A_PORT + n - 1))
    NODE_ENV=production PORT=$p DB_PORT=$((PF_CLUSTER_PORT + n - 1)) DB_CAUSAL_READS=1 \
      node build >".runtime/app-cluster-$n.log" 2>&1 & pids+=($!)
    wait_until "app on $p" 60 curl -fs "http://127.0.0.1:$p/api/health" -o /dev/null || exit 1
  done
  node --import tsx scripts/cluster/proxy.ts "$PORT" "http://127.0.0.1:$PF_APP_A_PORT" "http://127.0.0.1:$PF_APP_B_PORT" >/dev/null &
  pids+=($!)
  wait_for_app || exit 1
  echo "=== Galera cluster: 3 nodes, 2 app instances behind the proxy ==="
  LOAD_URL="http://127.0.0.1:$PORT" node --import tsx scripts/load/run.ts
)
echo
echo "=== single server: 1 node, 1 app instance ==="
bash scripts/load.sh
