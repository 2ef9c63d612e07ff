#!/usr/bin/env bash
# `npm run test:cluster`: a fresh three-node Galera cluster (profile cluster-test, data in
# .cluster-test/), migrated and seeded once; then
#   1. the two-instance concurrency suite (tests/e2e/two-instances.e2e.ts) with instance A on node 1
#      and instance B on node 2 — approvals, stale edits, batch numbering across nodes;
#   2. the fault suites (tests/cluster/, vitest.cluster.config.ts): a node killed under traffic,
#      a split (two nodes killed), a backup from one node while another takes writes.
# Everything it started is stopped at the end. Kept out of `npm test`; .ci/run calls it when
# PF_CI_CLUSTER=1 (README, "Beyond one machine").
set -uo pipefail
cd "$(dirname "$0")/.."
bash scripts/ensure-tools.sh --cluster --test || exit 1
export PF_PROFILE=cluster-test
. scripts/profile.sh
. scripts/processes.sh
G=scripts/cluster/galera.sh
finish() {
  trap - INT TERM EXIT
  PF_EXTERNAL_DB=1 stop_started
  bash "$G" stop >/dev/null 2>&1 || true
}
trap finish INT TERM EXIT

bash "$G" stop >/dev/null 2>&1 || true
rm -rf "$PF_CLUSTER_DIR" ".runtime/s3-$PF_PROFILE"
bash "$G" start || exit 1
"${FAKES[@]}" >.runtime/fakes-cluster-test.log 2>&1 & pids+=($!)
wait_for_fakes || exit 1
npm run --silent db:migrate >/dev/null || exit 1
npm run --silent db:seed >/dev/null || exit 1
if build_is_stale; then npm run --silent build >.runtime/build.log 2>&1 || { tail -40 .runtime/build.log; exit 1; }; fi
export PORT="$PF_APP_A_PORT" ORIGIN="http://127.0.0.1:$PF_APP_A_PORT" PF_SECOND_PORT="$PF_APP_B_PORT"
export PF_SECOND_DB_PORT=$((PF_CLUSTER_PORT + 1)) DB_CAUSAL_READS=1
status=0
npx playwright test -c playwright.cluster.config.ts || status=1
npx vitest run -c vitest.cluster.config.ts || status=1
exit $status
