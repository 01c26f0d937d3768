#!/usr/bin/env bash
# npm test: the same set-up as npm start, against a test cluster of its own (never the demo data),
# then type check, unit and API tests, the production build, and the browser tests in Chromium.
source "$(dirname "$0")/lib.sh"

source "$(dirname "$0")/test-env.sh"
env_defaults
export BASE_URL="$APP_URL"
REPORT_DIR="$DATA_DIR/reports"
rm -rf "$REPORT_DIR"; mkdir -p "$REPORT_DIR"

cleanup() {
  stop_bg app
  stop_bg smtp-sink
  stop_bg stripe-fake
  stop_cluster
}
trap cleanup EXIT

ensure_node_modules
ensure_chromium
ensure_test_tools
ensure_postgres_installed
ensure_cluster
start_cluster
log "recreating the test database $PGDATABASE"
psql -h "$PGHOST" -p "$PGPORT" -U "$PGUSER" -d postgres -qc "drop database if exists \"$PGDATABASE\" with (force)" >/dev/null
ensure_database "$PGDATABASE"
migrate_db
seed_db
stop_bg smtp-sink   # a sink left from a run by hand: start afresh with an empty mailbox
rm -rf "$DATA_DIR/mail"
start_bg smtp-sink node --import tsx server/fakes/smtp-sink/index.ts
wait_port "$SMTP_SINK_PORT" 30 || die "the SMTP sink did not start"
stop_bg stripe-fake
start_bg stripe-fake node --import tsx server/fakes/stripe/index.ts
wait_port "$STRIPE_FAKE_PORT" 30 || die "the Stripe fake did not start"

failed=()
step() {
  local name="$1"; shift
  log "── $name"
  if "$@"; then log "✔ $name"; else log "✘ $name"; failed+=("$name"); fi
}

step "type check (vue-tsc)" npx vue-tsc --noEmit -p tsconfig.json
step "unit and API tests" npx vitest run --project unit --project api \
  --reporter=default --reporter=json --outputFile.json="$REPORT_DIR/unit-api.json"
step "production build" npx vite build --logLevel warn

browser_tests() {
  # the API tests' failed sign-ins must not throttle the browser's
  psql -h "$PGHOST" -p "$PGPORT" -U "$PGUSER" -d "$PGDATABASE" -qc "delete from rate_limit_hits" >/dev/null
  start_bg app bash docker-free-scripts/supervise.sh app node --import tsx server/index.ts
  wait_http "$APP_URL/api/health" 60 || { tail -n 30 "$DATA_DIR/logs/app.log" >&2; return 1; }
  npx vitest run --project browser --reporter=default --reporter=json --outputFile.json="$REPORT_DIR/browser.json"
}
step "browser tests (Chromium)" browser_tests

# One closing line over every test file's results.
node -e '
  const fs = require("fs"); let p = 0, f = 0, s = 0;
  for (const file of fs.readdirSync(process.argv[1])) {
    const r = JSON.parse(fs.readFileSync(process.argv[1] + "/" + file, "utf8"));
    p += r.numPassedTests; f += r.numFailedTests; s += r.numPendingTests + (r.numTodoTests || 0);
  }
  const steps = process.argv[2] ? process.argv[2].split("|") : [];
  if (steps.length) console.log("failed steps: " + steps.join(", "));
  console.log(`tests: ${p} passed, ${f} failed` + (s ? `, ${s} skipped` : ""));
' "$REPORT_DIR" "$(IFS='|'; echo "${failed[*]:-}")"

[ ${#failed[@]} -eq 0 ] || exit 1
