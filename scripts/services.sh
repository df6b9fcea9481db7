#!/usr/bin/env bash
# Provision, start and stop PostgreSQL, Redis and the fake SMTP mailbox on
# 127.0.0.1 only, under the git-ignored .data/<profile>/ folder.
#   bash scripts/services.sh up|down|status   (PROFILE=dev|test)
set -euo pipefail
source "$(dirname "$0")/env.sh"

ensure_packages() {
  local need=()
  command -v redis-server >/dev/null || need+=(redis-server)
  [ -x "$PG_BIN/initdb" ] || need+=(postgresql-15)
  if [ "$PROFILE" = test ] && [ ! -x /usr/bin/chromium ]; then need+=(chromium); fi
  [ ${#need[@]} -eq 0 ] && return 0
  if [ "$(id -u)" = 0 ] && command -v apt-get >/dev/null; then
    log "installing Debian packages: ${need[*]}"
    DEBIAN_FRONTEND=noninteractive apt-get update -qq >/dev/null
    DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends "${need[@]}" >/dev/null
  else
    die "missing ${need[*]}: install them (apt-get install ${need[*]}) and run again"
  fi
}

ensure_pg_user() {
  [ "$(id -u)" = 0 ] || return 0
  if ! id "$PG_OS_USER" >/dev/null 2>&1; then
    PG_OS_USER=bellows-pg
    id "$PG_OS_USER" >/dev/null 2>&1 || useradd --system --no-create-home --shell /usr/sbin/nologin "$PG_OS_USER"
  fi
}

pg_dir() {
  # Where the cluster lives; see env.sh for why it may be outside the clone.
  local link="$DATA_DIR/pg"
  if [ -L "$link" ]; then readlink "$link"; return; fi
  if [ -d "$link" ]; then echo "$link"; return; fi
  if [ "$(id -u)" = 0 ] && ! runuser -u "$PG_OS_USER" -- test -x "$DATA_DIR"; then
    # A new folder for each clone (the link, kept in .data, finds it again): a
    # folder named after the clone's path outlived a deleted clone, and a fresh
    # clone at the same path started on the old cluster and its data.
    local parent; parent=$(mktemp -d /tmp/bellows-XXXXXXXXXX); chmod 755 "$parent"
    local target="$parent/$PROFILE-pg"
    ln -s "$target" "$link"; echo "$target"; return
  fi
  echo "$link"
}

pg_up() {
  local dir; dir=$(pg_dir)
  local sock="$dir-sock"
  if [ ! -f "$dir/PG_VERSION" ]; then
    log "initialising PostgreSQL in $dir"
    mkdir -p "$dir" "$sock"; chmod 700 "$dir"
    [ "$(id -u)" = 0 ] && chown "$PG_OS_USER" "$dir" "$sock"
    local pw; pw=$(mktemp); echo bellows > "$pw"; chmod 644 "$pw"
    as_pg "$PG_BIN/initdb" -D "$dir" -U "$DB_USER" --pwfile="$pw" --auth-host=scram-sha-256 --auth-local=trust -E UTF8 --locale=C.UTF-8 >/dev/null
    rm -f "$pw"
  fi
  mkdir -p "$sock"; [ "$(id -u)" = 0 ] && chown "$PG_OS_USER" "$sock"
  if as_pg "$PG_BIN/pg_ctl" -D "$dir" status >/dev/null 2>&1; then
    log "PostgreSQL already running on 127.0.0.1:$PG_PORT"
  else
    local extra="-c listen_addresses=127.0.0.1 -p $PG_PORT -k $sock -c max_connections=200 -c shared_buffers=256MB"
    # fsync off is acceptable for the throwaway test database only.
    [ "$PROFILE" = test ] && extra="$extra -c fsync=off -c synchronous_commit=off -c full_page_writes=off"
    as_pg "$PG_BIN/pg_ctl" -D "$dir" -l "$dir/server.log" -w -t 60 -o "$extra" start >/dev/null \
      || { tail -20 "$dir/server.log" >&2; die "PostgreSQL did not start (log: $dir/server.log)"; }
    log "PostgreSQL up on 127.0.0.1:$PG_PORT"
  fi
  if ! as_pg "$PG_BIN/psql" -w -h "$sock" -p "$PG_PORT" -U "$DB_USER" -d postgres -tAc "select 1 from pg_database where datname='$DB_NAME'" | grep -q 1; then
    as_pg "$PG_BIN/createdb" -w -h "$sock" -p "$PG_PORT" -U "$DB_USER" "$DB_NAME"
    log "created database $DB_NAME"
  fi
}

pg_down() {
  local dir; dir=$(pg_dir)
  [ -f "$dir/PG_VERSION" ] || return 0
  if as_pg "$PG_BIN/pg_ctl" -D "$dir" status >/dev/null 2>&1; then
    as_pg "$PG_BIN/pg_ctl" -D "$dir" -m fast -w stop >/dev/null && log "PostgreSQL stopped"
  fi
}

redis_up() {
  mkdir -p "$DATA_DIR"
  if redis-cli -p "$REDIS_PORT" ping >/dev/null 2>&1; then log "Redis already running on 127.0.0.1:$REDIS_PORT"; return; fi
  redis-server --bind 127.0.0.1 --port "$REDIS_PORT" --save '' --appendonly no --daemonize yes \
    --maxmemory-policy noeviction --pidfile "$DATA_DIR/redis.pid" --logfile "$DATA_DIR/redis.log" --dir "$DATA_DIR" >/dev/null
  for _ in $(seq 1 50); do redis-cli -p "$REDIS_PORT" ping >/dev/null 2>&1 && break; sleep 0.1; done
  redis-cli -p "$REDIS_PORT" ping >/dev/null || die "Redis did not start (log: $DATA_DIR/redis.log)"
  log "Redis up on 127.0.0.1:$REDIS_PORT"
}

# Stops this data folder's Redis, by its pid file, and never another one that
# answers on the port: a stop run without the start's port settings used to shut
# down whichever Redis listened on the default port (another checkout's).
redis_down() {
  local f="$DATA_DIR/redis.pid" pid
  if [ -f "$f" ]; then
    pid=$(cat "$f")
    if kill -0 "$pid" 2>/dev/null && [ "$(ps -p "$pid" -o comm= 2>/dev/null)" = "redis-server" ]; then
      kill -TERM "$pid" 2>/dev/null || true
      for _ in $(seq 1 50); do kill -0 "$pid" 2>/dev/null || break; sleep 0.1; done
      log "Redis stopped"
    fi
    rm -f "$f"
    return 0
  fi
  # No pid file: only a Redis whose working folder is this data folder.
  [ "$(redis-cli -p "$REDIS_PORT" config get dir 2>/dev/null | sed -n 2p)" = "$DATA_DIR" ] || return 0
  redis-cli -p "$REDIS_PORT" shutdown nosave >/dev/null 2>&1 || true
  log "Redis stopped"
}

mail_up() {
  mkdir -p "$PIDS_DIR" "$LOG_DIR" "$MAIL_SINK_DIR"
  if [ -f "$PIDS_DIR/mail.pid" ] && kill -0 "$(cat "$PIDS_DIR/mail.pid")" 2>/dev/null; then return; fi
  cd "$ROOT"
  nohup node --import tsx scripts/mail-sink.ts </dev/null >"$LOG_DIR/mail.log" 2>&1 &
  echo $! >"$PIDS_DIR/mail.pid"
  for _ in $(seq 1 50); do (exec 3<>/dev/tcp/127.0.0.1/"$SMTP_PORT") 2>/dev/null && break; sleep 0.2; done
  log "fake SMTP on 127.0.0.1:$SMTP_PORT, mailbox at $MAIL_UI_URL"
}

stop_pidfile() {
  local f="$1"
  [ -f "$f" ] || return 0
  local pid; pid=$(cat "$f")
  if kill -0 "$pid" 2>/dev/null; then
    kill -TERM "$pid" 2>/dev/null || true
    for _ in $(seq 1 50); do kill -0 "$pid" 2>/dev/null || break; sleep 0.1; done
    kill -KILL "$pid" 2>/dev/null || true
  fi
  rm -f "$f"
}

case "${1:-up}" in
  up) ensure_packages; ensure_pg_user; mkdir -p "$DATA_DIR"; pg_up; redis_up; mail_up ;;
  down)
    ensure_pg_user
    for f in "$PIDS_DIR"/*.pid; do [ -e "$f" ] && stop_pidfile "$f"; done
    redis_down; pg_down ;;
  status)
    redis-cli -p "$REDIS_PORT" ping 2>/dev/null || echo "redis down"
    as_pg "$PG_BIN/pg_ctl" -D "$(pg_dir)" status || true ;;
  *) die "usage: services.sh up|down|status" ;;
esac
