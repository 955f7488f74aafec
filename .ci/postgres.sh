# Sourced by .ci/run: a throwaway PostgreSQL cluster for the server tests, from Debian's packages, on
# loopback only (127.0.0.1, a free port), its data under target/, run as the postgres user (PostgreSQL
# refuses to run as root), and stopped at the end, also on failure (the caller's EXIT trap).
#
# pg_up      installs postgresql if missing, starts the cluster, makes the test database and its owner,
#            and exports SHAPETRAIL_TEST_PG (the URI the tests connect to) and PGPASSWORD
# pg_down    stops the cluster and removes its data

pg_as() { # run as the postgres user, from a folder it may enter
    if [ "$(id -u)" = 0 ]; then (cd / && runuser -u postgres -- "$@"); else (cd / && sudo -n -u postgres "$@"); fi
}

pg_free_port() {
    local p
    for p in $(shuf -i 20000-40000 -n 40); do
        if ! (exec 3<>"/dev/tcp/127.0.0.1/$p") 2> /dev/null; then
            echo "$p"
            return 0
        fi
    done
    echo "no free port found on 127.0.0.1" >&2
    return 1
}

pg_up() {
    if ! ls /usr/lib/postgresql/*/bin/initdb > /dev/null 2>&1; then
        as_root apt-get update -q > /dev/null
        as_root env DEBIAN_FRONTEND=noninteractive apt-get install -y -q postgresql > /dev/null
    fi
    PG_BIN=$(ls -d /usr/lib/postgresql/*/bin | sort -V | tail -1)
    PG_DIR="$PWD/target/ci-postgres"
    rm -rf "$PG_DIR"
    mkdir -p "$PG_DIR"
    chmod 755 "$PWD" "$PWD/target" 2> /dev/null || true
    as_root chown postgres "$PG_DIR"
    PG_PORT=$(pg_free_port)
    local super_pw test_pw
    super_pw=$(head -c 18 /dev/urandom | base64 | tr -d '/+=')
    test_pw=$(head -c 18 /dev/urandom | base64 | tr -d '/+=')
    echo "$super_pw" > "$PG_DIR/superuser.pw"
    as_root chown postgres "$PG_DIR/superuser.pw"
    chmod 600 "$PG_DIR/superuser.pw"
    pg_as "$PG_BIN/initdb" -D "$PG_DIR/data" -U postgres --pwfile="$PG_DIR/superuser.pw" \
        --auth-local=peer --auth-host=scram-sha-256 -E UTF8 --locale=C.UTF-8 > "$PG_DIR/initdb.log" 2>&1 \
        || { cat "$PG_DIR/initdb.log"; return 1; }
    # loopback only; the socket in the cluster's own folder, not in /var/run
    pg_as "$PG_BIN/pg_ctl" -D "$PG_DIR/data" -l "$PG_DIR/server.log" -w -t 60 \
        -o "-c listen_addresses=127.0.0.1 -p $PG_PORT -k $PG_DIR/data -c fsync=off" start > /dev/null \
        || { cat "$PG_DIR/server.log"; return 1; }
    PG_STARTED=yes
    PGPASSWORD="$super_pw" "$PG_BIN/psql" -q -v ON_ERROR_STOP=1 -h 127.0.0.1 -p "$PG_PORT" -U postgres -d postgres \
        -c "CREATE ROLE shapetrail_ci LOGIN CREATEROLE PASSWORD '$test_pw'" \
        -c "CREATE DATABASE shapetrail_ci OWNER shapetrail_ci" > /dev/null
    export SHAPETRAIL_TEST_PG="postgresql://shapetrail_ci@127.0.0.1:$PG_PORT/shapetrail_ci"
    export PGPASSWORD="$test_pw"
    echo "PostgreSQL $("$PG_BIN/postgres" --version | awk '{print $3}') on 127.0.0.1:$PG_PORT, data in $PG_DIR/data"
}

pg_down() {
    if [ "${PG_STARTED:-}" = yes ]; then
        pg_as "$PG_BIN/pg_ctl" -D "$PG_DIR/data" -m fast -w stop > /dev/null 2>&1 || true
        PG_STARTED=
    fi
    [ -n "${PG_DIR:-}" ] && rm -rf "$PG_DIR"
}
