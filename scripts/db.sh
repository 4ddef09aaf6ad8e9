#!/usr/bin/env bash
# A private MariaDB on 127.0.0.1 with its data inside the project (git-ignored .data/), or in a
# throwaway folder for tests. No systemd, no /etc/mysql: everything is passed on the command line.
#   scripts/db.sh start [DIR] [PORT] [DBNAME]   start (initialising DIR if new), create DB and app user
#   scripts/db.sh stop  [DIR]                   stop the server that runs on DIR
#   scripts/db.sh env   [DIR]                   print the connection settings (KEY=value lines)
set -euo pipefail
cd "$(dirname "$0")/.."
cmd=${1:-start}
DIR=$(realpath -m "${2:-.data/mariadb}")
PORT=${3:-3407}
DBNAME=${4:-panelpoint}
RUN="$DIR/run"
mkdir -p "$DIR/data" "$RUN"

# A Unix socket path must stay under ~100 characters: use a short temporary folder when needed.
sock_path() {
  if [ -f "$RUN/socket-path" ]; then cat "$RUN/socket-path"; return; fi
  local s="$RUN/mariadb.sock"
  if [ ${#s} -gt 90 ]; then s="$(mktemp -d /tmp/ppdb.XXXXXX)/mariadb.sock"; fi
  echo "$s" > "$RUN/socket-path"
  echo "$s"
}

case "$cmd" in
  start)
    command -v mariadbd >/dev/null || { echo "db.sh: mariadb-server is not installed (scripts/ensure.sh installs it)" >&2; exit 1; }
    SOCK=$(sock_path)
    if [ -f "$RUN/mariadb.pid" ] && kill -0 "$(cat "$RUN/mariadb.pid")" 2>/dev/null; then
      echo "db.sh: MariaDB already running on $DIR" >&2
    else
      if [ ! -d "$DIR/data/mysql" ]; then
        mariadb-install-db --no-defaults --user=root --datadir="$DIR/data" --auth-root-authentication-method=socket --skip-test-db >"$RUN/install.log" 2>&1 \
          || { cat "$RUN/install.log" >&2; exit 1; }
      fi
      mariadbd --no-defaults --user=root --datadir="$DIR/data" --socket="$SOCK" --pid-file="$RUN/mariadb.pid" \
        --port="$PORT" --bind-address=127.0.0.1 --skip-name-resolve --log-error="$RUN/mariadb.err" \
        --character-set-server=utf8mb4 --collation-server=utf8mb4_unicode_ci --innodb-buffer-pool-size=256M \
        --innodb-flush-log-at-trx-commit=2 --max-allowed-packet=64M >/dev/null 2>&1 &
      for _ in $(seq 1 150); do
        mariadb-admin --no-defaults --socket="$SOCK" -uroot ping >/dev/null 2>&1 && break
        sleep 0.1
      done
      mariadb-admin --no-defaults --socket="$SOCK" -uroot ping >/dev/null 2>&1 || { echo "db.sh: MariaDB did not start; see $RUN/mariadb.err" >&2; tail -20 "$RUN/mariadb.err" >&2; exit 1; }
    fi
    if [ ! -f "$RUN/password" ]; then head -c 18 /dev/urandom | base64 | tr -d '/+=' > "$RUN/password"; fi
    PASS=$(cat "$RUN/password")
    mariadb --no-defaults --socket="$SOCK" -uroot <<SQL
CREATE DATABASE IF NOT EXISTS \`$DBNAME\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
CREATE USER IF NOT EXISTS 'panelpoint'@'127.0.0.1' IDENTIFIED BY '$PASS';
CREATE USER IF NOT EXISTS 'panelpoint'@'localhost' IDENTIFIED BY '$PASS';
GRANT ALL PRIVILEGES ON \`$DBNAME\`.* TO 'panelpoint'@'127.0.0.1';
GRANT ALL PRIVILEGES ON \`$DBNAME\`.* TO 'panelpoint'@'localhost';
FLUSH PRIVILEGES;
SQL
    printf 'DB_HOST=127.0.0.1\nDB_PORT=%s\nDB_NAME=%s\nDB_USER=panelpoint\nDB_PASSWORD=%s\n' "$PORT" "$DBNAME" "$PASS" > "$RUN/env"
    echo "db.sh: MariaDB on 127.0.0.1:$PORT, database $DBNAME, data in $DIR" >&2
    ;;
  stop)
    SOCK=$(sock_path)
    if mariadb-admin --no-defaults --socket="$SOCK" -uroot ping >/dev/null 2>&1; then
      mariadb-admin --no-defaults --socket="$SOCK" -uroot shutdown
    fi
    ;;
  env)
    cat "$RUN/env"
    ;;
  *)
    echo "usage: scripts/db.sh start|stop|env [DIR] [PORT] [DBNAME]" >&2; exit 2 ;;
esac
