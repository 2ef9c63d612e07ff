#!/usr/bin/env bash
# Developer sandbox: a database of its own (phosforge_<name>) on the private development server,
# the development fakes, and free ports for the app, then runs a command in that environment.
# Lets several people (or worktrees) run migrations, Vitest and Playwright side by side.
# Usage: bash scripts/sandbox.sh <name> [--fresh] <command...>
#   e.g. bash scripts/sandbox.sh materials --fresh npx vitest run tests/materials
#        bash scripts/sandbox.sh materials bash -c 'npm run build && npx playwright test tests/e2e/x.e2e.ts'
# Refuses a database named from outside (DATABASE_URL) unless PF_TEST_DATABASE_URL repeats it.
set -euo pipefail
cd "$(dirname "$0")/.."
node scripts/guard-test-database.mjs sandbox || exit 2
name="${1:?usage: sandbox.sh <name> [--fresh] <command...>}"; shift
fresh=0; if [ "${1:-}" = "--fresh" ]; then fresh=1; shift; fi
[[ "$name" =~ ^[a-z0-9]+$ ]] || { echo "sandbox: name must be lowercase letters/digits" >&2; exit 2; }
PF_PROFILE=dev . scripts/profile.sh
. scripts/processes.sh
export DB_NAME="phosforge_$name"
# Ports derived from the name so two sandboxes do not collide (app 5200–5999).
h=$(printf '%s' "$name" | cksum | cut -d' ' -f1)
export PORT=$((5200 + h % 800)) PF_PROFILE=sandbox
export ORIGIN="http://127.0.0.1:$PORT"
export AUTH_SECRET="sandbox-secret-phosforge-at-least-32-characters"
mkdir -p .runtime
if [ -z "${PF_EXTERNAL_DB:-}" ]; then
  PF_DB_DIR="${PF_DB_DIR:-.mariadb}" DB_NAME=phosforge bash scripts/db.sh start >/dev/null
  # Root through the unix socket of the shared server (the main checkout's data directory if this is a worktree).
  [ $fresh = 1 ] && bash scripts/db.sh sql -e "DROP DATABASE IF EXISTS \`$DB_NAME\`;"
  bash scripts/db.sh sql -e "CREATE DATABASE IF NOT EXISTS \`$DB_NAME\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;"
fi
# Fakes on the development ports, shared by every sandbox (started once, left running).
if ! fakes_up; then
  nohup "${FAKES[@]}" >.runtime/fakes-sandbox.log 2>&1 &
  wait_for_fakes
fi
npm run --silent db:migrate >/dev/null
npm run --silent db:seed
echo "sandbox $name: db $DB_NAME on $DB_HOST:$DB_PORT, app port $PORT"
exec "$@"
