#!/usr/bin/env bash
# Calibration of the noise verdicts by simulation: false-positive rate over 20,000 no-change pairs with its
# Clopper-Pearson interval, and the power for known true changes. Prints the table of
# docs/decisions/0002-noise-model.md. A 10,000-pair check runs in `mvn -B verify` (VerdictCalibrationTest).
set -euo pipefail
cd "$(dirname "$0")/.."
mvn -q test-compile
cp=$(mvn -q dependency:build-classpath -Dmdep.outputFile=/dev/stdout):target/classes:target/test-classes
java -cp "$cp" org.shapetrail.reliability.VerdictCalibration "${1:-20000}"
