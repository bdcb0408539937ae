#!/usr/bin/env bash
# npm test: the same set-up as npm start against the test database, then every check and test.
ROOT=$(cd "$(dirname "$0")/.." && pwd)
source "$ROOT/scripts/lib.sh"
trap cleanup EXIT
trap 'exit 130' INT TERM
T0=$SECONDS

ensure_deps
start_db
export DATABASE_URL=postgres://keyoff@127.0.0.1:54329/keyoff_test
# A fresh test database every run: drop what the last run left, then migrate and seed.
empty_db keyoff_test
(cd "$ROOT" && npx tsx scripts/seed.ts)
start_maildev
start_s3

cd "$ROOT"
say "type check"; npx tsc --noEmit
say "lint"; npx eslint . --max-warnings=0
ensure_poppler
say "unit and integration tests"; npx vitest run --reporter=default --reporter=json --outputFile.json=test-results/unit.json
build_web
ensure_chromium
say "browser tests"; npx vitest run --config vitest.e2e.config.mts --reporter=default --reporter=json --outputFile.json=test-results/e2e.json
say "all tests passed in $((SECONDS - T0)) s"
node -e '
  const r = ["unit", "e2e"].map((n) => require("./test-results/" + n + ".json"));
  const sum = (k) => r.reduce((s, x) => s + x[k], 0);
  console.log(`tests: ${sum("numPassedTests")} passed, ${sum("numFailedTests")} failed`);
'
