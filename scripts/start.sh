#!/usr/bin/env bash
# `npm start`: set everything up on this machine and serve the app on http://127.0.0.1:3000.
# Safe to run again; Ctrl-C stops what it started.
source "$(dirname "$0")/services.sh"
export PG_PORT="${PG_PORT:-54329}" PG_DB="${PG_DB:-caryatid}"
export MAIL_SMTP_PORT="${MAIL_SMTP_PORT:-2525}" MAIL_HTTP_PORT="${MAIL_HTTP_PORT:-2580}"
export APP_PORT="${APP_PORT:-3000}"
export NEXTAUTH_URL="${NEXTAUTH_URL:-http://127.0.0.1:$APP_PORT}"
export NEXTAUTH_SECRET="${NEXTAUTH_SECRET:-caryatid-local-development-secret-change-me}"
export NEXT_TELEMETRY_DISABLED=1

cleanup() { trap - EXIT INT TERM; log "stopping"; stop_background; stop_postgres; }
trap cleanup EXIT
trap 'exit 130' INT TERM

cd "$ROOT"
ensure_node_modules
start_postgres
migrate_database
seed_database
start_mail_catcher
node scripts/build-workers.mjs
start_background worker npx tsx scripts/worker.ts
log "search worker started (more: \`npm run worker\` here or on any machine with the same DATABASE_URL)"
log "building the app"
npm run --silent build
log "serving on http://127.0.0.1:$APP_PORT"
npx tsx scripts/print-demo-sign-in.ts || true
start_background app npx next start -H 127.0.0.1 -p "$APP_PORT"
wait_for_port "$APP_PORT" 60 && log "ready: http://127.0.0.1:$APP_PORT (logs in .data/logs/)"
wait "${STARTED_PIDS[@]}"
