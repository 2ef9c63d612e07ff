#!/usr/bin/env bash
# `npm run backup [-- <dir>]` / `npm run restore -- <dir> [--yes]`: consistent dump of the database
# plus the object-store files, and the way back. `npm run storage:sweep`: bucket vs stored_files.
# Uses the development profile unless PF_PROFILE or DATABASE_URL / S3_* say otherwise; starts the
# private server and the fakes when they are not up.
set -euo pipefail
umask 077 # backups hold password hashes: owner-only folders and files
cd "$(dirname "$0")/.."
what="${1:?usage: backup.sh backup|restore|sweep [args]}"; shift
PF_PROFILE="${PF_PROFILE:-dev}" . scripts/profile.sh
. scripts/processes.sh
[ -n "${PF_EXTERNAL_DB:-}" ] || bash scripts/db.sh start >/dev/null
fakes=""
if [ "${S3_ENDPOINT#http://127.0.0.1}" != "$S3_ENDPOINT" ] && ! fakes_up; then
  "${FAKES[@]}" >.runtime/fakes-backup.log 2>&1 & fakes=$!
  wait_for_fakes
fi
status=0
node --import tsx "scripts/backup/$what.ts" "$@" || status=$?
[ -z "$fakes" ] || { kill -TERM "$fakes"; wait "$fakes" 2>/dev/null || true; }
exit $status
