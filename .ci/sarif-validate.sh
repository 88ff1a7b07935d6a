#!/usr/bin/env bash
# Validates the SARIF that mesolint writes for the sample programmes with the SARIF multitool's `validate`
# command (schema plus the SARIF1xxx/2xxx rules). Installs the multitool from npm when absent. Prints the tool's
# summary and exits non-zero when any file has an error-level result or the tool itself reports an error.
#
#   bash .ci/sarif-validate.sh            # from the repository root; builds the CLI when its jar is missing
#
# Environment: MESOLINT_SARIF_TOOL_DIR (npm prefix for the multitool, default ~/.cache/mesolint/sarif-multitool),
#              MESOLINT_SARIF_TOOL_VERSION (default 5.7.0). The OASIS schema ships in the same package as
#              sarif-2.1.0.json; its path is printed for the unit test (-Dmesolint.sarifSchema=...).
set -euo pipefail

repo="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$repo"
tool_dir="${MESOLINT_SARIF_TOOL_DIR:-$HOME/.cache/mesolint/sarif-multitool}"
tool_version="${MESOLINT_SARIF_TOOL_VERSION:-5.7.0}"
package_dir="$tool_dir/node_modules/@microsoft/sarif-multitool-linux"
multitool="$package_dir/Sarif.Multitool"
out="$repo/target/sarif-validate"

if [[ ! -f "$multitool" ]]; then
  echo "sarif-validate: installing @microsoft/sarif-multitool-linux@$tool_version into $tool_dir"
  mkdir -p "$tool_dir"
  npm install --prefix "$tool_dir" --no-audit --no-fund --loglevel=error \
    "@microsoft/sarif-multitool-linux@$tool_version"
fi
# npm may skip the package's install script, which only marks the binary executable.
chmod u+x "$multitool"
echo "sarif-validate: $("$multitool" --version 2>&1 | head -n 1)"
echo "sarif-validate: OASIS schema at $package_dir/sarif-2.1.0.json"

jar="$(ls cli/target/mesolint-cli-*-all.jar 2>/dev/null | head -n 1 || true)"
if [[ -z "$jar" ]]; then
  echo "sarif-validate: building the CLI"
  mvn -q -B -pl cli -am package -DskipTests
  jar="$(ls cli/target/mesolint-cli-*-all.jar | head -n 1)"
fi

rm -rf "$out"
mkdir -p "$out"
status=0
# The SARIF of `mesolint diff`: a throwaway git repository holding the clean samples, with one rest shortened in
# the work tree, so the log has a new finding (baselineState relative to the base revision) beside unchanged ones.
review="$out/review-repo"
mkdir -p "$review/programmes"
cp sample-programs/programmes/*.yaml "$review/programmes/"
printf 'root: true\n' >"$review/.mesolint.yaml"
git -C "$review" init -q -b main
git -C "$review" add -A
git -C "$review" -c user.name=ci -c user.email=ci@invalid commit -q -m "samples"
sed -i '0,/rest: 2min/s//rest: 75s/' "$review/programmes/upper-lower-hypertrophy.yaml"
code=0
(cd "$review" && java -jar "$repo/$jar" diff --base main --report "sarif=$out/review.sarif" programmes) \
  >"$out/review.console.txt" || code=$?
if [[ $code -gt 1 ]]; then
  echo "sarif-validate: mesolint diff failed (exit $code)"; cat "$out/review.console.txt"; status=1
fi
sets=(programmes broken review)
if [[ ! -f "$out/review.sarif" ]]; then
  echo "sarif-validate: mesolint diff wrote no SARIF"; cat "$out/review.console.txt"; status=1; sets=(programmes broken)
fi
for set in "${sets[@]}"; do
  sarif="$out/$set.sarif"
  # Exit 1 means findings (the broken samples have them by design); 2 is a usage or internal error.
  code=0
  if [[ $set != review ]]; then
    java -jar "$jar" check --root "$repo" "sample-programs/$set" --report "sarif=$sarif" >"$out/$set.console.txt" \
      || code=$?
  fi
  if [[ $code -gt 1 ]]; then
    echo "sarif-validate: mesolint failed on sample-programs/$set (exit $code)"
    cat "$out/$set.console.txt"
    status=1
    continue
  fi
  log="$out/$set.validation.sarif"
  echo "sarif-validate: validating $sarif"
  "$multitool" validate "$sarif" --config "$repo/.ci/sarif-validate.config.xml" \
    --level "Error;Warning;Note" --log ForceOverwrite -o "$log" | tee "$out/$set.validation.txt"
  summary="$(node -e '
    const log = JSON.parse(require("fs").readFileSync(process.argv[1], "utf8"));
    const counts = { error: 0, warning: 0, note: 0 };
    let toolErrors = 0;
    for (const run of log.runs) {
      for (const r of run.results || []) counts[r.level || "warning"] = (counts[r.level || "warning"] || 0) + 1;
      for (const inv of run.invocations || []) {
        for (const n of [...(inv.toolExecutionNotifications || []), ...(inv.toolConfigurationNotifications || [])]) {
          if (n.level === "error") toolErrors++;
        }
        if (inv.executionSuccessful === false) toolErrors++;
      }
    }
    console.log(`${counts.error} ${counts.warning} ${counts.note} ${toolErrors}`);
  ' "$log")"
  read -r errors warnings notes tool_errors <<<"$summary"
  echo "sarif-validate: $set.sarif: $errors errors, $warnings warnings, $notes notes, $tool_errors tool errors"
  if [[ $errors -ne 0 || $tool_errors -ne 0 ]]; then
    status=1
  fi
done

if [[ $status -eq 0 ]]; then
  echo "sarif-validate: OK: the SARIF of the sample programmes has no validation errors"
else
  echo "sarif-validate: FAILED"
fi
exit $status
