#!/usr/bin/env bash
# Command-line check benchmark: wall time of `./ionmark check` for one molecule, N runs each,
#   (a) in a workspace with a table store and no notebook running,
#   (b) in the same workspace while a notebook serves it (the command line then reads the head file and never
#       waits for the notebook's store lock).
# usage: features/benchmarks/cli-check.sh [N] [PORT]     (after mvn -B -DskipTests install)
set -euo pipefail
root="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
jar="$root/features/app/target/ionmark.jar"
n="${1:-5}"; port="${2:-18280}"
ws="$(mktemp -d)"
trap 'rm -rf "$ws"' EXIT
smiles='OC(=O)c1ccccc1O'

# a store in the workspace: a notebook start creates and seeds it, then stops
start_notebook() {
  java -Dorg.osgi.service.http.port="$port" -Dgosh.args=--nointeractive -Dionmark.workspace="$ws" -jar "$jar" \
    >"$ws/notebook.log" 2>&1 &
  pid=$!
  for _ in $(seq 1 600); do
    curl -s --max-time 1 -o /dev/null "http://127.0.0.1:$port/" && [ -f "$ws/.ionmark/head.json" ] && return 0
    sleep 0.1
  done
  echo "notebook did not start" >&2; kill "$pid"; exit 1
}

run() { # label
  local total=0
  for i in $(seq 1 "$n"); do
    local t0 t1
    t0=$(date +%s%N)
    "$root/ionmark" check "$smiles" --ph 7.4 --workspace "$ws" >/dev/null
    t1=$(date +%s%N)
    total=$(( total + (t1 - t0) / 1000000 ))
    echo "$1 run $i: $(( (t1 - t0) / 1000000 )) ms"
  done
  echo "$1 mean: $(( total / n )) ms"
}

start_notebook
kill "$pid"; wait "$pid" 2>/dev/null || true
run "no notebook"
start_notebook
run "notebook running"
kill "$pid"; wait "$pid" 2>/dev/null || true
