#!/usr/bin/env bash
# The server's benchmarks (docs/performance.md), on a throwaway PostgreSQL cluster of Debian's packages
# on 127.0.0.1 (the one .ci/run uses; run as root or with sudo): Shapetrail's import of the 1,000,000-row
# CSV into a record on the server against psql's \copy of the same CSV into a plain table, three rounds;
# then opening the sample academy from the server against opening it from a file.
set -euo pipefail
cd "$(dirname "$0")/.."
as_root() { if [ "$(id -u)" = 0 ]; then "$@"; else sudo -n "$@"; fi; }
. .ci/postgres.sh
trap pg_down EXIT
pg_up > /dev/null
mvn -q -DskipTests package
mvn -q test-compile
cp=$(mvn -q dependency:build-classpath -Dmdep.outputFile=/dev/stdout):target/classes:target/test-classes
work=$(mktemp -d)
java -cp "$cp" org.shapetrail.bench.ImportBenchmark --write "$work/trials.csv"
echo "CSV: $(wc -l < "$work/trials.csv") lines, $(du -h "$work/trials.csv" | cut -f1); $("$PG_BIN/postgres" --version)"
now() { date +%s.%N; }
for run in 1 2 3; do
  psql "$SHAPETRAIL_TEST_PG" -q -c "CREATE SCHEMA plain$run" \
    -c "CREATE TABLE plain$run.trials (name text, birth_date text, sex text, date text, time text, measurer text, site text, trial text, value text)"
  s0=$(now)
  psql "$SHAPETRAIL_TEST_PG" -q -c "\\copy plain$run.trials FROM '$work/trials.csv' WITH (FORMAT csv, HEADER true)"
  s1=$(now)
  inside=$(java @bin/jvm-options -cp "$cp" org.shapetrail.bench.ImportBenchmark --server \
    "$SHAPETRAIL_TEST_PG?currentSchema=import$run" "$work/trials.csv" | awk '{print $(NF-1)}')
  sq=$(echo "$s1 - $s0" | bc)
  printf 'run %d: psql \\copy %.2f s; Shapetrail import into the server %.2f s (ratio %.2f)\n' "$run" "$sq" "$inside" \
    "$(echo "scale=2; $inside / $sq" | bc)"
done
java @bin/jvm-options -cp "$cp" org.shapetrail.bench.OpenBenchmark "$SHAPETRAIL_TEST_PG?currentSchema=opening"
rm -rf "$work"
