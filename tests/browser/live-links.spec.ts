/**
 * Live links in chromium against the test server: a coordinator creates a link on /links, downloads its bookmark
 * sheet (read back with pdf.js, its QR codes decoded by poppler and jsQR: not the code that wrote them), and a
 * visitor's scan of /go/CODE lands on the target; after the coordinator changes the target, the next scan lands
 * on the new one, and the table counts both scans.
 */
import { readFile } from 'node:fs/promises';
import type { Knex } from 'knex';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { testKnex } from '../db/database';
import { accountCreate, userSessionCookie } from '../api/auth-helpers';
import { pdfPageTexts } from '../fixtures/pdf-text';
import { pdfQrCodes } from '../fixtures/pdf-qr';
import { BASE_URL, browserLaunch, hydrated, pageNew, pageWithSession } from './browser';

let browser: Browser;
let knex: Knex;
let coordinatorCookie: string;

beforeAll(async () => {
  browser = await browserLaunch();
  knex = testKnex();
  const coordinator = await accountCreate(knex, { role: 'coordinator', label: 'links-coord' });
  coordinatorCookie = await userSessionCookie(knex, coordinator.id);
});
afterAll(async () => {
  await browser?.close();
  await knex?.destroy();
});

describe('live links in the browser', () => {
  it('creates a link, prints its bookmarks, and sends each scan to the current target', async () => {
    const { page, errors } = await pageWithSession(browser, coordinatorCookie);
    await page.goto('/links');
    await hydrated(page);
    const title = `Bookmark ${Date.now().toString(36)}`;
    const form = page.getByRole('form', { name: 'New live link' });
    await form.getByLabel('Title').fill(title);
    await form.getByLabel('Target').fill('/activities');
    await form.getByRole('button', { name: 'Create the link' }).click();
    const row = page.getByTestId('live-links').getByRole('row').filter({ hasText: title });
    await row.waitFor();
    const code = (await row.locator('.font-mono').textContent())!.trim();
    expect(code).toMatch(/^[23456789ABCDEFGHJKMNPQRSTUVWXYZ]{6}$/);

    const [download] = await Promise.all([
      page.waitForEvent('download'),
      row.getByRole('link', { name: `Bookmarks PDF of ${code} on US Letter` }).click(),
    ]);
    const pdf = new Uint8Array(await readFile((await download.path())!));
    const address = `${BASE_URL}/go/${code}`;
    const text = (await pdfPageTexts(pdf))[0]!;
    expect(text).toContain(address);
    expect(text).toContain(`Code ${code}`);
    // Three bookmarks side by side (BOOKMARKS_PER_SHEET), one strip each for jsQR.
    expect(await pdfQrCodes(pdf, { parts: 3 })).toEqual([address, address, address]);

    const visitor = await pageNew(browser);
    await visitor.page.goto(`/go/${code}`);
    expect(new URL(visitor.page.url()).pathname).toBe('/activities');

    await row.getByRole('button', { name: 'Change target' }).click();
    await row.getByLabel(`New target of ${code}`).fill('/events');
    await row.getByRole('button', { name: 'Save the target' }).click();
    await row.getByRole('link', { name: '/events' }).waitFor();
    await visitor.page.goto(`/go/${code.toLowerCase()}`);
    expect(new URL(visitor.page.url()).pathname).toBe('/events');

    await page.reload();
    await hydrated(page);
    expect((await row.locator('td').nth(2).textContent())!.trim()).toBe('2');
    expect(errors).toEqual([]);
    expect(visitor.errors).toEqual([]);
  }, 90_000);
});
