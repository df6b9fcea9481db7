#!/usr/bin/env bash
# Everything before serving: packages, services, schema, demo data.
set -euo pipefail
source "$(dirname "$0")/env.sh"
cd "$ROOT"
if [ ! -d node_modules ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  log "installing packages (npm ci)"
  npm ci --no-audit --no-fund --loglevel=error
fi
bash scripts/services.sh up
log "migrating $DB_NAME"
npx sequelize-cli db:migrate >"$LOG_DIR/migrate.log" 2>&1 || { cat "$LOG_DIR/migrate.log" >&2; die "migration failed"; }
