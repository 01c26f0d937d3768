#!/usr/bin/env bash
# Keeps a service up: runs the command, and starts it again when it exits with an error (a crash),
# pausing 1 s, then 2, 4 … up to 30 s while it keeps crashing within a minute of its start.
# TERM or INT stops the command (it gets TERM and drains) and then the supervisor.
# Usage: supervise.sh NAME COMMAND [ARGS…]
name="$1"; shift
child=""
stopping=0
stop() {
  stopping=1
  if [ -n "$child" ]; then kill -TERM "$child" 2>/dev/null; wait "$child" 2>/dev/null; fi
  exit 0
}
trap stop TERM INT
delay=1
while true; do
  started=$(date +%s)
  "$@" &
  child=$!
  wait "$child"; code=$?
  [ "$stopping" = 1 ] && exit 0
  [ "$code" = 0 ] && exit 0 # it stopped by itself, cleanly: nothing to restart
  if [ $(( $(date +%s) - started )) -ge 60 ]; then delay=1; fi
  echo "[supervise] $name exited with code $code at $(date -u +%H:%M:%SZ); restarting in ${delay}s" >&2
  sleep "$delay" &
  wait $!
  delay=$(( delay * 2 > 30 ? 30 : delay * 2 ))
done
