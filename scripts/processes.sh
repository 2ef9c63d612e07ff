# Sourced by the run scripts (after scripts/profile.sh): starting the local fakes, a fresh database,
# and stopping on exit what the script started. Processes added to `pids` are stopped by stop_started.
pids=()

# The command of the local fakes (scripts/fakes.ts); s3rver needs OpenSSL's legacy provider for its
# listing tokens. An array, not a function: `"${FAKES[@]}" &` makes $! the node process itself.
FAKES=(node --openssl-legacy-provider --import tsx scripts/fakes.ts)

fakes_up() { (exec 3<>"/dev/tcp/127.0.0.1/$PF_S3_PORT") 2>/dev/null; }

# Waits up to 10 s for the fakes' S3 port.
wait_for_fakes() { for _ in $(seq 1 50); do fakes_up && return 0; sleep 0.2; done; return 1; }

# Starts the private server (unless PF_EXTERNAL_DB) and drops and re-creates $DB_NAME.
fresh_database() {
  [ -z "${PF_EXTERNAL_DB:-}" ] || return 0
  bash scripts/db.sh start >/dev/null || return 1
  bash scripts/db.sh sql -e "DROP DATABASE IF EXISTS \`$DB_NAME\`; CREATE DATABASE \`$DB_NAME\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;"
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
