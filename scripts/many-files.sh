#!/usr/bin/env bash
# Memory proof: generates 10,000 programmes deterministically and checks them with a 256 MB heap, through the
# launcher (./mesolint, MESOLINT_JAVA_OPTS=-Xmx256m). Prints, per run, the files checked, the exit code, peak
# resident memory (GNU time) and wall time; a run that dies of memory, exits 2 or 3, or checks fewer files than
# were generated is marked FAIL. The corpus: 9,000 copies of the sound samples, each with its own programme id, and
# 1,000 random finding-heavy programmes (fixed seed), from benchmarks' CorpusGenerator. Not part of `mvn verify`.
#
# Usage: scripts/many-files.sh [--count N] [--keep]
#   --count N  programmes to generate (default 10000; a tenth of them finding-heavy)
#   --keep     keep the corpus in benchmarks/target/many-files (default: removed after the runs)
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
count=10000 keep=no
while [ $# -gt 0 ]; do
  case "$1" in
    --count) count="$2"; shift 2 ;;
    --keep) keep=yes; shift ;;
    *) echo "usage: scripts/many-files.sh [--count N] [--keep]" >&2; exit 2 ;;
  esac
done
[ -x /usr/bin/time ] || { echo "many-files: needs GNU time (/usr/bin/time; Debian package 'time')" >&2; exit 2; }

version=0.1.0-SNAPSHOT
bench="$here/benchmarks/target/mesolint-benchmarks-$version-all.jar"
echo "building the benchmark jar (corpus generator) ..." >&2
(cd "$here" && mvn -B -q -Dstyle.color=never -DskipTests -pl benchmarks -am package >&2)
"$here/mesolint" --version >/dev/null # builds the CLI jar and the launcher's class archive when needed

corpus="$here/benchmarks/target/many-files"
rm -rf "$corpus"
heavy=$((count / 10)); clean=$((count - heavy))
gen() { java -cp "$bench" dev.mesolint.bench.CorpusGenerator "$@" >&2; }
gen "$corpus/programmes/clean" clean "$clean" "$here/sample-programs/sound"
gen "$corpus/programmes/heavy" heavy "$heavy"
generated=$(find "$corpus/programmes" -name '*.yaml' | wc -l)
tmp="$(mktemp -d)"
cleanup() { rm -rf "$tmp"; [ "$keep" = yes ] || rm -rf "$corpus"; }
trap cleanup EXIT

echo "mesolint many-files: $generated programmes generated ($clean sound copies, $heavy finding-heavy), -Xmx256m," \
  "$(nproc) processors, $(java -version 2>&1 | head -1)"
printf '%-26s %8s %5s %12s %8s %s\n' run checked exit "peak RSS MB" "wall s" verdict
bad=0
# one LABEL ARGS...: checks the corpus through the launcher with a 256 MB heap and prints a row.
one() {
  local label="$1"; shift
  local rc=0
  (cd "$corpus" && MESOLINT_JAVA_OPTS="-Xmx256m" /usr/bin/time -f "%M %e" -o "$tmp/time" \
      "$here/mesolint" check programmes --fail-on error "$@" >"$tmp/out" 2>"$tmp/err") || rc=$?
  local checked peak wall verdict=ok
  checked=$(grep -oE '^[0-9]+ files? checked' "$tmp/out" | grep -oE '^[0-9]+' || echo 0)
  # GNU time puts "Command exited with non-zero status N" first when the run fails: the figures are the last line.
  read -r peak wall < <(tail -n 1 "$tmp/time") || true
  if [ "$rc" -ge 2 ] || [ "$checked" != "$generated" ] || grep -q OutOfMemory "$tmp/out" "$tmp/err"; then
    verdict=FAIL; bad=$((bad + 1)); tail -5 "$tmp/err" >&2
  fi
  printf '%-26s %8s %5s %12s %8s %s\n' "$label" "$checked" "$rc" "$((peak / 1024))" "$wall" "$verdict"
}
one "console"
one "console + sarif,junit" --report "sarif=$tmp/r.sarif" --report "junit=$tmp/r.xml"
# The JSON report shows every programme's training figures: the run packs them as each file is checked.
one "console + json" --report "json=$tmp/r.json"
[ "$bad" = 0 ] || { echo "many-files: $bad run(s) failed" >&2; exit 1; }
