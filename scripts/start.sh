#!/usr/bin/env bash
# npm start: install, start PostgreSQL + Redis + the SMTP fake, migrate, seed the demo, build and
# serve the app on http://127.0.0.1:$PORT. Ctrl-C stops everything this script started.
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/services.sh"
cd "$ROOT"

ensure_npm_deps
ensure_debian_servers
trap 'log "stopping…"; stop_all' EXIT
trap 'exit 130' INT TERM

start_postgres
start_redis
jwt_secret
export NODE_ENV=production

log "building (turbo)…"
TURBO_TELEMETRY_DISABLED=1 npx turbo run build --output-logs=errors-only
node apps/api/dist/database/migrate.js
node apps/api/dist/database/seed.js

spawn "SMTP fake" node apps/api/dist/mail/smtp-fake.js
wait_for_port "$SMTP_PORT" "SMTP fake"
spawn "API" node apps/api/dist/main.js
wait_for_port "$PORT" "API"

cat <<MSG

  Potlife is running:  http://127.0.0.1:$PORT
  API docs:            http://127.0.0.1:$PORT/api/docs

  Demo sign-ins (password: potlife-demo)
    owner@demo.test       owner: users, rates, approvals, mail outbox
    estimator@demo.test   estimator: roofs, estimates, reservations, orders
    storeman@demo.test    storeman: deliveries, stock, counts, temperatures

  Data lives in $POTLIFE_DATA_DIR (kept between runs). Press Ctrl-C to stop.

MSG
wait -n "${STARTED_PIDS[@]}" || true
log "a server stopped; shutting down the rest"
