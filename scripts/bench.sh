#!/usr/bin/env bash
# npm run bench: the model's speed, then the Outlook through the API and the bundle sizes.
ROOT=$(cd "$(dirname "$0")/.." && pwd)
source "$ROOT/scripts/lib.sh"
trap cleanup EXIT
ensure_deps
start_db
cd "$ROOT"
npx tsx scripts/bench-model.ts
DATABASE_URL=postgres://keyoff@127.0.0.1:54329/keyoff_test npx tsx scripts/bench-api.ts
