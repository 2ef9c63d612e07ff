#!/usr/bin/env bash
# `npm start`: install what is missing, start the private MariaDB and the local service fakes,
# migrate, seed demo data into an empty database, build, and serve on 127.0.0.1.
# Ctrl-C stops the app, the fakes and the database cleanly. Data is kept for the next start.
set -euo pipefail
cd "$(dirname "$0")/.."
bash scripts/ensure-tools.sh
PF_PROFILE=dev . scripts/profile.sh
. scripts/processes.sh
trap 'echo; echo "stopping…"; stop_started' INT TERM EXIT

[ -n "${PF_EXTERNAL_DB:-}" ] || bash scripts/db.sh start
"${FAKES[@]}" & pids+=($!)
wait_for_fakes
npm run --silent db:migrate
npm run --silent db:seed
if build_is_stale; then
  echo "build: vite build"
  npm run --silent build >.runtime/build.log 2>&1 || { tail -40 .runtime/build.log; exit 1; }
fi
node build & pids+=($!)
wait_for_app
cat <<TXT

  Phosforge is running at  $ORIGIN
  Caught e-mail (SMTP catcher inbox):  $MAIL_INBOX_URL

  Demo sign-ins (password for all: phosforge-demo)
    formulator  rhea.okafor@kestrelhollow.example
    technician  tomas.brand@kestrelhollow.example
    quality     ines.halloran@kestrelhollow.example
    admin       admin@kestrelhollow.example

  Ctrl-C stops the app and the database.
TXT
wait "${pids[@]}"
