#!/usr/bin/env bash
# Whole-process benchmark of `mesolint check` against the parse floor (read + compose with SnakeYAML's safe
# loader, nothing else), on deterministic corpora. Prints medians of interleaved runs, wall and CPU time, and
# the ratio check/floor for each corpus (of the medians, and the median of each pair's own ratio); then 1 vs 2 processors, and one file through the launcher with and
# without its class-data archive. Timing is never part of `mvn verify`: run this by hand on a quiet machine.
#
# Usage: benchmarks/run.sh [--runs N] [--quick]
#   --runs N   counted runs per command (default 5), after one warm-up run each
#   --quick    small corpora (for trying the script), not figures to quote
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
runs=5 clean_n=900 heavy_n=300 many_n=10000
while [ $# -gt 0 ]; do
  case "$1" in
    --runs) runs="$2"; shift 2 ;;
    --quick) clean_n=90 heavy_n=30 many_n=500; shift ;;
    *) echo "usage: benchmarks/run.sh [--runs N] [--quick]" >&2; exit 2 ;;
  esac
done
command -v /usr/bin/time >/dev/null || { echo "benchmarks: needs GNU time (/usr/bin/time; Debian package 'time')" >&2; exit 2; }

version=0.1.0-SNAPSHOT
cli="$here/cli/target/mesolint-cli-$version-all.jar"
bench="$here/benchmarks/target/mesolint-benchmarks-$version-all.jar"
echo "building the CLI and the benchmark jars ..." >&2
(cd "$here" && mvn -B -q -Dstyle.color=never -DskipTests -pl cli,benchmarks -am package >&2)

work="$here/benchmarks/target/corpus"
rm -rf "$work"
gen() { java -cp "$bench" dev.mesolint.bench.CorpusGenerator "$@"; }
templates=("$here/sample-programs/programmes")
[ -d "$here/sample-programs/sound" ] && templates+=("$here/sample-programs/sound")
gen "$work/clean" clean "$clean_n" "${templates[@]}"
gen "$work/heavy" heavy "$heavy_n"
gen "$work/large" large
gen "$work/many" clean "$many_n" "${templates[@]}"

# The check runs as users run it, through the README's launcher (C1 only, the serial collector, and the class-data
# archive it trains on the bundled samples); the floor gets the same flags and an archive of its own, trained the
# same way. The rows "without archives" run both as plain JVMs.
jvm=(java -XX:TieredStopAtLevel=1 -XX:+UseSerialGC -XX:NewRatio=1 -XX:MaxTenuringThreshold=0 -Xshare:auto)
"$here/mesolint" check "$here/sample-programs/programmes" >/dev/null 2>&1 || true # builds the launcher's archive
floor_archive="$here/benchmarks/target/parse-floor.jsa"
rm -f "$floor_archive"
"${jvm[@]}" -XX:ArchiveClassesAtExit="$floor_archive" -Xlog:cds=off -Xlog:cds+dynamic=off -cp "$bench" \
  dev.mesolint.bench.ParseFloor 2 "${templates[@]}" >/dev/null 2>&1
floor_cmd=("${jvm[@]}" -XX:SharedArchiveFile="$floor_archive" -Xlog:cds=off -Xlog:cds+dynamic=off -cp "$bench"
  dev.mesolint.bench.ParseFloor 2)
check_cmd=("$here/mesolint" check)
plain_floor_cmd=("${jvm[@]}" -cp "$bench" dev.mesolint.bench.ParseFloor 2)
plain_check_cmd=("${jvm[@]}" -jar "$cli" check)

tmp="$(mktemp -d)"
trap 'rm -rf "$tmp"' EXIT
# one run: appends "wall cpu" (seconds) to the file named by $1; the command's exit code is kept in $tmp/rc
once() {
  local out="$1"; shift
  /usr/bin/time -f "%e %U %S" -o "$tmp/t" "$@" >/dev/null 2>"$tmp/err" && echo 0 >"$tmp/rc" || echo $? >"$tmp/rc"
  awk '{printf "%s %.2f\n", $1, $2 + $3}' "$tmp/t" >>"$out"
}
median() { sort -n | awk '{v[NR]=$1} END {if (NR % 2) print v[(NR+1)/2]; else printf "%.2f\n", (v[NR/2]+v[NR/2+1])/2}'; }
col() { awk -v c="$2" '{print $c}' "$1" | median; }
ratio() { awk -v a="$1" -v b="$2" 'BEGIN {printf "%.2f", (b > 0 ? a / b : 0)}'; }

# Interleaved A B A B ... after one warm-up each; prints one table row.
compare() {
  local label="$1" prefix="$2"; shift 2
  local files; files=$(find "$@" -name '*.yaml' | wc -l)
  : >"$tmp/a"; : >"$tmp/b"
  once /dev/null $prefix "${floor_cmd[@]}" "$@"; once /dev/null $prefix "${check_cmd[@]}" "$@"
  for _ in $(seq 1 "$runs"); do
    once "$tmp/a" $prefix "${floor_cmd[@]}" "$@"; once "$tmp/b" $prefix "${check_cmd[@]}" "$@"
  done
  local fw fc cw cc paired
  fw=$(col "$tmp/a" 1); fc=$(col "$tmp/a" 2); cw=$(col "$tmp/b" 1); cc=$(col "$tmp/b" 2)
  # The median of each run's own check/floor CPU ratio: a shared machine's speed drifts between runs, and the two
  # runs of a pair are seconds apart.
  paired=$(paste -d' ' "$tmp/a" "$tmp/b" | awk '{printf "%.4f\n", ($2 > 0 ? $4 / $2 : 0)}' | median)
  printf "%-28s %6s %9s %9s %9s %9s %7s %7s %7.2f\n" "$label" "$files" "$fw" "$cw" "$(ratio "$cw" "$fw")" \
    "$fc" "$cc" "$(ratio "$cc" "$fc")" "$paired"
  echo "$fw $cw $fc $cc" >"$tmp/last"
}

echo
echo "mesolint benchmark: $(nproc) processors, $runs runs each (medians), $(java -version 2>&1 | head -1)"
printf "%-28s %6s %9s %9s %9s %9s %7s %7s %7s\n" corpus files "floor s" "check s" "wall x" "floor cpu" "check" "cpu x" \
  "paired"
compare "clean library" "" "$work/clean"
compare "finding-heavy library" "" "$work/heavy"
compare "one large programme" "" "$work/large"
compare "10,000 files" "" "$work/many"
saved_floor=("${floor_cmd[@]}"); saved_check=("${check_cmd[@]}")
floor_cmd=("${plain_floor_cmd[@]}"); check_cmd=("${plain_check_cmd[@]}")
compare "clean, without archives" "" "$work/clean"
compare "heavy, without archives" "" "$work/heavy"
floor_cmd=("${saved_floor[@]}"); check_cmd=("${saved_check[@]}")

echo
echo "per phase, in one JVM on one thread after warm-up (CPU time per file, and as a multiple of the floor)"
for corpus in clean heavy; do
  echo "$corpus library:"
  "${jvm[@]}" -cp "$cli:$here/benchmarks/target/mesolint-benchmarks-$version.jar" dev.mesolint.bench.PhaseCosts \
    --rounds "$runs" "$work/$corpus" | sed 's/^/  /'
done

echo
echo "1 vs 2 processors (clean library; taskset -c 0 for one)"
compare "clean, 1 processor" "taskset -c 0" "$work/clean"; read -r f1 c1 _ _ <"$tmp/last"
compare "clean, 2 processors" "" "$work/clean"; read -r f2 c2 _ _ <"$tmp/last"
floor_gain=$(ratio "$f1" "$f2"); check_gain=$(ratio "$c1" "$c2")
echo "speedup 1 -> 2: floor ${floor_gain}x, check ${check_gain}x ($(awk -v a="$check_gain" -v b="$floor_gain" 'BEGIN {printf "%.0f", (b > 1 ? 100 * (a - 1) / (b - 1) : 0)}')% of the floor's gain)"

echo
echo "memory: 10,000 files with -Xmx256m"
: >"$tmp/m"
/usr/bin/time -f "%e s wall, %M KB peak" -o "$tmp/m" java -Xmx256m -XX:TieredStopAtLevel=1 -XX:+UseSerialGC -XX:NewRatio=1 -XX:MaxTenuringThreshold=0 -jar "$cli" check "$work/many" >/dev/null 2>"$tmp/err" && rc=0 || rc=$?
echo "exit $rc, $(cat "$tmp/m")$(grep -q OutOfMemory "$tmp/err" && echo ', OUT OF MEMORY' || true)"

echo
echo "one file through ./mesolint (median wall s of $runs), beside a bare JVM with the same flags"
one="$here/sample-programs/programmes/novice-full-body.yaml"
"$here/mesolint" check "$one" >/dev/null 2>&1 || true # builds the jar and the class archive if needed
: >"$tmp/cds"; : >"$tmp/nocds"; : >"$tmp/bare"
for _ in $(seq 1 "$runs"); do
  once "$tmp/cds" "$here/mesolint" check "$one"
  once "$tmp/nocds" env MESOLINT_CDS=0 "$here/mesolint" check "$one"
  once "$tmp/bare" "${jvm[@]}" -version
done
classes_cds=$(MESOLINT_JAVA_OPTS="-Xlog:class+load=info" "$here/mesolint" check "$one" | grep -c 'class,load' || true)
shared=$(MESOLINT_JAVA_OPTS="-Xlog:class+load=info" "$here/mesolint" check "$one" | grep -c 'shared objects file' || true)
printf "with the archive %ss, without %ss, bare JVM %ss; %s classes loaded (%s from the archive)\n" \
  "$(col "$tmp/cds" 1)" "$(col "$tmp/nocds" 1)" "$(col "$tmp/bare" 1)" "$classes_cds" "$shared"

echo
# The plugin's unchanged build against an empty Mojo and bare Maven (installs the plugin from this checkout).
(cd "$here" && mvn -B -q -Dstyle.color=never -DskipTests -pl maven-plugin -am install >&2)
bash "$here/benchmarks/plugin.sh" --runs "$runs"
