#!/usr/bin/env bash
# npm run bench: the model's speed, the Outlook through the API and the bundle sizes, then the
# weekly-report batch for 10,000 rigs on its own database (keyoff_bench, emptied first).
ROOT=$(cd "$(dirname "$0")/.." && pwd)
source "$ROOT/scripts/lib.sh"
trap cleanup EXIT
ensure_deps
start_db
cd "$ROOT"
npx tsx scripts/bench-model.ts
DATABASE_URL=postgres://keyoff@127.0.0.1:54329/keyoff_test npx tsx scripts/bench-api.ts
start_maildev
"$(ls -d /usr/lib/postgresql/*/bin | sort -V | tail -1)/psql" -qX -h 127.0.0.1 -p 54329 -U keyoff -d keyoff_bench \
  -c "drop schema if exists public cascade; create schema public;" \
  -c "do \$\$ declare s text; begin for s in select nspname from pg_namespace where nspname like 'pgboss%' loop execute format('drop schema %I cascade', s); end loop; end \$\$;" >/dev/null
DATABASE_URL=postgres://keyoff@127.0.0.1:54329/keyoff_bench npx tsx scripts/bench-reports.ts
