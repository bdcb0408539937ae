// The Outlook of a 40-load rig through the API (real server, real PostgreSQL, a signed-in session):
// target under 20 ms at the median. Also the bytes a browser downloads for the first screen and the Outlook.
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import { pino } from 'pino';

import { createApp } from '@/server/app';
import { loadConfig } from '@/server/config';
import { createContext } from '@/server/context';
import { migrateAll } from '@/server/migrate';
import { WREN, WREN_LOADS } from '@/shared/demo/scenario';

async function outlookLatency() {
  const url = process.env.DATABASE_URL ?? 'postgres://keyoff@127.0.0.1:54329/keyoff_test';
  const config = loadConfig({ ...process.env, DATABASE_URL: url, NODE_ENV: 'production', SERVE_WEB: 'false', LOG_LEVEL: 'silent', KEYOFF_URL: 'http://127.0.0.1:8093' });
  const ctx = createContext(process.env, { config, logger: pino({ level: 'silent' }), mailer: { send: async () => {} } });
  await migrateAll(ctx.auth, ctx.db);
  const app = createApp(ctx);
  const server = app.listen(0, '127.0.0.1');
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

  const samples: number[] = [];
  for (let i = 0; i < 330; i++) {
    const t0 = performance.now();
    const res = await fetch(`${base}/api/rigs/${id}/outlook`, { headers: { cookie } });
    await res.arrayBuffer();
    if (i >= 30) samples.push(performance.now() - t0);
    if (!res.ok) throw new Error(`outlook answered ${res.status}`);
  }
  samples.sort((a, b) => a - b);
  const median = samples[Math.floor(samples.length / 2)];
  console.log(`GET /api/rigs/:rigId/outlook, 40 loads, Fixes included: median ${median.toFixed(2)} ms, p95 ${samples[Math.floor(samples.length * 0.95)].toFixed(2)} ms (${samples.length} sequential requests)`);
  console.log(median < 20 ? 'target met: under 20 ms' : 'target missed: 20 ms');
  await fetch(`${base}/api/rigs/${id}`, { method: 'DELETE', headers: { ...headers, cookie } });
  server.close();
  await ctx.db.destroy();
}

function bundleBytes() {
  const dist = 'dist';
  if (!existsSync(path.join(dist, 'sign-in.html'))) return console.log('no web build: run npm run build:web for the bundle sizes');
  const gz = (file: string) => gzipSync(readFileSync(file)).length;
  const scripts = (html: string) => [...readFileSync(html, 'utf8').matchAll(/<script[^>]*src="([^"]+)"/g)].map((m) => path.join(dist, m[1]));
  const kb = (n: number) => `${(n / 1024).toFixed(0)} KB`;
  const first = [path.join(dist, 'sign-in.html'), ...scripts(path.join(dist, 'sign-in.html'))];
  const firstTotal = first.reduce((s, f) => s + gz(f), 0);
  const js = path.join(dist, '_expo/static/js/web');
  const lazy = readdirSync(js).filter((f) => /^(soc-chart-impl|index)-/.test(f)).map((f) => path.join(js, f));
  const wasm = path.join(dist, 'canvaskit.wasm');
  const skia = [...lazy, ...(existsSync(wasm) ? [wasm] : [])];
  // Skia's web code names this CanvasKit call; the first screen's files must not contain it.
  const firstHasSkia = first.some((f) => readFileSync(f, 'utf8').includes('MakeWebGLCanvasSurface'));
  console.log(`first screen (sign-in): ${kb(firstTotal)} gzipped in ${first.length} files; Skia/CanvasKit code in it: ${firstHasSkia ? 'yes' : 'no'}`);
  for (const f of skia) console.log(`  loaded only on a screen with a chart: ${path.basename(f)} ${kb(gz(f))} gzipped`);
  console.log(`Outlook: ${kb(firstTotal + skia.reduce((s, f) => s + gz(f), 0))} gzipped in all (first screen plus the chart's code and canvaskit.wasm)`);
}

void (async () => {
  bundleBytes();
  await outlookLatency();
})();
