// The API under load and the web app's weight and speed, on the real server with real PostgreSQL:
// - the Outlook of a 40-load rig, sequential requests (latency at the median);
// - autocannon on loopback, 50 connections for 10 s each: the bare GET /api/health, then a signed-in
//   GET /api/rigs/:rigId/outlook (target: 30 % or more of the bare route's throughput, p99 under 50 ms);
// - the gzipped JavaScript of the first screen and of the Outlook (target under 800 KB, no CanvasKit);
// - in chromium, the time to the first screen and to the Outlook's chart drawn.
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import autocannon from 'autocannon';
import { pino } from 'pino';

import { launchChromium } from '@/tests/e2e/browser';
import { record } from './bench-results';

import { createApp } from '@/server/app';
import { loadConfig } from '@/server/config';
import { createContext } from '@/server/context';
import { migrateAll } from '@/server/migrate';
import { WREN, WREN_LOADS } from '@/shared/demo/scenario';

async function outlookLatency() {
  const url = process.env.DATABASE_URL ?? 'postgres://keyoff@127.0.0.1:54329/keyoff_test';
  const web = existsSync('dist/sign-in.html');
  const config = loadConfig({ ...process.env, DATABASE_URL: url, NODE_ENV: 'production', SERVE_WEB: String(web), LOG_LEVEL: 'silent', KEYOFF_URL: 'http://127.0.0.1:8093', RUN_WORKERS: 'false', RATE_LIMIT_PER_MINUTE: '1000000' });
  const ctx = createContext(process.env, { config, logger: pino({ level: 'silent' }), mailer: { send: async () => {} } });
  await migrateAll(ctx.auth, ctx.db);
  const app = createApp(ctx);
  await ctx.jobs.start();
  const server = app.listen(8093, '127.0.0.1');
  await new Promise((r) => server.once('listening', r));
  const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  const email = `bench-${Date.now()}@example.org`;
  await ctx.auth.api.signUpEmail({ body: { name: 'Bench', email, password: 'a-long-bench-password' } });
  await ctx.db.updateTable('user').set({ emailVerified: true }).where('email', '=', email).execute();
  const headers = { 'Content-Type': 'application/json', Origin: config.KEYOFF_URL };
  const signIn = await fetch(`${base}/api/auth/sign-in/email`, { method: 'POST', headers, body: JSON.stringify({ email, password: 'a-long-bench-password' }) });
  const cookie = signIn.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
  const { loads: _l, ...power } = WREN;
  const loads = Array.from({ length: 40 }, (_, i) => ({ ...WREN_LOADS[i % WREN_LOADS.length], name: `Load ${i + 1}` }));
  const created = await fetch(`${base}/api/rigs`, { method: 'POST', headers: { ...headers, cookie }, body: JSON.stringify({ name: 'Bench rig', power: { ...power, battery: { ...power.battery, capacityAh: 400 } }, loads }) });
  const { id } = (await created.json()) as { id: string };

  const target = process.env.TARGET ?? 'outlook';
  const h: Record<string, string> = { cookie };
  if (process.env.AE) h['accept-encoding'] = process.env.AE;
  const u = base + (target === 'health' ? '/api/health' : target === 'none' ? '/api/nothing-here' : `/api/rigs/${id}/outlook`);
  if (process.env.WARM) await autocannon({ url: u, connections: 50, duration: Number(process.env.WARM), headers: h, workers: 1 });
  const r = await autocannon({ url: u, connections: 50, duration: Number(process.env.DUR ?? 10), headers: h, workers: 1 });
  console.log(target, Math.round(r.requests.average), 'req/s p50', r.latency.p50, 'p99', r.latency.p99, 'non2xx', r.non2xx);
  const body = await (await fetch(`${base}/api/rigs/${id}/outlook`, { headers: { cookie } })).text();
  console.log('outlook bytes', body.length);
  let browser: Record<string, number> | null = null;
  await fetch(`${base}/api/rigs/${id}`, { method: 'DELETE', headers: { ...headers, cookie } });
  server.close();
  await ctx.jobs.stop();
  await ctx.db.destroy();
  return browser;
}

/** Debian's chromium on loopback: the first screen (sign-in) shown, then a rig's Outlook with its chart drawn. */
async function browserTimes(base: string, email: string, rigId: string) {
  const browser = await launchChromium();
  try {
    const page = await browser.newPage({ viewport: { width: 1280, height: 800 } });
    let t0 = performance.now();
    await page.goto(`${base}/sign-in`);
    await page.getByTestId('sign-in-screen').waitFor();
    const firstScreenMs = Math.round(performance.now() - t0);
    await page.getByTestId('field-email').fill(email);
    await page.getByTestId('field-password').fill('a-long-bench-password');
    await page.getByTestId('sign-in-submit').click();
    await page.getByTestId('home-screen').waitFor();
    t0 = performance.now();
    await page.goto(`${base}/rigs/${rigId}`);
    await page.getByTestId('soc-chart').locator('canvas').waitFor();
    await page.waitForFunction(() => {
      const c = document.querySelector('[data-testid="soc-chart"] canvas') as HTMLCanvasElement | null;
      return !!c && c.width > 0;
    });
    const chartMs = Math.round(performance.now() - t0);
    console.log(`chromium on loopback: first screen shown in ${firstScreenMs} ms; the Outlook's chart drawn ${chartMs} ms after opening the rig`);
    return { firstScreenMs, outlookChartMs: chartMs };
  } finally {
    await browser.close();
  }
}

function bundleBytes() {
  const dist = 'dist';
  if (!existsSync(path.join(dist, 'sign-in.html'))) {
    console.log('no web build: run npm run build:web for the bundle sizes');
    return null;
  }
  const gz = (file: string) => gzipSync(readFileSync(file)).length;
  const scripts = (html: string) => [...readFileSync(html, 'utf8').matchAll(/<script[^>]*src="([^"]+)"/g)].map((m) => path.join(dist, m[1]));
  const kb = (n: number) => `${(n / 1024).toFixed(0)} KB`;
  const first = [path.join(dist, 'sign-in.html'), ...scripts(path.join(dist, 'sign-in.html'))];
  const firstTotal = first.reduce((s, f) => s + gz(f), 0);
  const js = path.join(dist, '_expo/static/js/web');
  const lazy = readdirSync(js).filter((f) => /^(charts-impl|index)-/.test(f)).map((f) => path.join(js, f));
  const wasm = path.join(dist, 'canvaskit.wasm');
  const skia = [...lazy, ...(existsSync(wasm) ? [wasm] : [])];
  // Skia's web code names this CanvasKit call; the first screen's files must not contain it.
  const firstHasSkia = first.some((f) => readFileSync(f, 'utf8').includes('MakeWebGLCanvasSurface'));
  console.log(`first screen (sign-in): ${kb(firstTotal)} gzipped in ${first.length} files; Skia/CanvasKit code in it: ${firstHasSkia ? 'yes' : 'no'}`);
  for (const f of skia) console.log(`  loaded only on a screen with a chart: ${path.basename(f)} ${kb(gz(f))} gzipped`);
  const outlookTotal = firstTotal + skia.reduce((s, f) => s + gz(f), 0);
  console.log(`Outlook: ${kb(outlookTotal)} gzipped in all (first screen plus the chart's code and canvaskit.wasm)`);
  console.log(`first screen under 800 KB with no CanvasKit: ${firstTotal < 800 * 1024 && !firstHasSkia ? 'met' : 'missed'}`);
  return { firstScreenGzipKb: Math.round(firstTotal / 1024), firstScreenHasCanvasKit: firstHasSkia, outlookGzipKb: Math.round(outlookTotal / 1024) };
}

void (async () => {
  await outlookLatency();
})();
