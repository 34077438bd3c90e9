import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { HAZARD_CAUTIONS, SAFETY_GENERAL_NOTE } from '../../src/lib/activities/safety';
import { pdfPageTexts, pdfTextSquash as squash } from '../fixtures/pdf-text';
import { activitiesParsed } from '../lib/activities/activity-files';
import { BASE_URL, browserLaunch, pageNew } from './browser';

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

  it('serves the student data sheet and the teacher guide as PDFs and an unknown activity as a 404', async () => {
    const { page } = await pageNew(browser);
    // What the pages must say comes from the activity's own file (content/activities/shake-test.md).
    const activity = activitiesParsed().find((a) => a.slug === 'shake-test')!;
    const pdf = await page.request.get('/activities/shake-test/data-sheet.pdf');
    expect(pdf.status()).toBe(200);
    expect(pdf.headers()['content-type']).toBe('application/pdf');
    // Read back by pdf.js, a reader independent of the jspdf that wrote it: one page with the sheet's title,
    // the team line and every field and column the students fill in.
    const sheet = await pdfPageTexts(new Uint8Array(await pdf.body()));
    expect(sheet).toHaveLength(1);
    const sheetText = squash(sheet[0]!);
    expect(sheetText).toContain(squash(`Data sheet · ${activity.title}`));
    expect(sheetText).toContain(squash('Class code:'));
    for (const c of [...activity.record.fields, ...activity.record.columns])
      expect(sheetText).toContain(squash(c.name));
    const guide = await page.request.get('/activities/shake-test/guide.pdf');
    expect(guide.status()).toBe(200);
    expect(guide.headers()['content-type']).toBe('application/pdf');
    const guidePages = await pdfPageTexts(new Uint8Array(await guide.body()));
    // The title and the safety block lead the first page: each declared hazard's caution, the activity's own
    // notes and the school-rules note.
    const first = squash(guidePages[0]!);
    expect(first).toContain(squash(activity.title));
    expect(first).toContain('Safetyfirst');
    expect(activity.safety?.hazards.length).toBeGreaterThan(0);
    for (const h of activity.safety!.hazards) expect(first, h).toContain(squash(HAZARD_CAUTIONS[h].caution));
    for (const note of activity.safety!.notes) expect(first).toContain(squash(note));
    expect(first).toContain(squash(SAFETY_GENERAL_NOTE));
    // Its links print with the site's own origin.
    const all = squash(guidePages.join(' '));
    expect(all).toContain(squash(`${BASE_URL}/activities/shake-test/data-sheet.pdf`));
    const missing = await page.goto('/activities/no-such-activity');
    expect(missing?.status()).toBe(404);
  });
});
