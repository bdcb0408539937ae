# Shared steps of start.sh, test.sh and dev.sh. Source it; it expects ROOT to be set.
set -euo pipefail
export EXPO_OFFLINE=1 EXPO_NO_TELEMETRY=1

say() { echo "[keyoff] $*"; }

port_open() { (exec 3<>"/dev/tcp/127.0.0.1/$1") 2>/dev/null; }

wait_port() { # port, seconds
  local i
  for ((i = 0; i < $2 * 10; i++)); do port_open "$1" && return 0; sleep 0.1; done
  return 1
}

# npm ci when node_modules is missing or older than the lock file.
ensure_deps() {
  local want have
  want=$(sha1sum "$ROOT/package-lock.json" | cut -d' ' -f1)
  have=$(cat "$ROOT/node_modules/.keyoff-lock" 2>/dev/null || true)
  if [ "$want" != "$have" ]; then
    say "installing dependencies (npm ci)"
    local t0=$SECONDS
    (cd "$ROOT" && npm ci --no-audit --no-fund --loglevel=error)
    echo "$want" >"$ROOT/node_modules/.keyoff-lock"
    say "npm ci took $((SECONDS - t0)) s"
  fi
}

STARTED_PIDS=()
cleanup() {
  local pid
  for pid in "${STARTED_PIDS[@]:-}"; do
    [ -n "$pid" ] && kill "$pid" 2>/dev/null || true
  done
  for pid in "${STARTED_PIDS[@]:-}"; do
    [ -n "$pid" ] && wait "$pid" 2>/dev/null || true
  done
  if [ "${STARTED_DB:-0}" = 1 ]; then bash "$ROOT/scripts/db.sh" stop || true; fi
}

start_db() {
  if ! bash "$ROOT/scripts/db.sh" status >/dev/null 2>&1; then STARTED_DB=1; fi
  bash "$ROOT/scripts/db.sh" start
}

# Empties a database: its tables, and every job-queue schema (each test app makes one), one schema per
# transaction so that a hundred left by earlier runs do not overflow PostgreSQL's lock table.
empty_db() {
  local psql
  psql="$(ls -d /usr/lib/postgresql/*/bin | sort -V | tail -1)/psql"
  "$psql" -qX -h 127.0.0.1 -p 54329 -U keyoff -d "$1" -c "set client_min_messages = warning; drop schema if exists public cascade; create schema public;" >/dev/null
  "$psql" -qX -h 127.0.0.1 -p 54329 -U keyoff -d "$1" -c "set client_min_messages = warning;" \
    -c "do \$\$ declare s text; begin for s in select nspname from pg_namespace where nspname like 'pgboss%' loop execute format('drop schema %I cascade', s); commit; end loop; end \$\$;" >/dev/null
}

# maildev on loopback only: SMTP 1025, web 1080.
start_maildev() {
  if port_open 1025 && port_open 1080; then say "a mail catcher already answers on 1025/1080"; return; fi
  mkdir -p "$ROOT/.data"
  "$ROOT/node_modules/.bin/maildev" --ip 127.0.0.1 --web-ip 127.0.0.1 --smtp 1025 --web 1080 >"$ROOT/.data/maildev.log" 2>&1 &
  STARTED_PIDS+=($!)
  wait_port 1080 20 || { say "maildev did not start; see .data/maildev.log"; exit 1; }
  say "maildev on http://127.0.0.1:1080/index.html (SMTP 127.0.0.1:1025)"
}

# s3rver (object storage for logs and photos) on loopback: 127.0.0.1:4569, bucket "keyoff", data in .data/s3.
start_s3() {
  if port_open 4569; then say "object storage already answers on 4569"; return; fi
  mkdir -p "$ROOT/.data/s3"
  "$ROOT/node_modules/.bin/s3rver" -d "$ROOT/.data/s3" -a 127.0.0.1 -p 4569 --configure-bucket keyoff --silent >"$ROOT/.data/s3rver.log" 2>&1 &
  STARTED_PIDS+=($!)
  wait_port 4569 20 || { say "s3rver did not start; see .data/s3rver.log"; exit 1; }
  say "object storage (s3rver) on http://127.0.0.1:4569, bucket keyoff"
}

# The web export, rebuilt only when a source it depends on changed.
build_web() {
  local hash
  hash=$(cd "$ROOT" && find app features components lib shared assets web -type f -print0 | sort -z | xargs -0 sha1sum |
    cat - app.json package-lock.json tsconfig.json metro.config.js scripts/finish-web.ts server/web-routes.ts | sha1sum | cut -d' ' -f1)
  if [ -f "$ROOT/dist/index.html" ] && [ "$(cat "$ROOT/dist/.keyoff-build" 2>/dev/null)" = "$hash" ]; then
    say "web build is up to date"
    return
  fi
  say "exporting the web build (expo export --platform web)"
  local t0=$SECONDS
  mkdir -p "$ROOT/.data"
  # canvaskit.wasm goes out under a name that changes with its content; the chart's loader is built with it.
  EXPO_PUBLIC_CANVASKIT_WASM="canvaskit.$(sha256sum "$ROOT/public/canvaskit.wasm" | cut -c1-16).wasm"
  export EXPO_PUBLIC_CANVASKIT_WASM
  (cd "$ROOT" && npx expo export --platform web --output-dir dist >"$ROOT/.data/export.log" 2>&1) || {
    tail -40 "$ROOT/.data/export.log"; say "web export failed"; exit 1; }
  # Hashed names, icons and manifest, the service worker, then brotli and gzip beside every file.
  (cd "$ROOT" && npx tsx scripts/finish-web.ts dist) || { say "finishing the web build failed"; exit 1; }
  echo "$hash" >"$ROOT/dist/.keyoff-build"
  say "web export took $((SECONDS - t0)) s"
}

# AUTH_SECRET from the environment, or made at random on first run and kept in .data/auth-secret (mode 0600).
ensure_auth_secret() {
  if [ -n "${AUTH_SECRET:-}" ]; then return; fi
  AUTH_SECRET=$(cd "$ROOT" && node_modules/.bin/tsx scripts/auth-secret.ts "$ROOT/.data/auth-secret")
  export AUTH_SECRET
}

# poppler-utils: pdftotext and pdfinfo read the budget sheet back in its tests.
ensure_poppler() {
  if command -v pdftotext >/dev/null && command -v pdfinfo >/dev/null; then return; fi
  say "installing Debian's poppler-utils for the budget sheet tests"
  if [ "$(id -u)" != 0 ]; then say "need root for apt-get install poppler-utils"; exit 1; fi
  DEBIAN_FRONTEND=noninteractive apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq poppler-utils >/dev/null
}

ensure_chromium() {
  if [ -x /usr/bin/chromium ]; then return; fi
  say "installing Debian's chromium for the browser tests"
  if [ "$(id -u)" != 0 ]; then say "need root for apt-get install chromium"; exit 1; fi
  DEBIAN_FRONTEND=noninteractive apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium >/dev/null
}
