#!/usr/bin/env bash
# `npm test`: bootstrap a separate test cluster and database, then typecheck, lint, Vitest (unit,
# reference, integration against the real PostgreSQL) and Playwright in Debian's Chromium against
# the built app. Ends with one line "N passed, N failed" and exits non-zero on any failure.
source "$(dirname "$0")/services.sh"
set +e
# Every port, the cluster and the build folder can be moved (TEST_*), so two developers' runs on one
# machine never share a database or a build; TEST_VITEST / TEST_E2E narrow the suites while working.
export CLUSTER_NAME="${TEST_CLUSTER:-pg-test}" PG_PORT="${TEST_PG_PORT:-54339}" PG_DB=caryatid_test PG_FSYNC=off
export NEXT_DIST_DIR="${TEST_NEXT_DIST_DIR:-.next}"
export MAIL_SMTP_PORT="${TEST_MAIL_SMTP_PORT:-2535}" MAIL_HTTP_PORT="${TEST_MAIL_HTTP_PORT:-2590}"
export APP_PORT="${TEST_APP_PORT:-3100}"
export NEXTAUTH_URL="http://127.0.0.1:$APP_PORT" NEXTAUTH_SECRET="caryatid-test-secret"
export NEXT_TELEMETRY_DISABLED=1 CARYATID_TEST=1 NODE_ENV_LABEL=test

PASSED=0
FAILED=0
REPORTS="$ROOT/.data/test-reports-${TEST_CLUSTER:-pg-test}"

cleanup() { trap - EXIT INT TERM; stop_background; stop_postgres; }
trap cleanup EXIT
trap 'exit 130' INT TERM

step() { # $1 label, rest = command; counts as one check
  local label="$1"; shift
  log "$label"
  if "$@"; then PASSED=$((PASSED + 1)); else FAILED=$((FAILED + 1)); log "FAILED: $label"; fi
}

count_json() { # $1 file, $2 kind (vitest|playwright) -> adds to totals
  local counts
  counts="$(node -e '
    const fs = require("fs");
    const [file, kind] = process.argv.slice(1);
    let p = 0, f = 1;
    try {
      const r = JSON.parse(fs.readFileSync(file, "utf8"));
      if (kind === "vitest") { p = r.numPassedTests; f = r.numFailedTests + (r.numTotalTestSuites && r.success === false && r.numFailedTests === 0 ? 1 : 0); }
      else { p = r.stats.expected + r.stats.flaky; f = r.stats.unexpected + (r.errors?.length ?? 0); }
    } catch { p = 0; f = 1; }
    console.log(p + " " + f);
  ' "$1" "$2")"
  PASSED=$((PASSED + ${counts% *}))
  FAILED=$((FAILED + ${counts#* }))
}

cd "$ROOT"
ensure_node_modules
ensure_chromium
mkdir -p "$REPORTS"
rm -f "$REPORTS"/*.json
start_postgres
# A clean test database on every run, so results never depend on the last run.
psql -h 127.0.0.1 -p "$PG_PORT" -U "$PG_USER_NAME" -d postgres -qc "drop database if exists $PG_DB with (force)" >/dev/null
psql -h 127.0.0.1 -p "$PG_PORT" -U "$PG_USER_NAME" -d postgres -qc "create database $PG_DB" >/dev/null
migrate_database && seed_database || FAILED=$((FAILED + 1))
start_mail_catcher
node scripts/build-workers.mjs || FAILED=$((FAILED + 1))

step "typecheck" npx tsc --noEmit -p tsconfig.json
step "lint" npx eslint .

log "vitest (unit, reference, integration)"
npx vitest run ${TEST_VITEST:-} --reporter=default --reporter=json --outputFile.json="$REPORTS/vitest.json"
count_json "$REPORTS/vitest.json" vitest

step "build" npm run --silent build
if [ -d "$NEXT_DIST_DIR" ] && wait_for_port "$APP_PORT" 0; then
  log "port $APP_PORT is already taken by another process: refusing to test someone else's server"
  FAILED=$((FAILED + 1))
elif [ -d "$NEXT_DIST_DIR" ]; then
  start_background worker-test npx tsx scripts/worker.ts
  start_background app-test npx next start -H 127.0.0.1 -p "$APP_PORT"
  if wait_for_port "$APP_PORT" 60; then
    log "playwright (Chromium at /usr/bin/chromium)"
    PLAYWRIGHT_JSON_OUTPUT_NAME="$REPORTS/playwright.json" npx playwright test ${TEST_E2E:-} --reporter=list,json
    count_json "$REPORTS/playwright.json" playwright
  else
    log "app did not start"; FAILED=$((FAILED + 1))
  fi
fi

# Stop the services first, so the totals are the very last line CI reads.
cleanup
echo "$PASSED passed, $FAILED failed"
[ "$FAILED" = 0 ]
