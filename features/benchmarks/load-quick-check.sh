#!/usr/bin/env bash
# Load benchmark: C clients send quick checks to a notebook for S seconds (QuickCheckLoad); exit 1 on any error.
# usage: features/benchmarks/load-quick-check.sh [CLIENTS] [SECONDS] [PORT]   (after mvn -B -DskipTests install)
# IONMARK_JAR=path/to/ionmark.jar runs another build (to alternate an old and a new build under the same load)
set -euo pipefail
root="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
jar="${IONMARK_JAR:-$root/features/app/target/ionmark.jar}"
clients="${1:-50}"; seconds="${2:-60}"; port="${3:-18281}"
ws="$(mktemp -d)"
java -Dorg.osgi.service.http.port="$port" -Dgosh.args=--nointeractive -Dionmark.workspace="$ws" -jar "$jar" \
  >"$ws/notebook.log" 2>&1 &
pid=$!
trap 'kill "$pid" 2>/dev/null; wait "$pid" 2>/dev/null; rm -rf "$ws"' EXIT
for _ in $(seq 1 600); do
  curl -s --max-time 1 -o /dev/null "http://127.0.0.1:$port/" && break
  sleep 0.1
done
# wait for a quick check that answers with a card: the panel registers after the page server, and class loading
# and the table-wide analog index are not what the load test measures
# (seen: right after the first card the panel was briefly gone again): five cards in a row, a second apart
ok=0
for _ in $(seq 1 240); do
  if curl -s --max-time 60 "http://127.0.0.1:$port/panel/quick-check?ph=7.4&structure=CC(%3DO)O" | grep -q im-card
  then ok=$((ok + 1)); else ok=0; fi
  [ "$ok" -ge 5 ] && break
  sleep 1
done
java -cp "$root/features/benchmarks/target/benchmarks.jar" ionmark.benchmarks.QuickCheckLoad \
  "http://127.0.0.1:$port" "$clients" "$seconds"
