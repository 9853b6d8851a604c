#!/usr/bin/env bash
# `./ionmark check` of one molecule, wall time through the launcher, median of N runs each:
#   (a) no notebook running: the frameworkless path (head file, validated once and then hash-checked; AppCDS);
#   (b) a notebook serving the same workspace: the check goes over its loopback channel.
# Also checks that both answer the same (text and --format json), and prints the machine's load.
# usage: features/benchmarks/bench-check.sh [N] [PORT]     (N >= 5; after mvn -B -DskipTests install)
set -euo pipefail
root="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
jar="$root/features/app/target/ionmark.jar"
n="${1:-5}"; port="${2:-19100}"
[ -f "$jar" ] || { echo "build first: mvn -B -DskipTests install" >&2; exit 2; }
ws="$(mktemp -d)"
pid=""
cleanup() { [ -n "$pid" ] && kill "$pid" 2>/dev/null && wait "$pid" 2>/dev/null; rm -rf "$ws"; }
trap cleanup EXIT
smiles='OC(=O)c1ccccc1O'
check() { "$root/ionmark" check "$smiles" --ph 7.4 --workspace "$ws" "$@"; }

start_notebook() {
  java -Dorg.osgi.service.http.port="$port" -Dgosh.args=--nointeractive -Dionmark.workspace="$ws" -jar "$jar" \
    >"$ws/notebook.log" 2>&1 &
  pid=$!
  for _ in $(seq 1 1200); do
    [ -f "$ws/.ionmark/head.json" ] && [ -f "$ws/.ionmark/cli-channel" ] \
      && curl -s --max-time 1 -o /dev/null "http://127.0.0.1:$port/" && return 0
    sleep 0.1
  done
  echo "notebook did not start; its log: $ws/notebook.log" >&2; exit 1
}
stop_notebook() { kill "$pid"; wait "$pid" 2>/dev/null || true; pid=""; }

median() { sort -n | awk '{ a[NR] = $1 } END { print (NR % 2 ? a[(NR + 1) / 2] : int((a[NR / 2] + a[NR / 2 + 1]) / 2)) }'; }

run() { # label: N timed runs after one untimed warm-up, prints each and the median
  check >/dev/null 2>&1 || true
  local times=()
  for i in $(seq 1 "$n"); do
    local t0 t1
    t0=$(date +%s%N)
    check >/dev/null 2>&1
    t1=$(date +%s%N)
    times+=($(( (t1 - t0) / 1000000 )))
  done
  echo "$1: runs ${times[*]} ms; median $(printf '%s\n' "${times[@]}" | median) ms"
}

echo "machine: $(nproc) cores; load average before: $(cut -d' ' -f1-3 /proc/loadavg)"
start_notebook        # creates and seeds the store and writes the head file
stop_notebook
[ ! -f "$ws/.ionmark/cli-channel" ] || { echo "the stopped notebook left its channel file" >&2; exit 1; }
check > "$ws/local.txt" 2>/dev/null; check --format json > "$ws/local.json" 2>/dev/null
run "no notebook"
start_notebook
check > "$ws/channel.txt" 2>/dev/null; check --format json > "$ws/channel.json" 2>/dev/null
run "notebook running"
stop_notebook
if cmp -s "$ws/local.txt" "$ws/channel.txt" && cmp -s "$ws/local.json" "$ws/channel.json"; then
  echo "same answer with and without the notebook (text and json): yes"
else
  echo "same answer with and without the notebook: NO"; diff "$ws/local.txt" "$ws/channel.txt" || true; exit 1
fi
echo "load average after: $(cut -d' ' -f1-3 /proc/loadavg)"
