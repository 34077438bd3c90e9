/**
 * `npx tsx tests/bench/builder-latency.bench.ts`: against a running server (KW_BENCH_BASE_URL, default
 * http://127.0.0.1:4321, ideally a production build), reports (1) the JavaScript the kit builder page loads
 * (raw and gzip -9, per file, the largest first) and (2) the time from a scale change to the updated sheet
 * preview of the Skein probe in Debian's chromium: Enter in the 1:N field → the summary shows the new scale,
 * the build status is idle and a frame has been painted. Each change uses a
 * new scale (1:21, 1:22, …) so the query cache never answers; restart the server between runs so its cache
 * does not either. (3) the JavaScript the 3D island adds once it scrolls into view. A script, not a timed test.
 */
import { gzipSync } from 'node:zlib';
import { chromium, type BrowserContext } from 'playwright-core';
import { CHROMIUM_FLAGS } from '../browser/browser';

const BASE = process.env.KW_BENCH_BASE_URL ?? 'http://127.0.0.1:4321';
const EMAIL = process.env.KW_BENCH_EMAIL ?? 'teacher@juniper-flats.example';
const PASSWORD = process.env.KW_BENCH_PASSWORD ?? 'demo-teacher-pass-2026';
const CHANGES = Number(process.env.KW_BENCH_CHANGES ?? 15);
const WARMUP = 2;
const JS_TARGET_GZIP_KB = 60;
const LATENCY_TARGET_MS = 300;
const ISLAND_TARGET_GZIP_KB = 300;

const kb = (bytes: number) => (bytes / 1024).toFixed(1);

async function main(): Promise<void> {
  const browser = await chromium.launch({
    executablePath: process.env.KW_CHROMIUM ?? '/usr/bin/chromium',
    args: CHROMIUM_FLAGS,
  });
  const context = await browser.newContext({ baseURL: BASE, viewport: { width: 1280, height: 900 } });
  const signIn = await context.request.post('/api/auth/sign-in', {
    data: { email: EMAIL, password: PASSWORD },
    headers: { origin: BASE },
  });
  if (!signIn.ok()) throw new Error(`sign-in failed: ${signIn.status()} ${await signIn.text()}`);
  const page = await context.newPage();

  const scripts = new Map<string, { raw: number; gzip: number }>();
  page.on('response', async (res) => {
    if (res.request().resourceType() !== 'script') return;
    const body = await res.body().catch(() => null);
    if (body) scripts.set(new URL(res.url()).pathname, { raw: body.length, gzip: gzipSync(body, { level: 9 }).length });
  });
  await page.goto('/kits/new?model=skein-probe', { waitUntil: 'networkidle' });
  await page.waitForFunction(() => !document.querySelector('astro-island[ssr]'));

  const files = [...scripts.entries()].sort((a, b) => b[1].gzip - a[1].gzip);
  const total = files.reduce((s, [, v]) => ({ raw: s.raw + v.raw, gzip: s.gzip + v.gzip }), { raw: 0, gzip: 0 });
  console.log(`JavaScript loaded by /kits/new (no 3D island on this page): ${files.length} files`);
  for (const [path, v] of files)
    console.log(`  ${kb(v.gzip).padStart(6)} kB gzip  ${kb(v.raw).padStart(7)} kB raw  ${path}`);
  console.log(
    `  total ${kb(total.gzip)} kB gzip (${kb(total.raw)} kB raw); target ≤ ${JS_TARGET_GZIP_KB} kB gzip: ${total.gzip / 1024 <= JS_TARGET_GZIP_KB ? 'met' : 'NOT met'}`,
  );

  const field = page.getByLabel('Any scale 1 :');
  const times: number[] = [];
  for (let i = 0; i < WARMUP + CHANGES; i++) {
    const n = 21 + i;
    await field.fill(String(n));
    // Plain JavaScript text: tsx would wrap named functions in helpers the page does not have.
    // The expression ends in `0`: evaluate would otherwise wait for the promise before Enter is pressed.
    await page.evaluate(`window.__kwLatency = new Promise((resolve, reject) => {
      setTimeout(() => reject(new Error('no updated preview within 10 s for 1:${n}; t0 ' + t0 + ', scale ' + document.querySelector('[data-testid="kit-summary"]')?.getAttribute('data-scale') + ', building ' + document.querySelector('[data-testid="build-status"]')?.getAttribute('data-building'))), 10000);
      let t0 = 0;
      document.addEventListener('keydown', (e) => { if (e.key === 'Enter') t0 = performance.now(); }, { capture: true, once: true });
      // Polled every 4 ms (finer than a frame) so nothing depends on which DOM mutations React makes.
      const poll = setInterval(() => {
        const ready = document.querySelector('[data-testid="kit-summary"]')?.getAttribute('data-scale') === '${n}' &&
          document.querySelector('[data-testid="build-status"]')?.getAttribute('data-building') === 'false';
        if (!t0 || !ready) return;
        clearInterval(poll);
        requestAnimationFrame(() => resolve(performance.now() - t0));
      }, 4);
    }); 0`);
    await field.press('Enter');
    const ms = (await page.evaluate('window.__kwLatency')) as number;
    if (i >= WARMUP) times.push(ms);
  }
  times.sort((a, b) => a - b);
  const median =
    times.length % 2 ? times[(times.length - 1) / 2]! : (times[times.length / 2 - 1]! + times[times.length / 2]!) / 2;
  console.log(
    `Scale change → updated sheets (Skein probe, US Letter, ${times.length} changes after ${WARMUP} warm-up): ` +
      `min ${times[0]!.toFixed(0)} ms, median ${median.toFixed(0)} ms, max ${times[times.length - 1]!.toFixed(0)} ms; ` +
      `target ≤ ${LATENCY_TARGET_MS} ms median: ${median <= LATENCY_TARGET_MS ? 'met' : 'NOT met'}`,
  );
  await island3dReport(context);
  await browser.close();
}

/** The JavaScript the 3D island adds to a page: scripts loaded once it scrolls into view and draws. */
async function island3dReport(context: BrowserContext): Promise<void> {
  const page = await context.newPage();
  // A short window keeps the island (client:visible) below the fold until we scroll to it.
  await page.setViewportSize({ width: 1280, height: 150 });
  const scripts = new Map<string, number>();
  page.on('response', async (res) => {
    if (res.request().resourceType() !== 'script') return;
    const body = await res.body().catch(() => null);
    if (body) scripts.set(new URL(res.url()).pathname, gzipSync(body, { level: 9 }).length);
  });
  await page.goto('/preview/skein-probe', { waitUntil: 'networkidle' });
  const before = new Set(scripts.keys());
  await page.getByTestId('fold-preview').scrollIntoViewIfNeeded();
  await page.waitForSelector('[data-scene-ready="true"]', { timeout: 30_000 });
  await page.waitForLoadState('networkidle');
  const added = [...scripts.entries()].filter(([path]) => !before.has(path)).sort((a, b) => b[1] - a[1]);
  const total = added.reduce((sum, [, n]) => sum + n, 0);
  console.log(`JavaScript the 3D island loads (/preview/skein-probe): ${added.length} files`);
  for (const [path, n] of added) console.log(`  ${kb(n).padStart(6)} kB gzip  ${path}`);
  console.log(
    `  total ${kb(total)} kB gzip; target ≤ ${ISLAND_TARGET_GZIP_KB} kB gzip: ${total / 1024 <= ISLAND_TARGET_GZIP_KB ? 'met' : 'NOT met'}`,
  );
  await page.close();
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
