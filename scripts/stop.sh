#!/usr/bin/env bash
# npm run stop: stop a background run (web, worker, mailbox, Redis, PostgreSQL) by PID.
set -euo pipefail
for p in ${PROFILES:-dev test}; do PROFILE=$p bash "$(dirname "$0")/services.sh" down; done
