#!/usr/bin/env bash
# npm run stop: stop what npm start started, by the PIDs it recorded (never by process name).
source "$(dirname "$0")/lib.sh"
env_defaults
stop_bg app
stop_bg smtp-sink
stop_bg stripe-fake
stop_cluster
log "stopped"
