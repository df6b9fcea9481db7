#!/usr/bin/env bash
# npm run dev: hot-reloading web app and the worker in watch mode. Ctrl-C stops
# both and the services, as npm start does.
set -euo pipefail
export PROFILE=dev
source "$(dirname "$0")/env.sh"
cd "$ROOT"
bash scripts/prepare.sh
node --import tsx scripts/seed-demo.ts

cleanup() {
  trap - INT TERM EXIT
  kill "${WPID:-}" "${NPID:-}" 2>/dev/null || true
  wait 2>/dev/null || true
  bash scripts/services.sh down
  exit 0
}
trap cleanup INT TERM EXIT

npx tsx watch workers/index.ts &
WPID=$!
npx next dev -H 127.0.0.1 -p "$WEB_PORT" &
NPID=$!
wait "$NPID"
