import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { browserLaunch, pageNew } from './browser';

let browser: Browser;
beforeAll(async () => {
  browser = await browserLaunch();
});
afterAll(async () => {
  await browser?.close();
});

describe('activity library', () => {
  it('filters by grade band with the plain form and keeps the choice in the URL', async () => {
    const { page, errors } = await pageNew(browser);
    await page.goto('/activities');
    const all = await page.getByTestId('activity-card').count();
    expect(all).toBeGreaterThanOrEqual(5);
    await page.getByLabel('Grade band').selectOption('3-5');
    await Promise.all([page.waitForURL(/grade=3-5/), page.getByRole('button', { name: 'Show activities' }).click()]);
    const slugs = await page
      .getByTestId('activity-card')
      .evaluateAll((cards) => cards.map((c) => c.getAttribute('data-slug')));
    // Thermal cycling and the clean-room build are written for grades 6-12 only.
    expect(slugs).toContain('shake-test');
    expect(slugs).not.toContain('thermal-cycling');
    expect(slugs).not.toContain('clean-room-build');
    expect(slugs.length).toBeLessThan(all);
    expect(await page.getByLabel('Grade band').inputValue()).toBe('3-5');
    expect(errors).toEqual([]);
  });

  it('opens an activity and shows its safety block, data sheet and kit builder link', async () => {
    const { page, errors } = await pageNew(browser);
    await page.goto('/activities?grade=6-8&kind=magnetic');
    await page.getByRole('link', { name: 'Keep it non-magnetic' }).click();
    await page.waitForURL(/\/activities\/keep-it-non-magnetic$/);
    const safety = page.getByTestId('activity-safety');
    expect(await safety.getByRole('heading', { name: 'Safety for this activity' }).isVisible()).toBe(true);
    expect(await safety.textContent()).toMatch(/pacemaker/);
    expect(await safety.textContent()).toContain("Follow your school's safety rules and local codes");
    const headers = await page.getByTestId('data-sheet-table').locator('th').allTextContents();
    expect(headers.join('|')).toMatch(/Distance.*cm.*Field.*µT/);
    expect(await page.getByTestId('kit-builder-link').first().getAttribute('href')).toBe(
      '/kits/new?model=skein-probe&activity=keep-it-non-magnetic',
    );
    expect(errors).toEqual([]);
  });

  it('serves the student data sheet as a PDF and an unknown activity as a 404', async () => {
    const { page } = await pageNew(browser);
    const pdf = await page.request.get('/activities/shake-test/data-sheet.pdf');
    expect(pdf.status()).toBe(200);
    expect(pdf.headers()['content-type']).toBe('application/pdf');
    expect((await pdf.body()).subarray(0, 5).toString()).toBe('%PDF-');
    const missing = await page.goto('/activities/no-such-activity');
    expect(missing?.status()).toBe(404);
  });
});
