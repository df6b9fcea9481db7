#!/usr/bin/env bash
# npm test: the same set-up as npm start on a separate test profile (own
# ports, own database), then typecheck, lint, unit, integration and e2e.
# Exits non-zero on the first failure; always stops what it started.
set -euo pipefail
export PROFILE=test
source "$(dirname "$0")/env.sh"
cd "$ROOT"

trap 'bash scripts/services.sh down >/dev/null 2>&1 || true' EXIT

step() { log "── $* ──"; }
bash scripts/prepare.sh
step "typecheck";   npx tsc --noEmit
step "lint";        npx eslint . --max-warnings=0
step "unit";        npx vitest run --project unit
step "integration"; npx vitest run --project integration
step "seed";        node --import tsx scripts/seed-demo.ts
step "build";       npx next build >"$LOG_DIR/build.log" 2>&1 || { tail -60 "$LOG_DIR/build.log"; die "build failed"; }
step "serve";       NODE_ENV=production BELLOWS_DETACH=1 bash scripts/serve.sh
step "e2e";         npx playwright test
log "all checks passed"
