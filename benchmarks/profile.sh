#!/usr/bin/env bash
# Where the time of a check goes: runs `mesolint check` over a benchmark corpus under Java Flight Recorder and
# prints the share of CPU samples per phase, each sample charged to its innermost non-JDK frame.
# Usage: benchmarks/profile.sh [CORPUS_DIR]   (default: the finding-heavy corpus that benchmarks/run.sh writes)
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
corpus="${1:-$here/benchmarks/target/corpus/heavy}"
[ -d "$corpus" ] || { echo "profile: no corpus at $corpus (run benchmarks/run.sh --quick first)" >&2; exit 2; }
jar="$here/cli/target/mesolint-cli-0.1.0-SNAPSHOT-all.jar"
rec="$(mktemp -d)/check.jfr"
java -XX:StartFlightRecording=filename="$rec",settings=profile -Xlog:jfr=off -jar "$jar" check "$corpus" \
    >/dev/null 2>&1 || true
jfr print --events jdk.ExecutionSample --stack-depth 64 "$rec" | awk '
  /stackTrace = \[/ { inside = 1; charged = 0; next }
  inside && /^[[:space:]]*\]/ { if (!charged) bucket["JDK only (GC, JIT, class loading)"]++; inside = 0; total++; next }
  inside && !charged {
    frame = $1
    if (frame ~ /^(java|jdk|sun|com\.sun)\./) next
    if (frame ~ /^org\.yaml\.snakeyaml\./) phase = "YAML parse (SnakeYAML)"
    else if (frame ~ /^dev\.mesolint\.core\.yaml\./) phase = "YAML to located tree"
    else if (frame ~ /^(com\.networknt|tools\.jackson|com\.fasterxml)\./) phase = "schema validation"
    else if (frame ~ /^dev\.mesolint\.core\.(format|value|programme)\./) phase = "binding and expansion"
    else if (frame ~ /^dev\.mesolint\.core\.model\./) phase = "training model"
    else if (frame ~ /^dev\.mesolint\.core\.(rules|rule|finding)\./) phase = "rules and findings"
    else if (frame ~ /^dev\.mesolint\.core\.report\./) phase = "reports"
    else if (frame ~ /^dev\.mesolint\./) phase = "engine and other mesolint code"
    else phase = "other libraries"
    bucket[phase]++; charged = 1
  }
  END {
    printf "%d CPU samples\n", total
    for (p in bucket) printf "%5.1f%%  %s\n", 100 * bucket[p] / total, p | "sort -rn"
  }'
