#!/usr/bin/env bash
# Times Shapetrail's CSV import of 1,000,000 trial rows against the sqlite3 shell's .import of the same
# CSV into a plain table, on this machine, five times in turn. Shapetrail is timed twice per round: the
# import itself inside a running JVM (what the app's import does; ImportBenchmark), and the whole command
# `bin/shapetrail import --commit` including the JVM's start. Both use the options in bin/jvm-options.
# Needs the sqlite3 shell (Debian: apt-get install sqlite3).
set -euo pipefail
cd "$(dirname "$0")/.."
work=$(mktemp -d)
mvn -q -DskipTests package
mvn -q test-compile
cp=$(mvn -q dependency:build-classpath -Dmdep.outputFile=/dev/stdout):target/classes:target/test-classes
java -cp "$cp" org.shapetrail.bench.ImportBenchmark --write "$work/trials.csv"
echo "CSV: $(wc -l < "$work/trials.csv") lines, $(du -h "$work/trials.csv" | cut -f1)"
# a first dry run records the commands' class-data archive (bin/shapetrail)
: > "$work/warm.sqlite" # an empty file is an empty Shapetrail file; --db must name an existing one
bin/shapetrail import --db "$work/warm.sqlite" --create-missing --show none "$work/trials.csv" > /dev/null
now() { date +%s.%N; }
ratios=()
for run in 1 2 3 4 5; do
  rm -f "$work/plain.db" "$work/cli.sqlite"*
  : > "$work/cli.sqlite"
  s0=$(now)
  sqlite3 "$work/plain.db" ".mode csv" ".import $work/trials.csv trials"
  s1=$(now)
  inside=$(java @bin/jvm-options -cp "$cp" org.shapetrail.bench.ImportBenchmark "$work/trials.csv" | awk '{print $(NF-1)}')
  c0=$(now)
  bin/shapetrail import --db "$work/cli.sqlite" --commit --create-missing --show none "$work/trials.csv" > /dev/null
  c1=$(now)
  sq=$(echo "$s1 - $s0" | bc)
  cli=$(echo "$c1 - $c0" | bc)
  ratio=$(echo "scale=2; $inside / $sq" | bc)
  ratios+=("$ratio")
  printf 'run %d: sqlite3 .import %.2f s; Shapetrail import %.2f s (ratio %s); whole command with JVM start %.2f s (ratio %.2f)\n' \
    "$run" "$sq" "$inside" "$ratio" "$cli" "$(echo "scale=2; $cli / $sq" | bc)"
done
printf 'median ratio of the import: %s\n' "$(printf '%s\n' "${ratios[@]}" | sort -n | sed -n 3p)"
java @bin/jvm-options -cp "$cp" org.shapetrail.bench.ImportBenchmark "$work/trials.csv" --two-steps | tail -1
rm -rf "$work"
