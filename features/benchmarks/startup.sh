#!/usr/bin/env bash
# Startup benchmark: time from launching the notebook application to the first served page, and to the
# first page that carries annotations (the speciation service warmed up). Runs N cold starts.
# usage: features/benchmarks/startup.sh [N]     (after mvn -B -DskipTests install)
set -euo pipefail
root="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
jar="$root/features/app/target/ionmark.jar"
n="${1:-5}"
port=18080
for i in $(seq 1 "$n"); do
  ws="$(mktemp -d)"
  start=$(date +%s%N)
  java -Dorg.osgi.service.http.port=$port -Dgosh.args=--nointeractive -Dionmark.workspace="$ws" -jar "$jar" >/dev/null 2>&1 &
  pid=$!
  first=""; annotated=""
  while [ -z "$annotated" ]; do
    body=$(curl -s --max-time 2 "http://127.0.0.1:$port/entry/05-assay-ph74" || true)
    now=$(date +%s%N)
    [ -z "$first" ] && [ -n "$body" ] && first=$(( (now - start) / 1000000 ))
    case "$body" in *im-card*) annotated=$(( (now - start) / 1000000 )) ;; esac
    sleep 0.05
    [ $(( (now - start) / 1000000000 )) -gt 60 ] && { echo "no annotated page within 60 s"; kill $pid; exit 1; }
  done
  kill $pid; wait $pid 2>/dev/null || true
  rm -rf "$ws"
  echo "run $i: first page ${first} ms, first annotated page ${annotated} ms"
done
