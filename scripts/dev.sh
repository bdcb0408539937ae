#!/usr/bin/env bash
# npm run dev: the API with reload on :8080 and Expo's dev server on :8081 (web), against the dev database.
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
cd "$ROOT"
KEYOFF_URL=http://127.0.0.1:8081 TRUSTED_ORIGINS=http://127.0.0.1:8081,http://localhost:8081 node_modules/.bin/tsx watch server/index.ts &
STARTED_PIDS+=($!)
EXPO_UNSTABLE_HEADLESS=1 EXPO_PUBLIC_API_URL=http://127.0.0.1:8080 npx expo start --web --port 8081 &
STARTED_PIDS+=($!)
say "app http://127.0.0.1:8081, API http://127.0.0.1:8080, mail http://127.0.0.1:1080"
wait
