#!/usr/bin/env bash
# `npm run bench:db`: speed figures that need the database (a sandbox database of its own on the private
# server, migrated and seeded): a 100,000-part tester table from upload to summary; a 10,000-spectrum lot from
# upload to release.
set -euo pipefail
cd "$(dirname "$0")/.."
[ -d node_modules ] || npm ci
echo "Phosforge database bench — $(node -v), $(nproc) cores, $(date -u +%Y-%m-%dT%H:%MZ)"
# Files are read in the reader worker thread, as in the built app (the benches ask for it).
node scripts/build-solve-worker.mjs
bash scripts/sandbox.sh bench --fresh npx tsx scripts/bench/db/tester-upload.ts
bash scripts/sandbox.sh bench npx tsx scripts/bench/db/spectra-lot.ts
