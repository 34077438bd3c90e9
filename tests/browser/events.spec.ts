/**
 * Events in chromium against the test server and its mail worker: a coordinator plans and publishes a
 * one-place event; a teacher registers by name and e-mail, confirms from the mailed link and cancels from the
 * next mail; the event fills and the next registrant lands on the waiting list; the coordinator sees both and
 * records attendance as a count per school. A coordinator creates a live link, downloads its bookmark sheet (read
 * back with pdf.js, its QR codes decoded by poppler and jsQR: not the code that wrote them), and a visitor's scan
 * of /go/CODE lands on the target, the next scan after a change of target on the new one.
 */
import { readFile } from 'node:fs/promises';
import type { Knex } from 'knex';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { testKnex } from '../db/database';
import { accountCreate, emailUnique, linkIn, mailWait, userSessionCookie } from '../api/auth-helpers';
import { pdfPageTexts } from '../fixtures/pdf-text';
import { pdfQrCodes } from '../fixtures/pdf-qr';
import { BASE_URL, browserLaunch, hydrated, pageNew, pageWithSession } from './browser';

let browser: Browser;
let knex: Knex;
let coordinatorCookie: string;

beforeAll(async () => {
  browser = await browserLaunch();
  knex = testKnex();
  const coordinator = await accountCreate(knex, { role: 'coordinator', label: 'events-coord' });
  coordinatorCookie = await userSessionCookie(knex, coordinator.id);
});
afterAll(async () => {
  await browser?.close();
  await knex?.destroy();
});

function pageAsCoordinator(): Promise<{ page: Page; errors: string[] }> {
  return pageWithSession(browser, coordinatorCookie);
}

/** Registers on the public page by name and e-mail and opens the confirmation link from the mail. */
async function registerByEmail(eventPath: string, name: string, email: string): Promise<Page> {
  const { page } = await pageNew(browser);
  await page.goto(eventPath);
  await hydrated(page);
  await page.getByLabel('Your name').fill(name);
  await page.getByLabel('School e-mail address').fill(email);
  await page.getByLabel('School', { exact: true }).selectOption({ label: 'Larkspur Elementary (Larkspur)' });
  await page.getByRole('button', { name: /Register|Join the waiting list/ }).click();
  await page
    .getByRole('status')
    .filter({ hasText: `we sent a link to ${email}` })
    .waitFor();
  const mail = await mailWait(email, /Confirm your registration/);
  const link = linkIn(mail, '/events/registration');
  await page.goto(link.pathname + link.search);
  await hydrated(page);
  expect(await page.getByTestId('registration-state').textContent()).toBe('waiting for your confirmation');
  await page.getByRole('button', { name: 'Confirm my registration' }).click();
  return page;
}

describe('events in the browser', () => {
  it('plans, publishes, fills, waitlists, cancels and records attendance', async () => {
    const { page, errors } = await pageAsCoordinator();
    await page.goto('/events/manage/new');
    await hydrated(page);
    const title = `Boom layout ${Date.now().toString(36)}`;
    await page.getByLabel('Title').fill(title);
    await page.getByLabel('Kind').selectOption('workshop');
    await page.getByLabel('Places').fill('1');
    await page.getByLabel('Starts (time at the venue)').fill('2031-04-14T13:30');
    await page.getByLabel('Venue time zone').selectOption('America/Denver');
    await page.getByLabel('Venue', { exact: true }).fill('Gym');
    await page.getByRole('button', { name: 'Save as a draft' }).click();
    await page.waitForURL(/\/events\/manage\/[0-9a-f-]{36}$/);
    const eventId = page.url().split('/').at(-1)!;
    expect(await page.getByTestId('event-state').textContent()).toBe('Draft');

    // A draft does not exist for the public.
    const anonymous = await pageNew(browser);
    expect((await anonymous.page.goto(`/events/${eventId}`))!.status()).toBe(404);

    await hydrated(page);
    await page.getByRole('button', { name: 'Publish' }).click();
    await page.getByTestId('event-state').filter({ hasText: 'Published' }).waitFor();

    // The first registrant confirms from the mail and gets the one place.
    const first = emailUnique('ev-first');
    const firstPage = await registerByEmail(`/events/${eventId}`, 'Robin Field', first);
    await firstPage.getByText('you have a place').waitFor();
    const placeMail = await mailWait(first, /You are registered/);

    // The event is full: the next registrant confirms onto the waiting list.
    await anonymous.page.goto(`/events/${eventId}`);
    expect(await anonymous.page.getByTestId('event-places').textContent()).toMatch(/^Full/);
    const second = emailUnique('ev-second');
    const secondPage = await registerByEmail(`/events/${eventId}`, 'Sam Stake', second);
    await secondPage.getByText('number 1 on the waiting list').waitFor();

    // The first cancels from the link in the place mail; the place moves to the second.
    const cancel = linkIn(placeMail, '/events/registration');
    await firstPage.goto(cancel.pathname + cancel.search);
    await hydrated(firstPage);
    await firstPage.getByRole('button', { name: 'Cancel my registration' }).click();
    await firstPage.getByText('Your place went to the first person on the waiting list').waitFor();
    await mailWait(second, /A place came free/);

    // The coordinator sees the change and records attendance per school.
    await page.reload();
    await hydrated(page);
    const table = page.getByTestId('registrations');
    expect(await table.getByRole('row').filter({ hasText: 'Sam Stake' }).textContent()).toContain('Place');
    expect(await table.getByRole('row').filter({ hasText: 'Robin Field' }).textContent()).toContain('Cancelled');
    await page.getByLabel('People who came, row 1').fill('14');
    await page.getByRole('button', { name: 'Save attendance' }).click();
    await page.getByRole('status').filter({ hasText: 'Attendance saved: 14 people from 1 school' }).waitFor();
    const recorded = await knex('event_attendance').where({ event_id: eventId }).select('attendee_count');
    expect(recorded.map((r) => r.attendee_count)).toEqual([14]);
    expect(errors).toEqual([]);
  }, 90_000);

  it("downloads the big build's plan for another venue, which says the span does not fit there", async () => {
    const { page, errors } = await pageAsCoordinator();
    const event = (await knex('events').where({ kind: 'big_build', state: 'published' }).first('id')) as { id: string };
    // The plan's form is plain HTML: it works before (or without) the page's islands.
    await page.goto(`/events/manage/${event.id}`);
    const plan = page.getByRole('region', { name: 'Big-build plan' });
    await plan.getByLabel('Venue').selectOption({ label: 'classroom (9 × 7 m)' });
    await plan.getByLabel('Paper').selectOption('a4');
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      plan.getByRole('button', { name: 'Download the plan (PDF)' }).click(),
    ]);
    // Read back with pdf.js, not the code that wrote it.
    const text = (await pdfPageTexts(new Uint8Array(await readFile((await download.path())!)))).join('\n');
    expect(text).toContain('classroom (9 × 7 m)');
    expect(text).toContain('It does not fit at 1:');
    expect(text).toContain('Stake-out table');
    expect(errors).toEqual([]);
  }, 60_000);

  it('creates a link, prints its bookmarks, and sends each scan to the current target', async () => {
    const { page, errors } = await pageAsCoordinator();
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
