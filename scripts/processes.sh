# Sourced by the run scripts (after scripts/profile.sh): starting the local fakes, a fresh database,
# and stopping on exit what the script started. Processes added to `pids` are stopped by stop_started.
pids=()

# The command of the local fakes (scripts/fakes.ts); s3rver needs OpenSSL's legacy provider for its
# listing tokens. An array, not a function: `"${FAKES[@]}" &` makes $! the node process itself.
FAKES=(node --openssl-legacy-provider --import tsx scripts/fakes.ts)

port_open() { (exec 3<>"/dev/tcp/127.0.0.1/$1") 2>/dev/null; }
fakes_up() { port_open "$PF_S3_PORT" && port_open "$PF_SMTP_PORT"; }
app_up() { curl -fsS "http://127.0.0.1:$PORT/api/health" >/dev/null 2>&1; }

# wait_until <what> <seconds> <command...>: polls the command every 0.2 s; after the timeout it says
# what did not come up and returns non-zero (callers stop there).
wait_until() {
  local what="$1" seconds="$2" i; shift 2
  for ((i = 0; i < seconds * 5; i++)); do "$@" && return 0; sleep 0.2; done
  echo "$what did not come up within $seconds s" >&2
  return 1
}
wait_for_fakes() { wait_until "the fakes (S3 on 127.0.0.1:$PF_S3_PORT, SMTP on 127.0.0.1:$PF_SMTP_PORT)" 30 fakes_up; }
wait_for_app() { wait_until "the app (http://127.0.0.1:$PORT/api/health)" 60 app_up; }

# The build inputs: a build older than any of these is rebuilt (start.sh, load.sh; test.sh always builds).
BUILD_INPUTS=(src static package.json package-lock.json svelte.config.js vite.config.ts tailwind.config.ts postcss.config.js
  tsconfig.json scripts/build-solve-worker.mjs)
build_is_stale() {
  [ ! -f build/index.js ] || [ -n "$(find "${BUILD_INPUTS[@]}" -newer build/index.js -print -quit 2>/dev/null)" ]
}

# Starts the private server (unless PF_EXTERNAL_DB) and drops and re-creates $DB_NAME.
fresh_database() {
  [ -z "${PF_EXTERNAL_DB:-}" ] || return 0
  bash scripts/db.sh start >/dev/null || return 1
  local create="CREATE DATABASE \`$DB_NAME\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;"
  bash scripts/db.sh sql -e "DROP DATABASE IF EXISTS \`$DB_NAME\`; $create"
}

# TERM to every started process, 10 s to finish, then KILL; then the private database stops.
stop_started() {
  trap - INT TERM EXIT
  for p in "${pids[@]}"; do kill -TERM "$p" 2>/dev/null || true; done
  for _ in $(seq 1 50); do
    local alive=0 p
    for p in "${pids[@]}"; do kill -0 "$p" 2>/dev/null && alive=1; done
    [ $alive = 0 ] && break; sleep 0.2
  done
  for p in "${pids[@]}"; do kill -KILL "$p" 2>/dev/null || true; wait "$p" 2>/dev/null || true; done
  [ -n "${PF_EXTERNAL_DB:-}" ] || bash scripts/db.sh stop >/dev/null || true
}
