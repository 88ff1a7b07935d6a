#!/usr/bin/env bash
# A CI job for this repository: any CI service that runs a shell step with Java 17 and Maven can run it.
# It fails (exit 1) when a programme breaks the rules and writes the reports to target/mesolint/ for the job's
# test view (TEST-mesolint.xml) and code-scanning upload (mesolint.sarif).
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."
status=0
mvn -B verify || status=$?
mvn -B -q mesolint:report || true
exit $status
