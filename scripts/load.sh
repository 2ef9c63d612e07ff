#!/usr/bin/env bash
# `npm run load`: a private database and app of its own (profile "load": .mariadb-load, app on 4174),
# fresh demo data, a production build served by node, then scripts/load/run.ts drives the main API
# routes with autocannon for a bounded time and prints requests/s, p50/p95/p99 and errors.
# Env: LOAD_SECONDS (per route, default 10), LOAD_CONNECTIONS (default 50), LOAD_ONLY (names, comma-separated).
# Refuses a database named from outside (DATABASE_URL) unless PF_TEST_DATABASE_URL repeats it.
set -uo pipefail
cd "$(dirname "$0")/.."
node scripts/guard-test-database.mjs "npm run load" || exit 2
bash scripts/ensure-tools.sh || exit 1
PF_PROFILE=load . scripts/profile.sh
. scripts/processes.sh
trap stop_started INT TERM EXIT
fresh_database || exit 1
rm -rf "$PF_S3_DIR"
"${FAKES[@]}" >/dev/null & pids+=($!)
wait_for_fakes || exit 1
npm run --silent db:migrate >/dev/null && npm run --silent db:seed || exit 1
if build_is_stale; then
  npm run --silent build >.runtime/build-load.log 2>&1 || { tail -40 .runtime/build-load.log; exit 1; }
fi
NODE_ENV=production node build >.runtime/app-load.log 2>&1 & pids+=($!)
wait_for_app || { tail -20 .runtime/app-load.log >&2; exit 1; }
LOAD_URL="http://127.0.0.1:$PORT" node --import tsx scripts/load/run.ts
