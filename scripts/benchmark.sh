#!/usr/bin/env bash
# Whole-process benchmark: checks N copies of the sample programmes with the CLI jar and prints figures.
# Usage: scripts/benchmark.sh [copies-per-sample (default 100)] [runs (default 3)]
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
copies="${1:-100}"
runs="${2:-3}"
jar="$here/cli/target/mesolint-cli-0.1.0-SNAPSHOT-all.jar"
[ -f "$jar" ] || (cd "$here" && mvn -q -B -DskipTests -pl cli -am install)
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT
for f in "$here"/sample-programs/programmes/*.yaml; do
  for i in $(seq 1 "$copies"); do cp "$f" "$work/$(basename "$f" .yaml)-$i.yaml"; done
done
files=$(ls "$work" | wc -l)
bytes=$(cat "$work"/*.yaml | wc -c)
echo "benchmark: $files files, $((bytes / 1024)) KiB, $(nproc) cores, $runs runs"
java -jar "$jar" check "$here/sample-programs/programmes/novice-full-body.yaml" > /dev/null  # warm the disk cache
for r in $(seq 1 "$runs"); do
  start=$(date +%s%N)
  java -jar "$jar" check "$work" > /dev/null || true
  end=$(date +%s%N)
  ms=$(( (end - start) / 1000000 ))
  echo "run $r: ${ms} ms wall, $(( files * 1000 / (ms > 0 ? ms : 1) )) files/s (JVM start included)"
done
start=$(date +%s%N)
java -jar "$jar" check "$here/sample-programs/programmes/novice-full-body.yaml" > /dev/null
end=$(date +%s%N)
echo "single file, cold JVM: $(( (end - start) / 1000000 )) ms wall"
