#!/usr/bin/env bash
# Times `batch` against the pipeline's direct runner on the same input, same workers, in turn, RUNS times each,
# and prints every run and the medians (wall and CPU seconds) and the wall ratio. Both run in a plain JVM with
# the same services (ionmark.pipeline.bench.BatchMain for batch), so the OSGi start-up is left out of both.
#
#   features/benchmarks/pipeline-vs-batch.sh [TSV] [N] [WORKERS] [RUNS] [-- extra options for both]
#
# TSV: id/smiles columns (default ../shared/... is NOT used: pass /work/dev-open.tsv or any TSV of your own),
# N structures written by CDK into an SDF under $TMPDIR (default 10000), WORKERS threads (2), RUNS (3).
# Needs: mvn -B -o -q install -DskipTests -pl features/pipeline -am; mvn -B -o -q test-compile -pl features/pipeline
# IONMARK_PIPELINE_CDS=off: the pipeline without its class-data-sharing archive.
set -euo pipefail
root="$(cd "$(dirname "$0")/../.." && pwd)"
tsv="${1:?TSV with id and smiles columns}"; n="${2:-10000}"; workers="${3:-2}"; runs="${4:-3}"
shift $(( $# < 4 ? $# : 4 )); [ "${1:-}" = "--" ] && shift
extra=("$@")
p="$root/features/pipeline/target"
cp="$p/test-classes:$p/classes:$(cat "$p/classpath.txt")"
work="${TMPDIR:-/tmp}/ionmark-pipeline-bench"; mkdir -p "$work"
sdf="$work/set-$n.sdf"
[ -s "$sdf" ] || java -cp "$cp" ionmark.pipeline.bench.SdfCopies "$tsv" "$n" "$sdf"
jvm=(-XX:ActiveProcessorCount="$workers")
phs=(--ph 7.4 --brief)
one() { # label, command…: prints "label wall cpu"
  local label="$1"; shift
  /usr/bin/time -f "%e %U %S" -o "$work/time" "$@" >/dev/null 2>"$work/$label.err" || { cat "$work/$label.err" >&2; exit 1; }
  read -r wall user sys < "$work/time"
  echo "$label $wall $(echo "$user + $sys" | bc)"
}
# the pipeline runs as ./ionmark runs it (features/pipeline/pipeline.sh): its first run after a build records the
# class-data-sharing archive, so make that run here, untimed, on a few structures
small="$work/set-50.sdf"
[ -s "$small" ] || java -cp "$cp" ionmark.pipeline.bench.SdfCopies "$tsv" 50 "$small"
rm -rf "$work/warm"
"$root/features/pipeline/pipeline.sh" --in="$small" --out="$work/warm" --ph=7.4 --brief >/dev/null 2>&1
for i in $(seq "$runs"); do
  rm -rf "$work/out"
  one batch java "${jvm[@]}" -cp "$cp" ionmark.pipeline.bench.BatchMain --timeoutMillis 60000 batch --in "$sdf" \
      "${phs[@]}" "${extra[@]}"
  IONMARK_PIPELINE_JVM="${jvm[*]}" one pipeline "$root/features/pipeline/pipeline.sh" --in="$sdf" --out="$work/out" \
      --ph=7.4 --brief --timeoutMillis=60000 --targetParallelism="$workers" "${extra[@]}"
done | tee "$work/runs.txt"
median() { sort -n | awk '{a[NR]=$1} END {print (NR % 2) ? a[(NR+1)/2] : (a[NR/2] + a[NR/2+1]) / 2}'; }
bw=$(awk '$1=="batch"{print $2}' "$work/runs.txt" | median); bc_=$(awk '$1=="batch"{print $3}' "$work/runs.txt" | median)
pw=$(awk '$1=="pipeline"{print $2}' "$work/runs.txt" | median); pc=$(awk '$1=="pipeline"{print $3}' "$work/runs.txt" | median)
echo "median of $runs, $n structures, $workers workers: batch ${bw}s wall ${bc_}s CPU; pipeline ${pw}s wall ${pc}s CPU;" \
     "wall ratio $(echo "scale=2; $pw / $bw" | bc); load average now: $(cut -d' ' -f1-3 /proc/loadavg)"
