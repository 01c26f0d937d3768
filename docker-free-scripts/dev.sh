#!/usr/bin/env bash
# npm run dev: the API server (restarting on change) plus Vite's dev server with /api proxied to it.
source "$(dirname "$0")/lib.sh"
env_defaults
ensure_node_modules
setup_database
seed_db
start_bg smtp-sink node --import tsx server/fakes/smtp-sink/index.ts
start_bg stripe-fake node --import tsx server/fakes/stripe/index.ts
trap 'kill 0' EXIT
npx tsx watch server/index.ts &
npx vite
