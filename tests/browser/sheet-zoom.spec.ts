/**
 * The builder's sheet preview opened full size and zoomed, with the keyboard alone (WAI-ARIA Authoring
 * Practices, "Dialog (Modal)": Escape closes, focus moves into the dialog and back to the button that opened it).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import type { Knex } from 'knex';
import { BASE_URL, browserLaunch, hydrated, pageNew } from './browser';
import { testKnex } from '../db/database';
import { accountCreate, userSessionCookie } from '../api/auth-helpers';

let browser: Browser;
let knex: Knex;
let cookie: string;

beforeAll(async () => {
  browser = await browserLaunch();
  knex = testKnex();
  const teacher = await accountCreate(knex, { role: 'teacher', label: 'sheet-zoom' });
  cookie = await userSessionCookie(knex, teacher.id);
});
afterAll(async () => {
  await browser?.close();
  await knex?.destroy();
});

describe('sheet preview full size', () => {
  it('opens a sheet full size, zooms with + and −, and closes with Escape back to its button', async () => {
    const { page, errors } = await pageNew(browser);
    const [name, value] = cookie.split('=') as [string, string];
    await page.context().addCookies([{ name, value, url: BASE_URL }]);
    await page.goto('/kits/new?model=skein-probe');
    await hydrated(page);
    const open = page.getByRole('button', { name: 'Full size sheet 1' });
    await open.focus();
    await page.keyboard.press('Enter');
    const dialog = page.getByTestId('sheet-full');
    await dialog.waitFor();
    expect(await dialog.getAttribute('data-zoom')).toBe('1');
    expect(await dialog.locator('svg').count()).toBeGreaterThan(0);
    await dialog.getByRole('region').focus();
    await page.keyboard.press('+');
    await page.keyboard.press('+');
    expect(await dialog.getAttribute('data-zoom')).toBe('2');
    // At 200 % the sheet is twice as wide as the scrolling view, so it scrolls sideways.
    const scroll = await dialog
      .getByRole('region')
      .evaluate((el) => ({ content: el.scrollWidth, view: el.clientWidth }));
    expect(scroll.content).toBeGreaterThan(1.8 * scroll.view);
    await page.screenshot({ path: 'test-results/scan-flow/sheet-zoomed.png' });
    await page.keyboard.press('-');
    expect(await dialog.getAttribute('data-zoom')).toBe('1.5');
    await page.keyboard.press('Escape');
    await dialog.waitFor({ state: 'hidden' });
    expect(await open.evaluate((el) => el === document.activeElement)).toBe(true);
    expect(errors).toEqual([]);
  });
});
