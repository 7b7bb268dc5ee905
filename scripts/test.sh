#!/usr/bin/env bash
# npm test: everything, from a fresh clone. Starts PostgreSQL and Redis in a throwaway data folder
# (never the demo data), then typecheck, lint, domain + web (vitest), API unit + e2e (jest +
# supertest, real PostgreSQL and Redis), and the browser journeys (playwright-core + Debian's
# Chromium). Runs every step, prints each runner's summary, exits non-zero if any failed.
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/services.sh"
cd "$ROOT"

# Test ports differ from npm start's, so the suite can run beside a running demo.
export POTLIFE_DATA_DIR="$(mktemp -d /tmp/potlife-test.XXXXXX)"
chmod 755 "$POTLIFE_DATA_DIR"
PG_DATA="$POTLIFE_DATA_DIR/postgres"; RUN_DIR="$POTLIFE_DATA_DIR/run"; REDIS_DIR="$POTLIFE_DATA_DIR/redis"
export PGPORT="${TEST_PGPORT:-54339}" REDIS_PORT="${TEST_REDIS_PORT:-6391}" SMTP_PORT="${TEST_SMTP_PORT:-2526}" PORT="${TEST_PORT:-3101}"
export DATABASE_URL="postgres://potlife@127.0.0.1:$PGPORT/potlife"
export REDIS_URL="redis://127.0.0.1:$REDIS_PORT"
export SMTP_URL="smtp://127.0.0.1:$SMTP_PORT"
export JWT_SECRET="test-secret-$(head -c 24 /dev/urandom | base64 | tr -d '\n=/+')"
export TURBO_TELEMETRY_DISABLED=1 CI="${CI:-true}"
export POTLIFE_TEST_OUTPUT="${POTLIFE_TEST_OUTPUT:-$ROOT/test-results}"
mkdir -p "$POTLIFE_TEST_OUTPUT"

cleanup() { stop_all; rm -rf "$POTLIFE_DATA_DIR"; }
trap cleanup EXIT
trap 'exit 130' INT TERM

ensure_npm_deps
ensure_debian_servers
ensure_chromium
start_postgres
start_redis

RESULTS=()
FAILED=0
step() {
  local name=$1; shift
  local t0=$SECONDS
  printf '\n\033[1;36m━━ %s ━━\033[0m\n' "$name"
  if "$@"; then
    RESULTS+=("ok    $(printf '%4ss' $((SECONDS - t0)))  $name")
  else
    RESULTS+=("FAIL  $(printf '%4ss' $((SECONDS - t0)))  $name")
    FAILED=$((FAILED + 1))
  fi
}

browser_journeys() {
  NODE_ENV=production node apps/api/dist/database/migrate.js >/dev/null
  NODE_ENV=production node apps/api/dist/database/seed.js
  spawn "SMTP fake" node apps/api/dist/mail/smtp-fake.js
  NODE_ENV=production MAIL_RETRY_BASE_MS=200 spawn "API" node apps/api/dist/main.js
  wait_for_port "$SMTP_PORT" "SMTP fake"
  wait_for_port "$PORT" "API"
  BASE_URL="http://127.0.0.1:$PORT" node apps/web/e2e/run.mjs
}

step "build" npx turbo run build --output-logs=errors-only
step "typecheck" npx turbo run typecheck --output-logs=errors-only
step "lint" npx turbo run lint --output-logs=errors-only
step "domain (vitest)" npm run test -w @potlife/domain
step "web (vitest)" npm run test -w @potlife/web
step "api unit + e2e (jest)" env NODE_ENV=test npm run test -w @potlife/api -- --maxWorkers=2 --forceExit
step "browser journeys (playwright-core + chromium)" browser_journeys

printf '\n\033[1m━━ summary ━━\033[0m\n'
printf '  %s\n' "${RESULTS[@]}"
TOTAL=${#RESULTS[@]}
echo "steps: $((TOTAL - FAILED)) passed, $FAILED failed"
exit $((FAILED > 0 ? 1 : 0))
