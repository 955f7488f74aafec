#!/usr/bin/env bash
# The installer's checks (issue: install it like any desktop program), run by .ci/run after the tests:
#  1. build the self-contained image and the Debian package (mvn -B -Pinstaller -DskipTests package);
#  2. the image's command-line launcher, with no java on the PATH (an empty PATH plus the image's own bin
#     folder), gives the same --version and `rate` output as the jar;
#  3. the .deb installs (as root), `shapetrail --version` works from the PATH, the installed app opens
#     headless (Xvfb) as far as the people list (the start-up probe), its class-data archive is usable;
#  4. the package removes cleanly: its files are gone, the user's data folder is kept.
# Needs root for step 3 and 4 (apt-get); .ci/run installs xvfb itself, the package's own dependencies
# come with it through apt-get.
set -euo pipefail
cd "$(dirname "$0")/../.."
say() { printf '\n== %s\n' "$*"; }
fail() { echo "INSTALLER CHECK FAILED: $*" >&2; exit 1; }
as_root() { if [ "$(id -u)" = 0 ]; then "$@"; else sudo -n "$@"; fi; }

say "building the image and the package"
mvn -B -q -Pinstaller -DskipTests package
image=target/installer/shapetrail
deb=$(ls target/installer/shapetrail_*_amd64.deb)
du -sh "$image" "$image/lib/runtime" "$deb"

say "the image's launcher with no java on the PATH"
work=$(mktemp -d)
installed_here=no
cleanup() {
    # on a failure half-way, the package is not left behind on the machine
    if [ "$installed_here" = yes ] && dpkg-query -W -f='${Status}' shapetrail 2>/dev/null | grep -q "ok installed"; then
        as_root env DEBIAN_FRONTEND=noninteractive apt-get remove -y -q shapetrail > /dev/null 2>&1 || true
    fi
    rm -rf "$work"
}
trap cleanup EXIT
jar_version=$(java -jar target/shapetrail.jar --version)
img_version=$(env -i HOME="$work" PATH="$PWD/$image/bin" shapetrail --version)
[ "$jar_version" = "$img_version" ] || fail "--version: jar '$jar_version', image '$img_version'"
echo "--version: $img_version (same as the jar)"
set +e
java -jar target/shapetrail.jar rate packaging/check/rate-two.csv > "$work/jar.csv"; jar_rc=$?
env -i HOME="$work" PATH="$PWD/$image/bin" shapetrail rate packaging/check/rate-two.csv > "$work/image.csv"; img_rc=$?
set -e
[ "$jar_rc" = "$img_rc" ] || fail "rate exit code: jar $jar_rc, image $img_rc"
cmp "$work/jar.csv" "$work/image.csv" || fail "rate output differs between the jar and the image"
echo "rate: same $(wc -l < "$work/image.csv") lines and exit code $img_rc as the jar"
grep -q "metres" "$work/image.csv" || fail "rate did not report the stature given in metres"
if [ -n "${SHAPETRAIL_TEST_PG:-}" ]; then
    # the image's trimmed runtime reaches a server too (the driver, Flyway, SCRAM): a fresh schema, the
    # sample academy imported into it by the image, and the same people list as the jar reads there
    sep='?'; case "$SHAPETRAIL_TEST_PG" in *\?*) sep='&';; esac
    uri="$SHAPETRAIL_TEST_PG${sep}currentSchema=image_check_$$"
    java -jar target/shapetrail.jar export trials --db sample-db/saltmarsh-bay.sqlite --out "$work/trials.csv" > /dev/null
    env -i HOME="$work" PATH="$PWD/$image/bin" PGPASSWORD="${PGPASSWORD:-}" shapetrail import --db "$uri" --commit \
        --create-missing --show none "$work/trials.csv" > /dev/null || fail "the image could not import into the server"
    env -i HOME="$work" PATH="$PWD/$image/bin" PGPASSWORD="${PGPASSWORD:-}" shapetrail people --db "$uri" > "$work/image-people.txt"
    java -jar target/shapetrail.jar people --db "$uri" > "$work/jar-people.txt"
    cmp "$work/jar-people.txt" "$work/image-people.txt" || fail "people on the server differ between the jar and the image"
    echo "server: the image imported $(($(wc -l < "$work/image-people.txt") - 1)) people into a fresh schema and lists them as the jar does"
fi

say "installing the package"
installed_here=yes
as_root env DEBIAN_FRONTEND=noninteractive apt-get install -y -q "./$deb" > "$work/apt-install.log" 2>&1 \
    || { tail -30 "$work/apt-install.log"; fail "apt-get install"; }
[ "$(command -v shapetrail)" = /usr/bin/shapetrail ] || fail "shapetrail is not on the PATH"
installed_version=$(shapetrail --version)
[ "$installed_version" = "$jar_version" ] || fail "installed --version '$installed_version'"
echo "shapetrail --version from the PATH: $installed_version"
[ -f /usr/share/applications/shapetrail-shapetrail.desktop ] || fail "no desktop entry"
grep -q '^Exec=/opt/shapetrail/bin/shapetrail %f$' /usr/share/applications/shapetrail-shapetrail.desktop \
    || fail "the desktop entry does not pass the double-clicked file"
grep -q 'application/x-shapetrail' /usr/share/mime/packages/*.xml || fail "no MIME type for the academy file"
# the archive the package recorded for its own paths is usable (-Xshare:on refuses to start otherwise)
/opt/shapetrail/lib/runtime/bin/java -XX:+UseSerialGC -XX:TieredStopAtLevel=1 -Xshare:on \
    -XX:SharedArchiveFile=/opt/shapetrail/lib/app/shapetrail.jsa -cp /opt/shapetrail/lib/app/shapetrail.jar \
    org.shapetrail.app.Launcher --version > /dev/null || fail "the installed class-data archive is not usable"
echo "class-data archive usable"

say "the installed app, headless, as far as the people list"
home="$work/user"
mkdir -p "$home"
probe=$(HOME="$home" SHAPETRAIL_HOME="$home/data" JAVA_TOOL_OPTIONS=-Dshapetrail.startupProbe=true \
    timeout 120 xvfb-run -a -s "-screen 0 1600x1000x24" shapetrail 2>"$work/app.err" | grep "usable window" || true)
[ -n "$probe" ] || { cat "$work/app.err"; fail "the installed app did not reach the people list"; }
echo "$probe"
[ -s "$home/data/shapetrail.sqlite" ] || fail "the first run did not make the user's file"

say "removing the package"
as_root env DEBIAN_FRONTEND=noninteractive apt-get remove -y -q shapetrail > "$work/apt-remove.log" 2>&1 \
    || { tail -30 "$work/apt-remove.log"; fail "apt-get remove"; }
for gone in /opt/shapetrail /usr/bin/shapetrail /usr/share/applications/shapetrail-shapetrail.desktop; do
    [ ! -e "$gone" ] || fail "$gone is still there after removal"
done
dpkg-query -W -f='${Status}' shapetrail 2>/dev/null | grep -q "ok installed" && fail "the package is still installed"
[ -s "$home/data/shapetrail.sqlite" ] || fail "removal touched the user's data folder"
echo "files gone; the user's data folder kept"
say "installer checks passed"
