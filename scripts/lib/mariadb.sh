# Private MariaDB in $DATA_DIR/mariadb on 127.0.0.1:$DB_PORT. Sourced after common.sh.
# The application connects as its own user ($DB_USER), never as root.

db_root() { mariadb --no-defaults --protocol=socket --socket="$DB_SOCKET" -uroot "$@"; }

start_mariadb() {
  ensure_mariadb
  local dir="$DATA_DIR/mariadb"
  DB_SOCKET="$dir/mysqld.sock"; export DB_SOCKET
  mkdir -p "$RUN_DIR"
  if [ ! -d "$dir/mysql" ]; then
    say "initialising a private MariaDB data folder in ${dir#"$ROOT"/}"
    mkdir -p "$dir"
    local owner=()
    [ "$(id -u)" = 0 ] && owner=(--user=root)
    mariadb-install-db --no-defaults --datadir="$dir" "${owner[@]}" \
      --auth-root-authentication-method=socket --skip-test-db >"$RUN_DIR/mariadb-install.log" 2>&1 \
      || { cat "$RUN_DIR/mariadb-install.log"; die "mariadb-install-db failed"; }
  fi
  if [ -f "$RUN_DIR/mariadb.pid" ] && kill -0 "$(cat "$RUN_DIR/mariadb.pid")" 2>/dev/null; then
    say "MariaDB already running on 127.0.0.1:$DB_PORT"
  else
    local owner=()
    [ "$(id -u)" = 0 ] && owner=(--user=root)
    "$MARIADBD" --no-defaults --datadir="$dir" --socket="$DB_SOCKET" --pid-file="$dir/mysqld.pid" \
      --port="$DB_PORT" --bind-address=127.0.0.1 --skip-name-resolve "${owner[@]}" \
      --character-set-server=utf8mb4 --collation-server=utf8mb4_unicode_ci \
      --innodb-buffer-pool-size=256M --max-connections=200 \
      --log-error="$RUN_DIR/mariadb.err" >"$RUN_DIR/mariadb.log" 2>&1 &
    echo $! >"$RUN_DIR/mariadb.pid"
    local i=0
    until db_root -e 'SELECT 1' >/dev/null 2>&1; do
      i=$((i + 1))
      if [ "$i" -gt 150 ]; then tail -20 "$RUN_DIR/mariadb.err" >&2; die "MariaDB did not start"; fi
      kill -0 "$(cat "$RUN_DIR/mariadb.pid")" 2>/dev/null || { tail -20 "$RUN_DIR/mariadb.err" >&2; die "MariaDB exited"; }
      sleep 0.2
    done
    say "MariaDB running on 127.0.0.1:$DB_PORT"
  fi
  db_root <<SQL || die "could not create database $DB_NAME"
CREATE DATABASE IF NOT EXISTS \`$DB_NAME\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
CREATE USER IF NOT EXISTS '$DB_USER'@'127.0.0.1' IDENTIFIED BY '$DB_PASSWORD';
ALTER USER '$DB_USER'@'127.0.0.1' IDENTIFIED BY '$DB_PASSWORD';
GRANT ALL PRIVILEGES ON \`$DB_NAME\`.* TO '$DB_USER'@'127.0.0.1';
FLUSH PRIVILEGES;
SQL
}
