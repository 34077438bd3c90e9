/**
 * The class journal end to end in chromium: a teacher runs the shake-test tool on its sample, saves the result to
 * a new draft with "Save to the class journal", writes the entry, adds a photo with its description, confirms the
 * photo statement and submits; a coordinator finds the entry in the review queue with the keyboard alone, opens
 * it, ticks the checklist and publishes; the public activity journal then shows it with its plot and photo.
 */
import type { Knex } from 'knex';
import type { Browser, Page } from 'playwright-core';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { testKnex } from '../db/database';
import { accountCreate, classCreateDirect, classSessionCookie, userSessionCookie } from '../api/auth-helpers';
import { BASE_URL, browserLaunch, pageNew } from './browser';

// A navigation is done when the document is parsed; the island waits that follow are the real readiness checks,
// and waiting for every image and chart under a loaded shared machine only adds flakiness.
const DOM_READY = { waitUntil: 'domcontentloaded' } as const;

let browser: Browser;
let knex: Knex;
const cookies = { teacher: '', coordinator: '', team: '' };
let className = '';
let classId = '';

/** Waits until the named client:load island has hydrated (client:visible ones wait for scrolling, so not all). */
async function islandReady(page: Page, component: string): Promise<void> {
  await page.locator(`astro-island[component-url*="${component}"]:not([ssr])`).first().waitFor({ state: 'attached' });
}

async function pageAs(who: keyof typeof cookies): Promise<{ page: Page; errors: string[] }> {
  const { page, errors } = await pageNew(browser);
  page.setDefaultTimeout(15_000);
  const [name, value] = cookies[who].split(/=(.*)/s) as [string, string];
  await page.context().addCookies([{ name, value, url: BASE_URL }]);
  return { page, errors };
}

beforeAll(async () => {
  browser = await browserLaunch();
  knex = testKnex();
  const teacher = await accountCreate(knex, { role: 'teacher', label: 'journal-teacher' });
  const coordinator = await accountCreate(knex, { role: 'coordinator', label: 'journal-coord' });
  className = `Journal class ${Date.now().toString(36)}`;
  const klass = await classCreateDirect(knex, teacher, className);
  classId = klass.id;
  cookies.team = await classSessionCookie(knex, klass.id);
  cookies.teacher = await userSessionCookie(knex, teacher.id);
  cookies.coordinator = await userSessionCookie(knex, coordinator.id);
}, 60_000);

afterAll(async () => {
  await browser?.close();
  await knex?.destroy();
});

describe('class journal', () => {
  it('goes from a tool result to a published entry on the public journal page', async () => {
    const title = `Shake table day ${Date.now().toString(36)}`;
    const teacher = await pageAs('teacher');
    let page = teacher.page;

    // The tool: run the sample, save its result into a new draft.
    await page.goto('/tools/vibration');
    await islandReady(page, 'VibrationTool');
    await page.getByRole('button', { name: 'Load sample data' }).first().click();
    await page.getByRole('button', { name: 'Save to the class journal' }).first().click();
    const panel = page.getByTestId('save-to-journal');
    await panel.getByLabel('Save into').selectOption('new');
    await panel.getByLabel('Class').selectOption({ label: className });
    await panel.getByLabel('Entry title').fill(title);
    await panel.getByRole('button', { name: 'Save the result' }).click();
    await expect.poll(() => panel.getByRole('status').textContent()).toContain(title);
    await panel.getByRole('link', { name: 'Open the entry' }).click();
    await page.waitForURL(/\/entries\/[0-9a-f-]+\/edit$/, DOM_READY);
    const entryId = /entries\/([0-9a-f-]+)\/edit/.exec(page.url())![1]!;
    await islandReady(page, 'EntryEditor');
    await islandReady(page, 'EntryPhotos');

    // The editor: body, activity, preview, a photo with its description.
    expect(await page.getByTestId('entry-results').textContent()).toMatch(/PSD|Grms|acceleration/i);
    await page.getByLabel('What your class did and found').fill('We shook the **Skein** probe for 10 s.');
    await page.getByLabel('Activity').selectOption('shake-test');
    await page.getByRole('tab', { name: /Preview/ }).click();
    await expect.poll(() => page.getByTestId('entry-preview').innerHTML()).toContain('<strong>Skein</strong>');
    const photo = await sharp({ create: { width: 320, height: 240, channels: 3, background: '#2b3a67' } })
      .jpeg()
      .toBuffer();
    await page.getByLabel(/Add photos/).setInputFiles({ name: 'probe.jpg', mimeType: 'image/jpeg', buffer: photo });
    await page.getByLabel('What “probe.jpg” shows').fill('The paper probe taped to the shake table');
    await page.getByRole('button', { name: 'Upload 1 photo(s)' }).click();
    await expect.poll(() => page.getByTestId('entry-photo').count()).toBe(1);

    // Submitting needs the photo statement ticked.
    await page.reload();
    await islandReady(page, 'EntryActions');
    const submit = page.getByRole('button', { name: 'Submit for review' });
    expect(await submit.isDisabled()).toBe(true);
    await page.getByRole('checkbox', { name: /I confirm/ }).check();
    await submit.click();
    await page.waitForURL(new RegExp(`/journal/${entryId}$`), DOM_READY);
    expect(await page.getByTestId('entry-state').textContent()).toContain('Submitted');
    await page.context().close();

    // Not public yet.
    expect((await fetch(`${BASE_URL}/journal/${entryId}`)).status).toBe(404);

    // The coordinator: the queue, newest first, found and opened with the keyboard.
    const coordinator = await pageAs('coordinator');
    page = coordinator.page;
    await page.goto('/review');
    await islandReady(page, 'ReviewQueue');
    // Newest first: the queue asks the server for the new order; wait for that page before moving through it.
    const resorted = page.waitForResponse((r) => r.url().includes('/api/review/queue') && r.url().includes('dir=desc'));
    await page.getByRole('button', { name: /Waiting/ }).click();
    await resorted;
    await page.waitForFunction(() => document.querySelector('th[aria-sort="ascending"]') !== null);
    await page.locator(`[data-testid="review-queue"] tbody tr[data-entry-id="${entryId}"]`).waitFor();
    await page.locator('[data-testid="review-queue"] tbody tr').first().focus();
    for (let i = 0; i < 30; i++) {
      const focused = await page.evaluate(() => document.activeElement?.getAttribute('data-entry-id'));
      if (focused === entryId) break;
      await page.keyboard.press('ArrowDown');
    }
    expect(await page.evaluate(() => document.activeElement?.getAttribute('data-entry-id'))).toBe(entryId);
    await page.keyboard.press('Enter');
    await page.waitForURL(new RegExp(`/review/${entryId}$`), DOM_READY);
    await islandReady(page, 'ReviewDecision');
    expect(await page.getByTestId('photo-release').textContent()).toContain('confirmed');
    const publish = page.getByRole('button', { name: 'Publish', exact: true });
    expect(await publish.isDisabled()).toBe(true);
    for (const box of await page.getByTestId('review-decision').getByRole('checkbox').all()) await box.check();
    await publish.click();
    await page.waitForURL(/\/review\?decided=published$/, DOM_READY);
    await page.screenshot({ path: '.data/journals-queue.png', fullPage: true });
    await page.context().close();

    // Public: the activity's journal lists it with its plot and photo.
    const visitor = await pageNew(browser);
    page = visitor.page;
    await page.goto('/activities/shake-test/journal');
    const item = page.locator(`[data-entry-id="${entryId}"]`);
    expect(await item.getByRole('heading').textContent()).toContain(title);
    await item.getByTestId('plot').first().scrollIntoViewIfNeeded();
    await expect.poll(() => item.locator('[data-testid="plot"][data-ready="true"]').count()).toBe(1);
    expect(await item.getByRole('img', { name: 'The paper probe taped to the shake table' }).count()).toBe(1);
    await page.goto(`/journal/${entryId}`);
    await page.screenshot({ path: '.data/journals-entry.png', fullPage: true });
    expect(visitor.errors).toEqual([]);
    await page.context().close();
  }, 120_000);

  it('sends an entry back with a note: off the public pages, and an editable draft with the note for the teacher', async () => {
    const title = `Sent back ${Date.now().toString(36)}`;
    const note = 'Please say which glue held the tabs, then submit again.';
    const post = async (path: string, body: unknown) => {
      const res = await fetch(`${BASE_URL}${path}`, {
        method: 'POST',
        headers: { cookie: cookies.teacher, origin: BASE_URL, 'content-type': 'application/json' },
        body: JSON.stringify(body),
      });
      expect(res.status, await res.clone().text()).toBeLessThan(300);
      return res.json() as Promise<{ entry: { id: string } }>;
    };
    const entryId = (await post('/api/entries', { classId, title, activitySlug: 'shake-test', body: 'We shook it.' }))
      .entry.id;
    await post(`/api/entries/${entryId}/submit`, {});

    const coordinator = await pageAs('coordinator');
    let page = coordinator.page;
    await page.goto(`/review/${entryId}`);
    await islandReady(page, 'ReviewDecision');
    const sendBack = page.getByRole('button', { name: 'Send back with the note' });
    expect(await sendBack.isDisabled()).toBe(true);
    await page.getByLabel('Note to the teacher').fill(note);
    await sendBack.click();
    await page.waitForURL(/\/review\?decided=returned$/, DOM_READY);
    await page.context().close();

    // Off every public page.
    expect((await fetch(`${BASE_URL}/journal/${entryId}`)).status).toBe(404);
    expect(await (await fetch(`${BASE_URL}/activities/shake-test/journal`)).text()).not.toContain(title);

    // Back with the teacher: the note shown above an editor that saves.
    const teacher = await pageAs('teacher');
    page = teacher.page;
    await page.goto('/entries');
    const row = page.locator(`tr[data-entry-id="${entryId}"]`);
    expect(await row.getByTestId('entry-state').textContent()).toContain('Returned for changes');
    await page.goto(`/entries/${entryId}/edit`);
    await islandReady(page, 'EntryEditor');
    expect(await page.getByTestId('review-note').textContent()).toContain(note);
    const body = page.getByLabel('What your class did and found');
    expect(await body.isEditable()).toBe(true);
    await body.fill('We shook it. The white glue held the tabs; the glue stick did not.');
    const saved = page.waitForResponse(
      (r) => r.url().endsWith(`/api/entries/${entryId}`) && r.request().method() === 'PATCH',
    );
    await page.getByRole('button', { name: 'Save draft' }).click();
    expect((await saved).status()).toBe(200);
    expect(teacher.errors).toEqual([]);
    await page.context().close();
  }, 90_000);

  it('holds a team entry written through the class session until the teacher approves it', async () => {
    const title = `Team test ${Date.now().toString(36)}`;
    const team = await pageAs('team');
    let page = team.page;
    await page.goto('/entries');
    await islandReady(page, 'EntryNewForm');
    await page.getByLabel('Team name').fill('Team Orbit');
    await page.getByLabel('Title').fill(title);
    await page.getByRole('button', { name: 'Start the entry' }).click();
    await page.waitForURL(/\/entries\/[0-9a-f-]+\/edit$/, DOM_READY);
    const entryId = /entries\/([0-9a-f-]+)\/edit/.exec(page.url())![1]!;
    await islandReady(page, 'EntryActions');
    await page.getByLabel('What your class did and found').fill('Our boom opened 4 times out of 5.');
    await page.getByRole('button', { name: 'Save draft' }).click();
    await page.getByRole('status').filter({ hasText: 'Draft saved' }).waitFor();
    await page.getByRole('button', { name: 'Send to our teacher' }).click();
    await page.waitForURL(new RegExp(`/journal/${entryId}$`), DOM_READY);
    expect(await page.getByTestId('entry-state').textContent()).toContain('Waiting for the teacher’s approval');
    await page.context().close();

    // Not in the queue before the teacher approves it.
    const queued = async () => {
      const res = await fetch(`${BASE_URL}/api/review/queue?pageSize=100&sort=submitted&dir=desc`, {
        headers: { cookie: cookies.coordinator },
      });
      return ((await res.json()) as { entries: { id: string }[] }).entries.some((e) => e.id === entryId);
    };
    expect(await queued()).toBe(false);

    const teacher = await pageAs('teacher');
    page = teacher.page;
    await page.goto(`/journal/${entryId}`);
    await islandReady(page, 'EntryActions');
    await page.getByRole('checkbox', { name: /I confirm/ }).check();
    await page.getByRole('button', { name: 'Approve and send for review' }).click();
    await page.waitForFunction(
      () => !document.querySelector('[data-testid="entry-state"]')?.textContent?.includes('approval'),
    );
    expect(await page.getByTestId('entry-state').textContent()).toContain('Submitted');
    expect(await queued()).toBe(true);
    expect(teacher.errors).toEqual([]);
    await page.context().close();
  }, 60_000);
});
