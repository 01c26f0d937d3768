#!/usr/bin/env bash
# The test run's environment: its own cluster, database, ports and data folder, so tests never touch
# the demo data and can run while `npm start` serves. Sourced by test.sh; source it yourself to run
# one vitest file by hand against a running test cluster.
export DATA_DIR="${TEST_DATA_DIR:-$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)/.data/test}"
export PORT="${TEST_PORT:-3100}"
export PGPORT="${TEST_PGPORT:-54339}"
export PGDATABASE="${TEST_PGDATABASE:-bundlesmith_test}"
export SMTP_SINK_PORT="${TEST_SMTP_SINK_PORT:-2535}"
export SMTP_SINK_HTTP_PORT="${TEST_SMTP_SINK_HTTP_PORT:-2536}"
export STRIPE_FAKE_PORT="${TEST_STRIPE_FAKE_PORT:-12121}"
export NODE_ENV=test
unset DATABASE_URL SMTP_URL OUTBOX_URL APP_URL STRIPE_API_URL STRIPE_PAY_URL STRIPE_WEBHOOK_URL
