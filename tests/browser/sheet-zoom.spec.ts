/**
 * The builder's sheet preview opened full size and zoomed, with the keyboard alone (WAI-ARIA Authoring
 * Practices, "Dialog (Modal)": Escape closes, focus moves into the dialog and back to the button that opened it),
 * and the numbered marks on pieces that fall short of the class's minimums, each leading to its note.
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

/** A signed-in teacher's builder for the Skein, hydrated. */
async function builderOpened() {
  const opened = await pageNew(browser);
  const [name, value] = cookie.split('=') as [string, string];
  await opened.page.context().addCookies([{ name, value, url: BASE_URL }]);
  await opened.page.goto('/kits/new?model=skein-probe');
  await hydrated(opened.page);
  return opened;
}

describe('sheet preview full size', () => {
  it('opens a sheet full size, zooms with + and −, and closes with Escape back to its button', async () => {
    const { page, errors } = await builderOpened();
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

  it('marks a piece too small for the class and lists its note, on the sheet and full size', async () => {
    const { page, errors } = await builderOpened();
    const summary = page.getByTestId('sheet-notes-summary');
    // The suggested 1:25 for grades 6–8 keeps every piece big enough.
    await page.getByRole('button', { name: /^1:25( \(suggested\))?$/ }).click();
    await summary.filter({ hasText: 'Every piece meets the minimums for grades 6–8.' }).waitFor();
    // At 1:50 the dish is a 0.6 m / 50 = 12 mm disc, under the 15 mm piece grades 6–8 cut.
    await page.getByRole('button', { name: '1:50', exact: true }).click();
    await summary.filter({ hasText: /1 piece falls short of the minimums for grades 6–8/ }).waitFor();
    const dishMark = /^Note \d+: Dish antenna$/;
    await page.getByTestId('sheet-previews').getByRole('button', { name: dishMark }).focus();
    await page.keyboard.press('Enter');
    const focused = await page.evaluate(() => document.activeElement?.closest('[data-testid="sheet-notes"]') !== null);
    expect(focused).toBe(true);
    expect(await page.evaluate(() => document.activeElement?.textContent)).toContain(
      'Dish antenna: The piece is 12 mm across; grades 6–8 need 15 mm',
    );
    await page.screenshot({ path: 'test-results/scan-flow/sheet-notes.png', fullPage: true });
    await page.getByRole('button', { name: 'Full size sheet 1' }).click();
    const dialog = page.getByTestId('sheet-full');
    await dialog.getByRole('button', { name: dishMark }).waitFor();
    expect(await dialog.getByTestId('sheet-notes').textContent()).toContain('Dish antenna');
    await page.screenshot({ path: 'test-results/scan-flow/sheet-notes-full.png' });
    expect(errors).toEqual([]);
  });
});
