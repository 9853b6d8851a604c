#!/usr/bin/env bash
# Runs the pipeline (ionmark.pipeline.Main) in a plain JVM on the module's jar and class path; `./ionmark pipeline`
# and features/benchmarks/pipeline-vs-batch.sh both call it. Needs the module built (target/classpath.txt).
#
#   features/pipeline/pipeline.sh [annotate|impact] --in … --out … [options]       (see docs/pipeline.md)
#
# Class-data sharing: Beam's direct runner loads about 7,000 classes from 86 jars before the first structure. The
# first run after a build records the classes it loaded (an AppCDS archive, target/pipeline.jsa, written to a
# private name and moved into place); later runs map them instead of finding, reading and verifying each one.
# The archive is remade when any jar on the class path is newer. IONMARK_PIPELINE_CDS=off runs without it;
# IONMARK_PIPELINE_JVM adds JVM options (words), for example "-Xmx8g -XX:ActiveProcessorCount=2".
set -uo pipefail
t="$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)/target"
pjar="$(ls "$t"/ionmark.pipeline-*.jar 2>/dev/null | grep -v -- '-sources\|-tests' | head -1)"
[ -n "$pjar" ] && [ -f "$t/classpath.txt" ] || {
  echo "ionmark pipeline: not built (mvn -B -q -DskipTests install -pl features/pipeline -am)" >&2; exit 1; }
cp="$pjar:$(cat "$t/classpath.txt")"
jvm=(${IONMARK_PIPELINE_JVM:-})
jsa="$t/pipeline.jsa"
cds=()
if [ "${IONMARK_PIPELINE_CDS:-on}" != off ]; then
  fresh=1
  [ -f "$jsa" ] || fresh=""
  if [ -n "$fresh" ]; then
    IFS=: read -r -a jars <<< "$cp"
    for j in "${jars[@]}"; do [ "$j" -nt "$jsa" ] && { fresh=""; break; }; done
  fi
  if [ -n "$fresh" ]; then
    cds=(-XX:SharedArchiveFile="$jsa")
  else
    cds=(-XX:ArchiveClassesAtExit="$jsa.$$")
  fi
  # CDS messages (a class it could not archive, a stale archive) are not the user's business; other JVM
  # warnings still reach stderr
  cds+=(-Xshare:auto -Xlog:disable -Xlog:all=warning,cds=off,cds+dynamic=off:stderr)
fi
java "${jvm[@]}" ${cds[@]+"${cds[@]}"} -cp "$cp" ionmark.pipeline.Main "$@"
rc=$?
[ -f "$jsa.$$" ] && mv -f "$jsa.$$" "$jsa"
exit $rc
