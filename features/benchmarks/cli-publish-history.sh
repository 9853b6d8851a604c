#!/usr/bin/env bash
# Command-line durability check: in a fresh workspace (store created by one notebook start), N times: publish
# through `./ionmark table publish`, then `./ionmark table history`; counts runs where the confirmed version
# is not the head afterwards. Exit 1 when any publish was lost.
# usage: features/benchmarks/cli-publish-history.sh [N] [PORT]     (after mvn -B -DskipTests install)
set -euo pipefail
root="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
jar="$root/features/app/target/ionmark.jar"
n="${1:-5}"; port="${2:-18282}"
ws="$(mktemp -d)"
trap 'rm -rf "$ws"' EXIT
java -Dorg.osgi.service.http.port="$port" -Dgosh.args=--nointeractive -Dionmark.workspace="$ws" -jar "$jar" \
  >"$ws/notebook.log" 2>&1 &
pid=$!
for _ in $(seq 1 600); do [ -f "$ws/.ionmark/head.json" ] && break; sleep 0.1; done
kill "$pid"; wait "$pid" 2>/dev/null || true
"$root/ionmark" table export --out "$ws/draft.json" --workspace "$ws" 2>/dev/null
lost=0
for i in $(seq 1 "$n"); do
  head=$("$root/ionmark" table history --workspace "$ws" | head -1 | sed 's/^v\([0-9]*\).*/\1/')
  said=$("$root/ionmark" table publish "$ws/draft.json" --base "$head" --comment "run $i" --workspace "$ws")
  now=$("$root/ionmark" table history --workspace "$ws" | head -1 | sed 's/^v\([0-9]*\).*/\1/')
  echo "run $i: $said; history head v$now"
  [ "$said" = "published v$((head + 1))${said#published v$((head + 1))}" ] && [ "$now" = "$((head + 1))" ] || lost=$((lost + 1))
done
echo "$lost of $n confirmed publishes lost"
[ "$lost" -eq 0 ]
