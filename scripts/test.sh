#!/usr/bin/env bash
# `npm test`: the same set-up as `npm start`, against a separate test database and its own
# ports (so it can run while `npm start` is up), then svelte-check, Vitest (unit + integration
# against the real MariaDB) and Playwright end-to-end tests in Debian's Chromium.
# Stops everything it started, prints a summary, exits non-zero on any failure.
# Refuses a database named from outside (DATABASE_URL) unless PF_TEST_DATABASE_URL repeats it.
set -uo pipefail
cd "$(dirname "$0")/.."
node scripts/guard-test-database.mjs "npm test" || exit 2
bash scripts/ensure-tools.sh --test || exit 1
PF_PROFILE=test . scripts/profile.sh
rm -rf "$PF_S3_DIR"

. scripts/processes.sh
declare -a summary=()
failed=0
trap stop_started INT TERM EXIT

step() { # step <name> <command...>
  local name="$1"; shift
  local t0=$SECONDS
  echo; echo "=== $name ==="
  if "$@"; then summary+=("PASS  $name  ($((SECONDS - t0)) s)"); else summary+=("FAIL  $name  ($((SECONDS - t0)) s)"); failed=1; fi
}

# A fresh test database for every run.
fresh_database || exit 1
"${FAKES[@]}" & pids+=($!)
wait_for_fakes || exit 1
step "migrate + seed" bash -c "npm run --silent db:migrate && npm run --silent db:seed"
step "svelte-check" npm run --silent check
step "lint (ESLint, Prettier, line length)" npm run --silent lint
step "vitest (unit + integration)" npx vitest run
step "build" bash -c "npm run --silent build > .runtime/build-test.log 2>&1 || { tail -40 .runtime/build-test.log; exit 1; }"
step "playwright (e2e, Chromium)" npx playwright test

echo; echo "=== summary ==="
printf '%s\n' "${summary[@]}"
if [ $failed -ne 0 ]; then echo "npm test: FAILED"; exit 1; fi
echo "npm test: all green"
