#!/usr/bin/env bash
# npm run bench: the local cluster up (as for npm start), then the speed figures.
source "$(dirname "$0")/lib.sh"
env_defaults
ensure_node_modules
setup_database
node --import tsx tests/bench/run.ts
