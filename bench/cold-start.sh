#!/usr/bin/env bash
# Cold start of the desktop app on the demo database, in a virtual X display: time from the command
# (bin/shapetrail: the options in bin/jvm-options and class-data sharing) to the people list on screen,
# and the part of it from the JVM's own start. The first start records the class-data archive and is not
# counted. For comparison, a plain `java -jar`; and the self-contained image of the installer
# (target/installer/shapetrail, built here with -Pinstaller), whose archive is made at build time, so
# its first start counts and is compared with its later ones. Needs Debian's xvfb, libgtk-3-0, libxtst6,
# libxxf86vm1, libgl1.
set -euo pipefail
cd "$(dirname "$0")/.."
mvn -q -Pinstaller -DskipTests package > /dev/null
home=$(mktemp -d)
Xvfb :77 -screen 0 1600x1000x24 -nolisten tcp > /dev/null 2>&1 &
xvfb=$!
trap 'kill $xvfb; rm -rf "$home"' EXIT
sleep 1
export DISPLAY=:77 SHAPETRAIL_HOME="$home" JAVA_TOOL_OPTIONS="-Dshapetrail.startupProbe=true"
run() {
  cp sample-db/saltmarsh-bay.sqlite "$home/run.sqlite"
  local t0 line at
  t0=$(date +%s%3N)
  line=$("$@" --db "$home/run.sqlite" 2>/dev/null | grep "usable window")
  at=$(echo "$line" | sed 's/.*, at \([0-9]*\) ms since 1970/\1/')
  echo "$(( at - t0 )) ms from the command (${line%%, at*})"
}
run bin/shapetrail > /dev/null # records the archive
for n in 1 2 3 4 5; do
  echo "bin/shapetrail: $(run bin/shapetrail)"
done
for n in 1 2 3; do
  echo "java -jar:      $(run java -jar target/shapetrail.jar)"
done
for n in 1 2 3 4 5 6; do
  label="image, start $n:"
  [ "$n" = 1 ] && label="image, first:  "
  echo "$label $(run target/installer/shapetrail/bin/shapetrail)"
done
