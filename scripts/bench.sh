#!/usr/bin/env bash
# npm run bench: the model's speed, the Outlook through the API and the bundle sizes, the web app on a
# throttled link (scripts/bench-web.ts), then the weekly-report batch for 10,000 rigs on its own database
# (keyoff_bench, emptied first).
ROOT=$(cd "$(dirname "$0")/.." && pwd)
source "$ROOT/scripts/lib.sh"
trap cleanup EXIT
ensure_deps
start_db
cd "$ROOT"
# The benches build their apps in production mode, which refuses the default secret.
ensure_auth_secret
rm -f bench-results/latest.json
build_web
ensure_chromium
npx tsx scripts/bench-model.ts
DATABASE_URL=postgres://keyoff@127.0.0.1:54329/keyoff_test npx tsx scripts/bench-api.ts
DATABASE_URL=postgres://keyoff@127.0.0.1:54329/keyoff_test npx tsx scripts/bench-upload.ts
DATABASE_URL=postgres://keyoff@127.0.0.1:54329/keyoff_test npx tsx scripts/bench-web.ts
start_maildev
empty_db keyoff_bench
DATABASE_URL=postgres://keyoff@127.0.0.1:54329/keyoff_bench npx tsx scripts/bench-reports.ts
say "summary (also in bench-results/latest.json)"
node -e '
  const r = require("./bench-results/latest.json");
  const m = r.model["40 loads"];
  console.log(`machine: ${r.machine.cpus} cores, ${r.machine.cpu}, ${r.machine.memoryGb} GB, Node ${r.machine.node}`);
  console.log(`model, 40 loads: plain ${(m.plain.medianMs * 1000).toFixed(0)} µs, with Fixes ${m.withFixes.medianMs} ms (medians)`);
  console.log(`API: health ${r.api.health.requestsPerSecond} req/s; outlook ${r.api.outlook.requestsPerSecond} req/s (${r.api.outlookToBarePercent} %), p99 ${r.api.outlook.p99Ms} ms`);
  console.log(`API floor here (p99 at 50 connections): the middleware alone ${r.api.middlewareOnly.p99Ms} ms, Express alone ${r.api.expressFloor.p99Ms} ms, Node http alone ${r.api.nodeHttpFloor.p99Ms} ms`);
  if (r.web) console.log(`web: first screen ${r.web.firstScreenWireKb} KB, Outlook ${r.web.outlookWireKb} KB on the wire; chromium: first screen ${r.api.browser?.firstScreenMs} ms, chart ${r.api.browser?.outlookChartMs} ms`);
  const t = r.webThrottled;
  if (t) console.log(`throttled (1.6 Mbit/s, 150 ms): first screen ${Math.round(t.firstScreen.bytes / 1024)} KB; Outlook cold ${Math.round(t.outlookCold.bytesToChart / 1024)} KB, headline ${t.outlookCold.headlineMs} ms, chart ${t.outlookCold.chartMs} ms; warm ${Math.round(t.outlookWarm.bytes / 1024)} KB, headline ${t.outlookWarm.headlineMs} ms, chart ${t.outlookWarm.chartMs} ms`);
  if (r.upload) console.log(`upload of 200,000 rows: ${r.upload.uploadMs} ms; health meanwhile p99 ${r.upload.healthDuringUpload.p99Ms} ms, max ${r.upload.healthDuringUpload.maxMs} ms; four Readings reads ${r.upload.fourReadingsReadsMs} ms`);
  console.log(`reports: ${r.reports.queued} rigs in ${r.reports.batchSeconds} s; ${r.reports.emailsPerSecond} e-mails a second to maildev`);
'
