#!/usr/bin/env bash
# Cold start of the desktop app on the demo database, in a real (virtual) X display: time from JVM
# start to the people list on screen. Needs Debian's xvfb, xauth, libgtk-3-0, libxtst6, libxxf86vm1, libgl1.
set -euo pipefail
cd "$(dirname "$0")/.."
mvn -q -DskipTests package
home=$(mktemp -d)
for run in 1 2 3 4 5; do
  cp sample-db/saltmarsh-bay.sqlite "$home/run$run.sqlite"
  SHAPETRAIL_HOME="$home" xvfb-run -a java -Dshapetrail.startupProbe=true -jar target/shapetrail.jar \
    --db "$home/run$run.sqlite" 2>/dev/null | grep "usable window"
done
rm -rf "$home"
