#!/usr/bin/env bash
# Local services for development and tests, all on loopback with data under .data/:
#   PostgreSQL 15  127.0.0.1:54329  .data/pg      (databases tunnelwright, tunnelwright_test)
#   Redis          127.0.0.1:63790  .data/redis   (append-only, noeviction, as BullMQ needs)
#   SMTP fake      127.0.0.1:2525   .data/mail    (scripts/smtp-fake.ts)
#
# Usage: scripts/services.sh start|stop|status [pg] [redis] [smtp] [test-mail]
#   Without names: pg, redis and smtp. `test-mail` is a second SMTP fake for tests (2526, .data/test-mail).
#
# A server already running on our data folder is reused; a stale pid file is removed; a port held by some
# other program stops the script with a message naming the port and how to free it.
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
DATA="$ROOT/.data"
PG_BIN="${PG_BIN:-/usr/lib/postgresql/15/bin}"
PG_PORT="${TW_PG_PORT:-54329}"
PGDATA="$DATA/pg"
# .data/pg may link to a cluster kept outside the repository (see pg_prepare_dir); PostgreSQL gets the real path.
[ -L "$PGDATA" ] && PGDATA="$(readlink -f "$PGDATA")"
REDIS_PORT="${TW_REDIS_PORT:-63790}"
REDIS_DIR="$DATA/redis"
SMTP_PORT="${TW_SMTP_PORT:-2525}"
TEST_SMTP_PORT="${TW_TEST_SMTP_PORT:-2526}"

say() { printf '[services] %s\n' "$*"; }
fail() { printf '[services] ERROR: %s\n' "$*" >&2; exit 1; }

mkdir -p "$DATA"

is_root() { [ "$(id -u)" -eq 0 ]; }

# Runs a PostgreSQL binary as the postgres user when we are root (PostgreSQL refuses to run as root).
as_pg() {
  if is_root; then runuser -u postgres -- "$@"; else "$@"; fi
}

# Whether something listens on the given loopback TCP port.
port_in_use() {
  local port="$1"
  if command -v ss >/dev/null 2>&1; then
    ss -Hltn "sport = :$port" 2>/dev/null | grep -q .
  else
    (exec 3<>"/dev/tcp/127.0.0.1/$port") 2>/dev/null
  fi
}

port_taken_message() {
  local port="$1" what="$2"
  printf '[services] ERROR: port %s is taken by another program, so %s cannot start.\n' "$port" "$what" >&2
  if command -v ss >/dev/null 2>&1; then
    ss -Hltnp "sport = :$port" 2>/dev/null | sed 's/^/[services]   /' >&2 || true
  fi
  printf '[services]   See who holds it:  ss -ltnp '\''sport = :%s'\''\n' "$port" >&2
  printf '[services]   Free it:           fuser -k %s/tcp   (or stop that program)\n' "$port" >&2
  exit 1
}

# Whether the process with this pid is alive and its command line contains the given text.
pid_matches() {
  local pid="$1" needle="$2"
  [ -n "$pid" ] && [ -r "/proc/$pid/cmdline" ] && tr '\0' ' ' <"/proc/$pid/cmdline" | grep -q -- "$needle"
}

wait_for_port() {
  local port="$1" seconds="$2"
  for _ in $(seq 1 $((seconds * 10))); do
    port_in_use "$port" && return 0
    sleep 0.1
  done
  return 1
}

# ---------------------------------------------------------------- PostgreSQL

pg_running() { as_pg "$PG_BIN/pg_ctl" -D "$PGDATA" status >/dev/null 2>&1; }

pg_prepare_dir() {
  if is_root && [ ! -e "$PGDATA" ] && ! runuser -u postgres -- test -x "$DATA"; then
    # The repository sits below a folder the postgres user may not enter (e.g. /root): keep the cluster
    # in a folder of its own outside and point .data/pg at it, so every other path stays the same.
    local outside
    outside="/var/tmp/tunnelwright-pg-$(printf '%s' "$ROOT" | sha256sum | cut -c1-12)"
    say "PostgreSQL: the postgres user cannot enter $DATA; keeping the cluster in $outside (linked as .data/pg)"
    mkdir -p "$outside"
    ln -sfn "$outside" "$PGDATA"
    PGDATA="$outside"
  fi
  mkdir -p "$PGDATA"
  if is_root; then
    chown postgres "$PGDATA"
    chmod 700 "$PGDATA"
    if ! runuser -u postgres -- test -x "$PGDATA"; then
      fail "the postgres user cannot reach $PGDATA (a parent folder is not searchable by others). Remove .data/pg and start again, or clone the repository somewhere readable."
    fi
  fi
}

pg_create_databases() {
  local db
  for db in tunnelwright tunnelwright_test; do
    if [ "$(psql -h 127.0.0.1 -p "$PG_PORT" -U postgres -d postgres -tAc "SELECT 1 FROM pg_database WHERE datname = '$db'")" != "1" ]; then
      say "PostgreSQL: creating database $db"
      psql -h 127.0.0.1 -p "$PG_PORT" -U postgres -d postgres -qc "CREATE DATABASE $db" >/dev/null
    fi
  done
}

pg_start() {
  [ -x "$PG_BIN/pg_ctl" ] || fail "PostgreSQL 15 binaries not found in $PG_BIN. Run scripts/setup.sh (installs the Debian package postgresql)."
  cd /tmp # postgres must be able to read its working directory
  pg_prepare_dir
  if [ ! -f "$PGDATA/PG_VERSION" ]; then
    say "PostgreSQL: initialising a new cluster in $PGDATA"
    as_pg "$PG_BIN/initdb" -D "$PGDATA" -U postgres --auth=trust -E UTF8 --locale=C.UTF-8 >"$DATA/pg-initdb.log" 2>&1 \
      || { cat "$DATA/pg-initdb.log" >&2; fail "initdb failed (log: $DATA/pg-initdb.log)"; }
  fi
  if pg_running; then
    say "PostgreSQL: already running on our data folder (.data/pg), reusing it"
  else
    if [ -f "$PGDATA/postmaster.pid" ]; then
      say "PostgreSQL: removing stale pid file $PGDATA/postmaster.pid"
      rm -f "$PGDATA/postmaster.pid"
    fi
    port_in_use "$PG_PORT" && port_taken_message "$PG_PORT" "PostgreSQL"
    # A Unix socket path is limited to about 107 bytes; deep checkouts put the socket in /tmp instead.
    local socket_dir="$PGDATA"
    [ "${#socket_dir}" -gt 80 ] && socket_dir=/tmp
    say "PostgreSQL: starting on 127.0.0.1:$PG_PORT (log: .data/pg/log)"
    as_pg "$PG_BIN/pg_ctl" -D "$PGDATA" -l "$PGDATA/log" -w -t 30 \
      -o "-c listen_addresses=127.0.0.1 -p $PG_PORT -k $socket_dir" start >/dev/null \
      || { tail -20 "$PGDATA/log" >&2 || true; fail "PostgreSQL did not start (log: $PGDATA/log)"; }
  fi
  cd "$ROOT"
  pg_create_databases
}

pg_stop() {
  if pg_running; then
    say "PostgreSQL: stopping"
    (cd /tmp && as_pg "$PG_BIN/pg_ctl" -D "$PGDATA" -m fast -w -t 30 stop >/dev/null)
  else
    say "PostgreSQL: not running"
  fi
}

pg_status() {
  if pg_running; then say "PostgreSQL: running on 127.0.0.1:$PG_PORT (.data/pg)"; else say "PostgreSQL: stopped"; return 1; fi
}

# ---------------------------------------------------------------- Redis

redis_pid() { [ -f "$REDIS_DIR/redis.pid" ] && cat "$REDIS_DIR/redis.pid" || true; }

redis_running() { pid_matches "$(redis_pid)" "redis-server" && redis-cli -p "$REDIS_PORT" ping >/dev/null 2>&1; }

redis_start() {
  command -v redis-server >/dev/null 2>&1 || fail "redis-server not found. Run scripts/setup.sh (installs the Debian package redis-server)."
  mkdir -p "$REDIS_DIR"
  if redis_running; then
    say "Redis: already running from our data folder (.data/redis), reusing it"
    return 0
  fi
  if [ -f "$REDIS_DIR/redis.pid" ]; then
    say "Redis: removing stale pid file $REDIS_DIR/redis.pid"
    rm -f "$REDIS_DIR/redis.pid"
  fi
  port_in_use "$REDIS_PORT" && port_taken_message "$REDIS_PORT" "Redis"
  say "Redis: starting on 127.0.0.1:$REDIS_PORT (log: .data/redis/redis.log)"
  redis-server --bind 127.0.0.1 --port "$REDIS_PORT" --dir "$REDIS_DIR" --daemonize yes \
    --pidfile "$REDIS_DIR/redis.pid" --logfile "$REDIS_DIR/redis.log" \
    --appendonly yes --maxmemory-policy noeviction >/dev/null
  for _ in $(seq 1 100); do
    redis-cli -p "$REDIS_PORT" ping >/dev/null 2>&1 && return 0
    sleep 0.1
  done
  tail -20 "$REDIS_DIR/redis.log" >&2 || true
  fail "Redis did not start (log: $REDIS_DIR/redis.log)"
}

redis_stop() {
  if redis_running; then
    say "Redis: stopping"
    redis-cli -p "$REDIS_PORT" shutdown >/dev/null 2>&1 || true
    for _ in $(seq 1 100); do port_in_use "$REDIS_PORT" || break; sleep 0.1; done
    rm -f "$REDIS_DIR/redis.pid"
  else
    say "Redis: not running"
  fi
}

redis_status() {
  if redis_running; then say "Redis: running on 127.0.0.1:$REDIS_PORT (.data/redis)"; else say "Redis: stopped"; return 1; fi
}

# ---------------------------------------------------------------- SMTP fake (one or two instances)

# smtp_start NAME PORT MAIL_DIR
smtp_start() {
  local name="$1" port="$2" mail_dir="$3"
  local pid_file="$DATA/$name.pid" log_file="$DATA/$name.log" pid
  pid="$( [ -f "$pid_file" ] && cat "$pid_file" || true )"
  if pid_matches "$pid" "smtp-fake"; then
    say "SMTP fake ($name): already running (pid $pid) on 127.0.0.1:$port, reusing it"
    return 0
  fi
  if [ -f "$pid_file" ]; then
    say "SMTP fake ($name): removing stale pid file $pid_file"
    rm -f "$pid_file"
  fi
  port_in_use "$port" && port_taken_message "$port" "the SMTP fake"
  mkdir -p "$mail_dir"
  say "SMTP fake ($name): starting on 127.0.0.1:$port, storing mail in ${mail_dir#"$ROOT"/} (log: .data/$name.log)"
  cd "$ROOT"
  SMTP_PORT="$port" MAIL_DIR="$mail_dir" nohup node --import tsx scripts/smtp-fake.ts >>"$log_file" 2>&1 </dev/null &
  echo $! >"$pid_file"
  if ! wait_for_port "$port" 30; then
    tail -20 "$log_file" >&2 || true
    fail "the SMTP fake did not start on port $port (log: $log_file)"
  fi
}

# smtp_stop NAME
smtp_stop() {
  local name="$1" pid_file="$DATA/$1.pid" pid
  pid="$( [ -f "$pid_file" ] && cat "$pid_file" || true )"
  if pid_matches "$pid" "smtp-fake"; then
    say "SMTP fake ($name): stopping (pid $pid)"
    kill "$pid" 2>/dev/null || true
    for _ in $(seq 1 50); do pid_matches "$pid" "smtp-fake" || break; sleep 0.1; done
    pid_matches "$pid" "smtp-fake" && kill -9 "$pid" 2>/dev/null || true
  else
    say "SMTP fake ($name): not running"
  fi
  rm -f "$pid_file"
}

smtp_status() {
  local name="$1" port="$2" pid
  pid="$( [ -f "$DATA/$name.pid" ] && cat "$DATA/$name.pid" || true )"
  if pid_matches "$pid" "smtp-fake"; then say "SMTP fake ($name): running (pid $pid) on 127.0.0.1:$port"; else say "SMTP fake ($name): stopped"; return 1; fi
}

# ---------------------------------------------------------------- main

# Each action takes the services it applies to; without names it applies to pg, redis and smtp.
#   pg         PostgreSQL
#   redis      Redis
#   smtp       the SMTP fake for development (2525, .data/mail)
#   test-mail  the SMTP fake for tests (2526, .data/test-mail)
action="${1:-}"
[ $# -gt 0 ] && shift
names=("$@")
[ ${#names[@]} -eq 0 ] && names=(pg redis smtp)

for name in "${names[@]}"; do
  case "$name" in
    pg | redis | smtp | test-mail) ;;
    *) echo "Unknown service \"$name\" (use pg, redis, smtp, test-mail)" >&2; exit 2 ;;
  esac
done

reverse_names() { local i; for ((i = ${#names[@]} - 1; i >= 0; i--)); do printf '%s\n' "${names[$i]}"; done; }

case "$action" in
  start)
    for name in "${names[@]}"; do
      case "$name" in
        pg) pg_start ;;
        redis) redis_start ;;
        smtp) smtp_start smtp "$SMTP_PORT" "${MAIL_DIR:-$DATA/mail}" ;;
        test-mail) smtp_start smtp-test "$TEST_SMTP_PORT" "$DATA/test-mail" ;;
      esac
    done
    say "up: ${names[*]}"
    ;;
  stop)
    # Without names, stop also takes down a test SMTP fake left behind by an interrupted test run.
    [ $# -eq 0 ] && smtp_stop smtp-test
    while read -r name; do
      case "$name" in
        pg) pg_stop ;;
        redis) redis_stop ;;
        smtp) smtp_stop smtp ;;
        test-mail) smtp_stop smtp-test ;;
      esac
    done < <(reverse_names)
    ;;
  status)
    rc=0
    for name in "${names[@]}"; do
      case "$name" in
        pg) pg_status || rc=1 ;;
        redis) redis_status || rc=1 ;;
        smtp) smtp_status smtp "$SMTP_PORT" || rc=1 ;;
        test-mail) smtp_status smtp-test "$TEST_SMTP_PORT" || rc=1 ;;
      esac
    done
    exit $rc
    ;;
  *)
    echo "Usage: $0 start|stop|status [pg] [redis] [smtp] [test-mail]" >&2
    exit 2
    ;;
esac
