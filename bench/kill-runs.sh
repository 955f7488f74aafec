#!/usr/bin/env bash
# Crash safety: 100 runs (20 for each of import, visit save, erase, restore and migration) that start a
# writer in its own JVM and kill it with SIGKILL at a random moment of its operation, then check the file:
# PRAGMA integrity_check, only whole visits, and the content exactly the state before or after. Prints
# the table of docs/reliability.md. The quick subset runs in `mvn -B verify` (KillRunsTest).
set -euo pipefail
cd "$(dirname "$0")/.."
mvn -q test-compile
cp=$(mvn -q dependency:build-classpath -Dmdep.outputFile=/dev/stdout):target/classes:target/test-classes
java -cp "$cp" org.shapetrail.reliability.KillRuns "${1:-20}"
