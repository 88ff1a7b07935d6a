#!/usr/bin/env bash
# Runs the command line against hostile and unlucky inputs and prints one table row per case:
# what was expected, the exit code, whether a stack trace or a raw control character reached the output, whether a
# file went unreported, whether the run hung, and whether anything outside the repository was quoted back.
# Everything happens in a temporary folder this script creates; a temp file stands in for "outside the root".
# Usage: scripts/hostile-inputs.sh            (builds the jar through ./mesolint when needed)
set -uo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
jar="${MESOLINT_JAR:-$here/cli/target/mesolint-cli-0.1.0-SNAPSHOT-all.jar}"   # MESOLINT_JAR: compare another build
[ -n "${MESOLINT_JAR:-}" ] || "$here/mesolint" --version >/dev/null || exit 2
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT
samples="$here/sample-programs"
secret="SECRET-LINE-7f3a"   # the content of the file that stands in for "outside the root"

printf '%-34s %-8s %-5s %-6s %-7s %-5s %-5s %-6s %s\n' case expect exit crash raw-ctl lost hang leak verdict
total=0; bad=0

# run NAME EXPECTED-EXIT REQUIRED-TEXT ROOT ARGS... : runs java in ROOT with a 40 s limit and a 256 MB heap.
run() {
  local name="$1" expect="$2" needle="$3" root="$4"; shift 4
  local out="$work/$name.out" crash=no raw=no lost=no hang=no leak=no verdict=ok
  (cd "$root" && timeout 40 java -Xmx256m -XX:TieredStopAtLevel=1 -jar "$jar" "$@" --fail-on warning >"$out" 2>&1)
  local rc=$?
  [ "$rc" = 124 ] && hang=yes
  grep -qE '^\s+at [a-z]+\.|Exception in thread|OutOfMemoryError|internal-error' "$out" && crash=yes
  LC_ALL=C grep -qP '[\x00-\x08\x0b\x0c\x0e-\x1f\x7f]' "$out" && raw=yes
  grep -qE '^forged\.yaml:1:1: error' "$out" && raw=yes
  [ -n "$needle" ] && ! grep -qF -- "$needle" "$out" && lost=yes
  grep -qF "$secret" "$out" && leak=yes
  if [ "$rc" != "$expect" ] || [ $crash$raw$lost$hang$leak != nonononono ]; then verdict=FAIL; bad=$((bad+1)); fi
  total=$((total+1))
  printf '%-34s %-8s %-5s %-6s %-7s %-5s %-5s %-6s %s\n' "$name" "$expect" "$rc" $crash $raw $lost $hang $leak $verdict
}

# A minimal valid programme; $1 is the title, $2 extra text after the first set's rest.
prog() {
  cat <<EOF
format: 1
programme: {id: harbour-hostile, title: "$1", level: intermediate, goal: hypertrophy, session-minutes: 60, units: kg}
weeks:
  - week: 1
    sessions:
      - day: 1
        name: Upper
        work:
          - {exercise: barbell-bench-press, sets: 3, reps: 8, rir: 2, rest: 3min$2}
EOF
}

# 1. A start path that is a link to a folder holding a programme with an error.
r="$work/link-start"; mkdir -p "$r/real"; cp "$samples/broken/short-rest-compound.yaml" "$r/real/"; ln -s real "$r/link"
run link-start-path 1 "short-rest-compound" "$r" check link
# 2. A link inside the root to a folder outside it (as a Maven module's programmes -> ../real-programmes).
r="$work/link-out/repo"; mkdir -p "$r" "$work/link-out/real"; cp "$samples/broken/short-rest-compound.yaml" "$work/link-out/real/"
ln -s ../real "$r/programmes"
run link-folder-outside-root 1 "outside the repository" "$r" check .
# 3. An empty folder.
r="$work/empty"; mkdir -p "$r/programmes"
run empty-folder 2 "no programme" "$r" check programmes
# 4. A hidden programme file named on the command line.
r="$work/hidden"; mkdir -p "$r"; cp "$samples/broken/short-rest-compound.yaml" "$r/.a.yaml"
run hidden-file-named 1 "short-rest-compound" "$r" check .a.yaml
# 5. A file that does not end in .yaml named on the command line.
r="$work/txt"; mkdir -p "$r"; cp "$samples/broken/short-rest-compound.yaml" "$r/a.yaml.txt"
run non-yaml-file-named 1 "a.yaml.txt" "$r" check a.yaml.txt
# 6. A FIFO, a dangling link and a link to a file outside the root, each ending in .yaml, inside a folder.
r="$work/odd/repo"; mkdir -p "$r/p"; cp "$samples/programmes/novice-full-body.yaml" "$r/p/"
mkfifo "$r/p/pipe.yaml"; ln -s missing.yaml "$r/p/dangling.yaml"
printf 'format: 1\n%s: x\n' "$secret" > "$work/odd/outside.yaml"; ln -s ../../outside.yaml "$r/p/secret.yaml"
run fifo-in-folder 1 "pipe.yaml" "$r" check p
run dangling-link-in-folder 1 "dangling.yaml" "$r" check p
run link-outside-root-in-folder 1 "secret.yaml" "$r" check p
# 7. Week bounds after repeat/adjust: 103 weeks of repeat: k-1, adjust: {sets: 19}.
r="$work/grow"; mkdir -p "$r"
{ prog "Growth" ""; for k in $(seq 2 104); do printf '  - {week: %d, repeat: %d, adjust: {sets: 19}}\n' "$k" $((k-1)); done; } > "$r/grow.yaml"
cp "$samples/programmes/novice-full-body.yaml" "$r/"
run repeat-adjust-growth 1 "grow.yaml:10:41: error schema: week 2 repeats week 1" "$r" check . --report json=out.json
# 8. Numbers at or above 1e19 and out-of-range ranges.
r="$work/numbers"; mkdir -p "$r"
for key in week sets day reps repeat; do
  prog "Numbers" "" | sed "s/\\b$key: [0-9]*/$key: 10000000000000000000/" > "$r/$key-1e19.yaml"
done
prog "Numbers" "" | sed 's/reps: 8/reps: 1-2147483648/' > "$r/reps-range.yaml"
prog "Numbers" "" | sed 's/sets: 3/sets: 99999999999999999999/' > "$r/sets-20-digits.yaml"
run huge-numbers 1 "out of range" "$r" check .
# 9. A lone surrogate in a title: every report written, the JSON parses.
r="$work/surrogate"; mkdir -p "$r"; prog 'x \ud800 y' ", rest: 60s" | sed 's/, rest: 60s//' > "$r/s.yaml"
sed -i 's/rest: 3min/rest: 60s/' "$r/s.yaml"
run lone-surrogate-reports 1 "short-rest-compound" "$r" check s.yaml --report json=a.json --report sarif=a.sarif \
  --report junit=a.xml --report html=a.html
if [ -s "$r/a.json" ] && python3 -c 'import json,sys; json.load(open(sys.argv[1]))' "$r/a.json" 2>/dev/null && [ -s "$r/a.html" ]; then
  echo "    lone-surrogate: reports written and JSON parses"
else echo "    lone-surrogate: a report is missing or the JSON does not parse"; bad=$((bad+1)); fi
# 10. Configured paths outside the root; a FIFO and an oversized file as catalogues.
r="$work/conf/repo"; mkdir -p "$r"; cp "$samples/programmes/novice-full-body.yaml" "$r/"
printf 'catalogues: [../outside.yaml]\n' > "$r/.mesolint.yaml"; printf '%s: 1\n' "$secret" > "$work/conf/outside.yaml"
run config-path-outside-root 2 "outside the repository" "$r" check .
r="$work/fifo-cat"; mkdir -p "$r"; cp "$samples/programmes/novice-full-body.yaml" "$r/"; mkfifo "$r/cat.yaml"
printf 'catalogues: [cat.yaml]\n' > "$r/.mesolint.yaml"
run fifo-catalogue 1 "named pipe" "$r" check novice-full-body.yaml
r="$work/big-cat"; mkdir -p "$r"; cp "$samples/programmes/novice-full-body.yaml" "$r/"
head -c 60000000 /dev/zero | tr '\0' '#' > "$r/cat.yaml"; printf 'catalogues: [cat.yaml]\n' > "$r/.mesolint.yaml"
run oversized-catalogue 1 "cat.yaml" "$r" check novice-full-body.yaml
# 11. A link at the report path: replaced, its target untouched.
r="$work/report-link"; mkdir -p "$r"; cp "$samples/programmes/novice-full-body.yaml" "$r/"
echo keep > "$r/victim.txt"; ln -s victim.txt "$r/out.json"
run report-path-is-link 0 "" "$r" check novice-full-body.yaml --report json=out.json
if [ "$(cat "$r/victim.txt")" != keep ] || [ -L "$r/out.json" ]; then echo "    report-path-is-link: the link was followed"; bad=$((bad+1)); fi
# 12. Two runs writing one report path at once, 6 times.
r="$work/race"; mkdir -p "$r"; cp "$samples/programmes/"*.yaml "$r/"; broken=0
for i in 1 2 3 4 5 6; do
  (cd "$r" && java -XX:TieredStopAtLevel=1 -jar "$jar" check . --report json=out.json >/dev/null 2>&1 &
   java -XX:TieredStopAtLevel=1 -jar "$jar" check . --report json=out.json >/dev/null 2>&1; wait)
  python3 -c 'import json,sys; json.load(open(sys.argv[1]))' "$r/out.json" 2>/dev/null || broken=$((broken+1))
done
echo "    concurrent-report-writes: $broken of 6 left invalid JSON"; [ $broken = 0 ] || bad=$((bad+1))
# 13. Log forging: a newline in a file name and ESC/BEL/OSC in a session name.
r="$work/forge"; mkdir -p "$r"
prog "Forge" "" | sed 's/rest: 3min/rest: 60s/' > "$r/$(printf 'x.yaml\nforged.yaml:1:1: error fake: injected\ny.yaml')"
run newline-in-file-name 1 'x.yaml\n' "$r" check .
r="$work/esc"; mkdir -p "$r"
prog "Esc" "" | sed 's/rest: 3min/rest: 60s/; s/name: Upper/name: "Up\\e[31mper\\a\\e]0;pwned\\a"/' > "$r/e.yaml"
run escape-in-session-name 1 '\e' "$r" check .
# 14. A 1.9 MB exercise id: ids are at most 80 characters, so one located schema error, at once.
r="$work/long-id"; mkdir -p "$r"; prog "Long" "" | python3 -c 'import sys; print(sys.stdin.read().replace("barbell-bench-press", "a" * 1900000))' > "$r/l.yaml"
run long-exercise-id 1 "must be at most 80 characters" "$r" check .
# 15. A folder that cannot be walked (a link loop) next to a good programme.
r="$work/loop"; mkdir -p "$r/p/sub"; cp "$samples/broken/short-rest-compound.yaml" "$r/p/"; ln -s .. "$r/p/sub/up"
run folder-link-loop 1 "short-rest-compound" "$r" check p
# 16. UTF-16 with a BOM.
r="$work/utf16"; mkdir -p "$r"; prog "Wide" "" | sed 's/rest: 3min/rest: 60s/' | iconv -f UTF-8 -t UTF-16 > "$r/w.yaml"
run utf16-bom 1 "short-rest-compound" "$r" check .
# 17. Absolute checkout path in SARIF.
r="$work/sarif"; mkdir -p "$r"; cp "$samples/broken/short-rest-compound.yaml" "$r/"
run sarif-paths 1 "" "$r" check . --report sarif=out.sarif
if grep -qF "$r" "$r/out.sarif"; then echo "    sarif-paths: the SARIF records the absolute checkout path"; bad=$((bad+1)); fi
# 18. Athlete-constraint reasons stay out of SARIF and JSON by default.
r="$work/reasons"; mkdir -p "$r"; cp "$samples/broken/constraint-avoid.yaml" "$r/"
run constraint-reasons 1 "constraint-avoid" "$r" check . --report sarif=out.sarif --report json=out.json
reason="$(grep -m1 -A0 'reason:' "$samples/broken/constraint-avoid.yaml" | sed 's/.*reason: *//; s/^"//; s/"$//' | cut -c1-25)"
if [ -n "$reason" ] && grep -qF "$reason" "$r/out.sarif" "$r/out.json"; then echo "    constraint-reasons: a reason reached SARIF or JSON"; bad=$((bad+1)); fi
# 19. A damaged result cache: a cached finding's rule id edited in place (checksum not). The run must find it again.
r="$work/cache"; mkdir -p "$r/programmes"; cp "$samples/broken/short-rest-compound.yaml" "$r/programmes/"
run cache-first-run 1 "warning short-rest-compound" "$r" check programmes --cache --cache-location cache.json
sed -i 's/"short-rest-compound"/"short-rest-compounX"/' "$r/cache.json"
run cache-edited-entry 1 "warning short-rest-compound" "$r" check programmes --cache --cache-location cache.json
if grep -q 'short-rest-compounX' "$work/cache-edited-entry.out"; then echo "    cache-edited-entry: the edited entry was trusted"; bad=$((bad+1)); fi
# 20. mesolint's own files among the programmes: checked as what they are, never as programmes, never skipped.
r="$work/own"; mkdir -p "$r/programmes/rehab"; cp "$samples/broken/short-rest-compound.yaml" "$r/programmes/"
printf 'profile: club-hypertrophy\nextends: hypertrophy\n' >"$r/programmes/club-profile.yaml"
printf 'fail-levl: warning\n' >"$r/programmes/rehab/.mesolint.yaml"
run own-files-in-folder 1 "rehab/.mesolint.yaml:1:1: error schema" "$r" check programmes
if grep -q "club-profile.yaml:.*missing 'format'" "$work/own-files-in-folder.out"; then echo "    own-files-in-folder: a profile was checked as a programme"; bad=$((bad+1)); fi

echo "cases: $total command runs (+5 file checks); failing: $bad"
[ "$bad" = 0 ]
