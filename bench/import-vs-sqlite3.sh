#!/usr/bin/env bash
# Times Shapetrail's CSV import of 1,000,000 trial rows against the sqlite3 shell's .import of the same
# CSV into a plain table, on this machine. Needs the sqlite3 shell (Debian: apt-get install sqlite3).
set -euo pipefail
cd "$(dirname "$0")/.."
work=$(mktemp -d)
mvn -q test-compile
cp=$(mvn -q dependency:build-classpath -Dmdep.outputFile=/dev/stdout):target/classes:target/test-classes
java -cp "$cp" org.shapetrail.bench.ImportBenchmark --write "$work/trials.csv"
echo "CSV: $(wc -l < "$work/trials.csv") lines, $(du -h "$work/trials.csv" | cut -f1)"
for run in 1 2 3; do
  rm -f "$work/plain.db"
  s0=$(date +%s.%N)
  sqlite3 "$work/plain.db" ".mode csv" ".import $work/trials.csv trials"
  s1=$(date +%s.%N)
  echo "sqlite3 .import: $(echo "$s1 - $s0" | bc) s"
  java -cp "$cp" org.shapetrail.bench.ImportBenchmark "$work/trials.csv"
done
rm -rf "$work"
