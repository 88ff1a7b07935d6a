#!/usr/bin/env bash
# A newcomer's path on a fresh machine, as the README tells it: `mesolint init` in an empty folder, then `mvn verify`
# in it passes on the scaffold, fails once a programme is broken (a misspelt exercise), and passes again once fixed.
# Needs the plugin in the local Maven repository (`mvn install -DskipTests` of this project, done by .ci/run first).
set -euo pipefail
repo="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT
jar="$(ls "$repo"/cli/target/mesolint-cli-*-all.jar | head -n 1)"

java -jar "$jar" init "$work/club"
cd "$work/club"
sample=programmes/harbourside-starter.yaml

echo "newcomer: mvn verify on the scaffold (must pass)"
mvn -B -q -Dstyle.color=never verify

echo "newcomer: a misspelt exercise (must fail)"
sed -i 's/exercise: push-up/exercise: push-upp/' "$sample"
if mvn -B -q -Dstyle.color=never verify >"$work/broken.log" 2>&1; then
  echo "newcomer: FAILED: the build passed with a misspelt exercise"; cat "$work/broken.log"; exit 1
fi
grep -q "unknown-exercise: unknown exercise 'push-upp'" "$work/broken.log" || {
  echo "newcomer: FAILED: the build failed without naming the misspelt exercise"; cat "$work/broken.log"; exit 1; }
grep "unknown-exercise" "$work/broken.log" | head -n 2

echo "newcomer: fixed again (must pass)"
sed -i 's/exercise: push-upp/exercise: push-up/' "$sample"
mvn -B -q -Dstyle.color=never verify
echo "newcomer: OK: init, verify, broken, fixed"
