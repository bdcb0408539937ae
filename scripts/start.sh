#!/usr/bin/env bash
# npm start: everything Keyoff needs, from a fresh clone, then the server in production mode.
ROOT=$(cd "$(dirname "$0")/.." && pwd)
source "$ROOT/scripts/lib.sh"
trap cleanup EXIT
trap 'exit 130' INT TERM

ensure_deps
start_db
export DATABASE_URL=${DATABASE_URL:-postgres://keyoff@127.0.0.1:54329/keyoff}
(cd "$ROOT" && npx tsx scripts/seed.ts)
start_maildev
start_s3
build_web

ensure_auth_secret
export NODE_ENV=production PORT=${PORT:-8080}
if port_open "$PORT"; then say "port $PORT is taken by another program; stop it or set PORT"; exit 1; fi
(cd "$ROOT" && exec node_modules/.bin/tsx server/index.ts) &
STARTED_PIDS+=($!)
wait_port "$PORT" 30 || { say "the server did not start"; exit 1; }
cat <<MSG

  Keyoff         http://127.0.0.1:$PORT
  Mail catcher   http://127.0.0.1:1080/index.html
  Demo rigs      Wren and Stoat (the Halloran-Okafor household)
  Demo sign-ins  password keyoff-demo-2026 for each of
                 ines@example.org (owner), tobi@example.org (member),
                 marguerite@example.org (advisor), dara@example.org (outside the household),
                 admin@example.org (admin)
  Ctrl-C stops everything this command started.

MSG
wait "${STARTED_PIDS[-1]}"
