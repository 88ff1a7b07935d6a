#!/usr/bin/env bash
# The Maven plugin on a build where nothing changed, beside an empty Mojo and bare Maven, measured side by side:
#   bare      `mvn validate` of a pom without the plugin
#   empty     the same pom with mesolint:check bound to validate and skipped (-Dmesolint.skip): the plugin is
#             resolved and its Mojo called, which returns at once
#   unchanged the same pom, second and later builds: nothing changed, so the last outcome is replayed
# Prints medians of interleaved runs (wall seconds) and the plugin's overhead over bare Maven against the empty
# Mojo's. Needs the plugin installed (`mvn -DskipTests install`); never part of `mvn verify`.
# Usage: benchmarks/plugin.sh [--runs N]
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
runs=7
[ "${1:-}" = --runs ] && runs="$2"
version=0.1.0-SNAPSHOT
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT
mkdir -p "$work/with/programmes" "$work/bare"
cp "$here"/sample-programs/programmes/*.yaml "$work/with/programmes/"
pom() { # $1: plugin block or nothing
  cat <<POM
<project xmlns="http://maven.apache.org/POM/4.0.0">
  <modelVersion>4.0.0</modelVersion>
  <groupId>club.harbourside</groupId><artifactId>programmes</artifactId><version>1</version>
  <packaging>pom</packaging>
  <build><plugins>$1</plugins></build>
</project>
POM
}
pom "<plugin><groupId>dev.mesolint</groupId><artifactId>mesolint-maven-plugin</artifactId><version>$version</version>
  <executions><execution><phase>validate</phase><goals><goal>check</goal></goals></execution></executions></plugin>" \
  >"$work/with/pom.xml"
pom "" >"$work/bare/pom.xml"
mvn_=(mvn -B -q -o -Dstyle.color=never)
"${mvn_[@]}" -f "$work/with/pom.xml" validate >/dev/null # the first build checks; later ones find nothing changed
once() { /usr/bin/time -f "%e" -a -o "$1" "${@:2}" >/dev/null 2>&1; }
median() { sort -n "$1" | awk '{v[NR]=$1} END {if (NR % 2) print v[(NR+1)/2]; else printf "%.2f\n", (v[NR/2]+v[NR/2+1])/2}'; }
for _ in $(seq 1 "$runs"); do
  once "$work/t.bare" "${mvn_[@]}" -f "$work/bare/pom.xml" validate
  once "$work/t.empty" "${mvn_[@]}" -f "$work/with/pom.xml" validate -Dmesolint.skip=true
  once "$work/t.unchanged" "${mvn_[@]}" -f "$work/with/pom.xml" validate
done
replay_log="$(mvn -B -o -Dstyle.color=never -f "$work/with/pom.xml" validate 2>&1 || true)"
grep -q "nothing changed since the last build" <<<"$replay_log" \
  || echo "plugin: warning: the unchanged build was not replayed; the figures below are not of a replay" >&2
b=$(median "$work/t.bare"); e=$(median "$work/t.empty"); u=$(median "$work/t.unchanged")
echo "Maven plugin, $(ls "$work/with/programmes" | wc -l) programmes, $runs runs each (median wall s)"
printf "bare mvn validate %s, empty Mojo %s (+%s), unchanged build %s (+%s): overhead %sx the empty Mojo's\n" \
  "$b" "$e" "$(awk -v a="$e" -v b="$b" 'BEGIN {printf "%.2f", a - b}')" "$u" \
  "$(awk -v a="$u" -v b="$b" 'BEGIN {printf "%.2f", a - b}')" \
  "$(awk -v a="$u" -v e="$e" -v b="$b" 'BEGIN {printf "%.1f", (e - b > 0 ? (a - b) / (e - b) : 0)}')"
