/**
 * Launches Debian's chromium through playwright-core with the flags this machine needs (DEVELOPERS.md), and
 * gives specs the base URL of the test server.
 */
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
