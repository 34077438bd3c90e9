/**
 * Launches Debian's chromium through playwright-core with the flags this machine needs (DEVELOPERS.md), and
 * gives specs the base URL of the test server.
 */
import { readFileSync } from 'node:fs';
import { chromium, type Browser, type Page } from 'playwright-core';

export const BASE_URL = process.env.KW_TEST_BASE_URL ?? 'http://127.0.0.1:4322';

export const CHROMIUM_FLAGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--enable-unsafe-swiftshader',
];

/** A fresh browser; close it in afterAll. */
export function browserLaunch(): Promise<Browser> {
  return chromium.launch({ executablePath: process.env.KW_CHROMIUM ?? '/usr/bin/chromium', args: CHROMIUM_FLAGS });
}

/** A new page in a fresh context (own cookies), with console errors collected. */
export async function pageNew(browser: Browser): Promise<{ page: Page; errors: string[] }> {
  const context = await browser.newContext({
    baseURL: BASE_URL,
    viewport: { width: 1280, height: 900 },
    acceptDownloads: true,
  });
  const page = await context.newPage();
  const errors: string[] = [];
  page.on('pageerror', (err) => errors.push(err.message));
  return { page, errors };
}

/** A new page like pageNew, signed in with a session's Cookie header value (`name=value`). */
export async function pageWithSession(browser: Browser, cookie: string): Promise<{ page: Page; errors: string[] }> {
  const opened = await pageNew(browser);
  const [name, value] = cookie.split(/=(.*)/s) as [string, string];
  await opened.page.context().addCookies([{ name, value, url: BASE_URL }]);
  return opened;
}

/** Waits until every island on the page has hydrated (Astro drops the `ssr` attribute then). */
export async function hydrated(page: Page): Promise<void> {
  await page.waitForFunction(() => !document.querySelector('astro-island[ssr]'));
}

/** axe-core's serious and critical violations on the current page, as `id: first targets`. */
export async function axeSerious(page: Page): Promise<string[]> {
  // Evaluated, not added as a <script>: the pages' Content-Security-Policy refuses inline scripts it has no hash for.
  await page.evaluate(readFileSync('node_modules/axe-core/axe.min.js', 'utf8'));
  const violations = await page.evaluate(async () => {
    // axe is the global the script tag defines.
    const { axe } = window as unknown as {
      axe: { run: () => Promise<{ violations: { id: string; impact: string; nodes: { target: string[] }[] }[] }> };
    };
    return (await axe.run()).violations;
  });
  return violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map(
      (v) =>
        `${v.id}: ${v.nodes
          .map((n) => n.target.join(' '))
          .slice(0, 3)
          .join(', ')}`,
    );
}

/** Saves a kit through the API with the page's cookies: demo defaults (Letter, 160 g/m², one copy) overridden. */
export function kitSaveRequest(page: Page, classId: string, inputs: Record<string, unknown>) {
  return page.request.post('/api/kits', {
    data: {
      classId,
      inputs: {
        paperGsm: 160,
        sheetSizeId: 'letter',
        copies: 1,
        units: 'metric',
        venue: { kind: 'preset', id: 'classroom' },
        ...inputs,
      },
    },
    headers: { origin: BASE_URL },
  });
}
