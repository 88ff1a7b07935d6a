#!/usr/bin/env bash
# Speed work must change no finding: runs two CLI jars (a build of the commit before a speed change, and the
# change) over the finding-heavy and large benchmark corpora, every sample folder and every rule fixture, in the
# console, JSON (findings and training figures) and SARIF forms, and fails on the first byte that differs.
#
# Usage: benchmarks/same-findings.sh BEFORE.jar AFTER.jar
#   Build BEFORE.jar from the earlier commit, e.g.:
#     git worktree add /tmp/before HEAD && (cd /tmp/before && mvn -q -DskipTests -pl cli -am package)
#     cp /tmp/before/cli/target/mesolint-cli-*-all.jar /tmp/before.jar
set -euo pipefail
[ $# -eq 2 ] || { echo "usage: benchmarks/same-findings.sh BEFORE.jar AFTER.jar" >&2; exit 2; }
before="$(realpath "$1")" after="$(realpath "$2")"
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
bench="$here/benchmarks/target/mesolint-benchmarks-0.1.0-SNAPSHOT-all.jar"
[ -f "$bench" ] || (cd "$here" && mvn -B -q -DskipTests -pl benchmarks -am package >&2)
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT
java -cp "$bench" dev.mesolint.bench.CorpusGenerator "$work/heavy" heavy 300 >/dev/null
java -cp "$bench" dev.mesolint.bench.CorpusGenerator "$work/large" large >/dev/null

inputs=("$work/heavy" "$work/large" "$here/sample-programs/programmes" "$here/sample-programs/sound"
  "$here/sample-programs/broken" "$here/validator-core/src/test/resources/fixtures")

compared=0
for input in "${inputs[@]}"; do
  for format in console json sarif; do
    (cd "$here" && java -jar "$before" check --color=never --format="$format" --allow-empty "$input") \
      >"$work/before" 2>&1 || true
    (cd "$here" && java -jar "$after" check --color=never --format="$format" --allow-empty "$input") \
      >"$work/after" 2>&1 || true
    if ! cmp -s "$work/before" "$work/after"; then
      echo "DIFFERENT: $format output for $input" >&2
      diff "$work/before" "$work/after" | head -20 >&2
      exit 1
    fi
    compared=$((compared + 1))
  done
done
echo "same findings: $compared outputs byte-equal (${#inputs[@]} inputs x console, json, sarif)"
