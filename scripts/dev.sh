#!/usr/bin/env bash
# npm run dev: hot-reloading web app and the worker in watch mode.
set -euo pipefail
export PROFILE=dev
source "$(dirname "$0")/env.sh"
cd "$ROOT"
bash scripts/prepare.sh
node --import tsx scripts/seed-demo.ts
npx tsx watch workers/index.ts &
WPID=$!
trap 'kill $WPID 2>/dev/null; bash scripts/services.sh down' INT TERM EXIT
npx next dev -H 127.0.0.1 -p "$WEB_PORT"
