#!/usr/bin/env bash
# npm start: set everything up on a fresh machine, then serve the app. Safe to run again.
source "$(dirname "$0")/lib.sh"
env_defaults

ensure_node_modules
setup_database
seed_db

stop_bg smtp-sink
start_bg smtp-sink node --import tsx server/fakes/smtp-sink/index.ts
wait_port "$SMTP_SINK_PORT" 30 || die "the SMTP sink did not start (log: $DATA_DIR/logs/smtp-sink.log)"
stop_bg stripe-fake
start_bg stripe-fake node --import tsx server/fakes/stripe/index.ts
wait_port "$STRIPE_FAKE_PORT" 30 || die "the Stripe fake did not start (log: $DATA_DIR/logs/stripe-fake.log)"

log "building the client"
npx vite build --logLevel warn

stop_bg app   # a running app would keep serving the old code: start it afresh
start_bg app bash docker-free-scripts/supervise.sh app node --import tsx server/index.ts
if ! wait_http "$APP_URL/api/health" 60; then
  tail -n 30 "$DATA_DIR/logs/app.log" >&2 || true
  die "the app did not answer on $APP_URL (log: $DATA_DIR/logs/app.log)"
fi

cat <<MSG

  Bundlesmith is running at $APP_URL
  (mail caught by the local SMTP sink: sign in as admin, open Outbox)

  Demo sign-ins, all with the password  Bundlesmith-demo-1
    customer@pellmar.example    customer, Pellmar Compression
    buyer@quarryhill.example    customer, Quarry Hill Hydraulics
    sales@aldercreek.example    sales engineer, Alder Creek Thermal Works
    shop@aldercreek.example     shop, Alder Creek Thermal Works
    admin@aldercreek.example    admin, Alder Creek Thermal Works

  Logs: $DATA_DIR/logs    Stop everything: npm run stop
MSG
