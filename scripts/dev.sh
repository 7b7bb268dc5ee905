#!/usr/bin/env bash
# npm run dev: the same servers as npm start, the API rebuilt and restarted on change, and the Vite
# dev server (proxying /api) on http://127.0.0.1:5173.
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/services.sh"
cd "$ROOT"

ensure_npm_deps
ensure_debian_servers
trap 'stop_all' EXIT
trap 'exit 130' INT TERM
start_postgres
start_redis
jwt_secret
export NODE_ENV=development

TURBO_TELEMETRY_DISABLED=1 npx turbo run build --filter=@potlife/api... --output-logs=errors-only
node apps/api/dist/database/migrate.js
node apps/api/dist/database/seed.js
spawn "SMTP fake" node apps/api/dist/mail/smtp-fake.js
# Binaries are started directly (not through npx or npm) so that the PID we keep is the process
# itself and Ctrl-C stops it.
BIN="$ROOT/node_modules/.bin"
spawn "domain (watch)" "$BIN/tsc" -p packages/domain/tsconfig.build.json --watch --preserveWatchOutput
spawn "API build (watch)" "$BIN/tsc" -p apps/api/tsconfig.build.json --watch --preserveWatchOutput
spawn "API" node --watch-path=apps/api/dist --watch-path=packages/domain/dist apps/api/dist/main.js
API_PORT=$PORT spawn "web (vite)" bash -c "cd apps/web && exec '$BIN/vite' --host 127.0.0.1 --port 5173"
log "web: http://127.0.0.1:5173  (API on $PORT)"
wait -n "${STARTED_PIDS[@]}" || true
