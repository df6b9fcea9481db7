#!/usr/bin/env bash
# npm start: set up everything on a fresh clone, then serve web + worker.
# Safe to run twice. Ctrl-C stops what it started; `npm run stop` stops a
# background run.
set -euo pipefail
export PROFILE=dev
source "$(dirname "$0")/env.sh"
cd "$ROOT"
bash scripts/prepare.sh
log "seeding the demo field (idempotent)"
node --import tsx scripts/seed-demo.ts
if [ ! -f .next/BUILD_ID ] || [ -n "$(find app components lib models next.config.mjs tailwind.config.ts -newer .next/BUILD_ID -type f 2>/dev/null | head -1)" ]; then
  log "building"
  npx next build >"$LOG_DIR/build.log" 2>&1 || { tail -40 "$LOG_DIR/build.log" >&2; die "build failed (log: $LOG_DIR/build.log)"; }
fi
export NODE_ENV=production
bash scripts/serve.sh
