#!/usr/bin/env bash
# `npm run bench`: speed figures of the computation (pure TypeScript, no database needed).
# Each bench prints a table of medians and a final JSON line; the README quotes them.
set -euo pipefail
cd "$(dirname "$0")/.."
[ -d node_modules ] || npm ci
echo "Phosforge bench — $(node -v), $(nproc) cores, $(date -u +%Y-%m-%dT%H:%MZ)"
for b in scripts/bench/*.bench.ts; do
  echo; echo "=== $(basename "$b" .bench.ts) ==="
  npx tsx "$b"
done
