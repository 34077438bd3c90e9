/**
 * Reach in chromium against the test server: a coordinator opens the dashboard, downloads the quarterly PDF
 * (read back with pdf.js: page 1 states the headline figures on screen), filters by high-need and exports
 * the breakdown CSV (read back with papaparse: the rows on screen, every page) and the last eight quarters' CSV
 * (the trend table on screen); then handles teachers'
 * proposed schools on the directory page — edits and accepts one, merges another into the school it
 * duplicates — and the database shows its teacher, class and event at the kept school.
 */
import { readFile } from 'node:fs/promises';
import type { Knex } from 'knex';
import Papa from 'papaparse';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { testKnex } from '../db/database';
import { pdfPageTexts } from '../fixtures/pdf-text';
import { schoolWithMostKits } from '../fixtures/reach-schools';
import { dateIso, quarterOf, quartersEnding, REACH_TREND_QUARTERS } from '../../src/lib/reach/period';
import { accountCreate, classCreateDirect, userSessionCookie } from '../api/auth-helpers';
import { axeSerious, browserLaunch, hydrated, pageWithSession } from './browser';

let browser: Browser;
let knex: Knex;
let coordinatorCookie: string;
const tag = Date.now().toString(36);

beforeAll(async () => {
  browser = await browserLaunch();
  knex = testKnex();
  const coordinator = await accountCreate(knex, { role: 'coordinator', label: 'reach-browser' });
  coordinatorCookie = await userSessionCookie(knex, coordinator.id);
});
afterAll(async () => {
  await browser?.close();
  await knex?.destroy();
});

function pageAsCoordinator(): Promise<{ page: Page; errors: string[] }> {
  return pageWithSession(browser, coordinatorCookie);
}

/** Clicks a link that answers with an attachment and returns the file's bytes. */
async function downloadBytes(page: Page, testId: string): Promise<Buffer> {
  const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId(testId).click()]);
  return readFile((await download.path())!);
}

/** Waits until a table has drawn its newest answer: the island clears aria-busy once the rows are set. */
async function tableSettled(page: Page, testId: string): Promise<void> {
  await page.locator(`[data-testid="${testId}"][aria-busy="false"]`).waitFor();
}

/** The breakdown table's body rows as cell texts, collected over every page with its Next button. */
async function breakdownRowsOnScreen(page: Page): Promise<string[][]> {
  const rows: string[][] = [];
  for (;;) {
    rows.push(
      ...(await page
        .getByTestId('breakdown-table')
        .locator('tbody tr')
        .evaluateAll((trs) => trs.map((tr) => [...tr.querySelectorAll('td')].map((td) => td.textContent ?? '')))),
    );
    const next = page.getByRole('button', { name: 'Next' });
    if (await next.isDisabled()) return rows;
    const [answer] = await Promise.all([
      page.waitForResponse((r) => r.url().includes('/api/reach/breakdown?')),
      next.click(),
    ]);
    await answer.finished();
    await tableSettled(page, 'breakdown-table');
  }
}

/** A cell as the CSV holds it: OWASP "CSV Injection" — text starting with = + - @ tab or CR is prefixed with '. */
const csvCell = (text: string) => (/^[=+\-@\t\r]/.test(text) ? `'${text}` : text);

async function schoolInsert(name: string, status: 'approved' | 'proposed'): Promise<string> {
  const [row] = await knex('schools')
    .insert({ name, city: `Tamarack ${tag}`, region: `Reach Browser ${tag}`, status })
    .returning(['id']);
  return row.id;
}

describe('the reach dashboard in the browser', () => {
  it('downloads a PDF whose page 1 states the headline figures, and a high-need CSV equal to the table', async () => {
    const { page, errors } = await pageAsCoordinator();
    await page.goto('/reach');
    await hydrated(page);
    const headline = await page
      .getByTestId('headline-figures')
      .locator('li[data-figure]')
      .evaluateAll((lis) =>
        lis.map((li) => ({
          label: li.querySelector('p')!.textContent!,
          value: Number(li.querySelector('[data-value]')!.getAttribute('data-value')),
        })),
      );
    expect(headline.length).toBeGreaterThan(0);
    // The demo seed dates its kits and entries days before today, so this quarter counts something.
    expect(headline.some((f) => f.value > 0)).toBe(true);

    const pdf = await downloadBytes(page, 'report-pdf');
    const pages = await pdfPageTexts(new Uint8Array(pdf));
    const page1 = pages[0]!.replace(/\n/g, ' ');
    for (const f of headline) expect(page1, f.label).toContain(`${f.label}: ${f.value.toLocaleString('en-US')}`);

    const [answer, trendAnswer] = await Promise.all([
      page.waitForResponse((r) => r.url().includes('/api/reach/breakdown?') && r.url().includes('highNeed=true')),
      page.waitForResponse(
        (r) => r.url().includes('/api/reach/figures?') && r.url().includes('bucket=quarter&highNeed=true'),
      ),
      page.locator('select[name="highNeed"]').selectOption('true'),
    ]);
    const { total } = (await answer.json()) as { total: number };
    await page.getByText(`· ${total} rows`).waitFor();
    const onScreen = await breakdownRowsOnScreen(page);
    expect(onScreen.length).toBe(total);
    // The demo seed's high-need schools built kits this quarter, so the filtered table is not empty.
    expect(total).toBeGreaterThan(0);

    const csv = (await downloadBytes(page, 'breakdown-csv')).toString('utf8').replace(/^\uFEFF/, '');
    const parsed = Papa.parse<string[]>(csv, { skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    const [header, ...rows] = parsed.data;
    const headings = await page.getByTestId('breakdown-table').locator('thead th').allTextContents();
    expect(header).toEqual(headings.map((h) => h.replace(/ [▲▼]$/, '')));
    expect(rows).toEqual(onScreen.map((r) => r.map(csvCell)));
    // Every school the filtered table counts is flagged high-need in the database.
    const names = onScreen.map((r) => r[0]!).filter((n) => n !== '');
    const flags = await knex('schools').whereIn('name', names).distinct('high_need');
    expect(flags.map((f) => f.high_need)).toEqual(names.length ? [true] : []);

    // The last eight quarters under the same filter: the table on screen is its CSV, row for row.
    await trendAnswer.finished();
    await tableSettled(page, 'trend-table');
    const trendTable = page.getByTestId('trend-table');
    const trendRows = await trendTable
      .locator('tbody tr')
      .evaluateAll((trs) => trs.map((tr) => [...tr.querySelectorAll('td')].map((td) => td.textContent ?? '')));
    expect(trendRows.length).toBe(8);
    const trendCsv = (await downloadBytes(page, 'trend-csv')).toString('utf8').replace(/^\uFEFF/, '');
    const [trendHeader, ...trendCsvRows] = Papa.parse<string[]>(trendCsv, { skipEmptyLines: true }).data;
    expect(trendHeader).toEqual(await trendTable.locator('thead th').allTextContents());
    expect(trendCsvRows).toEqual(trendRows);
    expect(errors).toEqual([]);
  });
});

describe('proposed schools in the browser', () => {
  it('edits and accepts one proposal, and merges another with its teacher, class and event', async () => {
    const keep = await schoolInsert(`Tamarack Ridge Middle School ${tag}`, 'approved');
    const duplicate = await schoolInsert(`Tamarack Ridge Middle ${tag}`, 'proposed');
    const fresh = await schoolInsert(`Sorrel Brook Elementary ${tag}`, 'proposed');
    const teacher = await accountCreate(knex, { role: 'teacher', label: 'reach-merge', schoolId: duplicate });
    const klass = await classCreateDirect(knex, teacher, `Merge class ${tag}`);
    const [event] = await knex('events')
      .insert({
        title: `Merge build ${tag}`,
        kind: 'workshop',
        state: 'draft',
        school_id: duplicate,
        starts_at: new Date(),
      })
      .returning(['id']);

    const { page, errors } = await pageAsCoordinator();
    await page.goto('/reach/schools');
    await hydrated(page);

    const freshCard = page.locator(`li[data-school="${fresh}"]`);
    await freshCard.getByRole('button', { name: 'Edit' }).click();
    // Keyboard use: the form takes the focus, Escape closes it and gives the focus back to its button.
    expect(await freshCard.getByLabel('Name').evaluate((el) => el === document.activeElement)).toBe(true);
    await page.keyboard.press('Escape');
    expect(await freshCard.getByLabel('Name').count()).toBe(0);
    expect(await freshCard.getByRole('button', { name: 'Edit' }).evaluate((el) => el === document.activeElement)).toBe(
      true,
    );
    await page.keyboard.press('Enter');
    await freshCard.getByLabel('District').fill('Sorrel Unified');
    await freshCard.getByLabel('Setting').selectOption('rural');
    await freshCard.getByLabel('K-2').check();
    await freshCard.getByLabel('High-need school').check();
    await freshCard.getByRole('button', { name: 'Save changes' }).click();
    // The shared schema refuses a high-need flag without its basis, beside the field.
    await freshCard.getByText('Say what the high-need flag rests on').waitFor();
    await freshCard.getByLabel('High-need basis').fill('71% eligible for free or reduced-price meals');
    await freshCard.getByLabel('Year of that figure').fill('2025');
    await freshCard.getByRole('button', { name: 'Save changes' }).click();
    await page
      .getByRole('status')
      .filter({ hasText: `Saved Sorrel Brook Elementary ${tag}` })
      .waitFor();
    await freshCard.getByRole('button', { name: 'Accept' }).click();
    await page
      .getByRole('status')
      .filter({ hasText: `Accepted Sorrel Brook Elementary ${tag}` })
      .waitFor();
    expect(await knex('schools').where({ id: fresh }).first()).toMatchObject({
      status: 'approved',
      district: 'Sorrel Unified',
      setting: 'rural',
      high_need: true,
      high_need_basis: '71% eligible for free or reduced-price meals',
      high_need_year: 2025,
    });

    const card = page.locator(`li[data-school="${duplicate}"]`);
    await card.getByText(`Possible duplicate of: Tamarack Ridge Middle School ${tag}`).waitFor();
    await card.getByRole('button', { name: 'Merge into…' }).click();
    await card.getByLabel(`Tamarack Ridge Middle School ${tag}, Tamarack ${tag}`, { exact: false }).check();
    await card.getByRole('button', { name: 'Review the merge' }).click();
    const confirm = card.getByTestId('merge-confirm');
    await confirm.waitFor();
    expect(await confirm.textContent()).toContain(
      '1 teacher, 1 class (with their kits and journal entries) and 1 event',
    );
    expect(await axeSerious(page)).toEqual([]);
    await confirm.getByRole('button', { name: 'Merge now' }).click();
    await page
      .getByRole('status')
      .filter({ hasText: `Merged Tamarack Ridge Middle ${tag} into` })
      .waitFor();
    expect(await card.count()).toBe(0);

    expect(await knex('schools').where({ id: duplicate }).first()).toBeUndefined();
    expect((await knex('users').where({ id: teacher.id }).first('school_id')).school_id).toBe(keep);
    expect((await knex('classes').where({ id: klass.id }).first('school_id')).school_id).toBe(keep);
    expect((await knex('events').where({ id: event.id }).first('school_id')).school_id).toBe(keep);
    expect(errors).toEqual([]);
  });
});

describe('the schools directory in the browser', () => {
  it('shows the last eight quarters of a school and exports them as CSV, row for row', async () => {
    // Kits in the eight quarters the page shows: other test files save kits dated long before them.
    const shown = quartersEnding(quarterOf(dateIso(new Date())), REACH_TREND_QUARTERS)!;
    const schoolId = await schoolWithMostKits(knex, shown);
    const { page, errors } = await pageAsCoordinator();
    await page.goto(`/reach/schools/${schoolId}`);
    const table = page.getByTestId('school-over-time');
    const rows = await table
      .locator('tbody tr')
      .evaluateAll((trs) => trs.map((tr) => [...tr.querySelectorAll('td')].map((td) => td.textContent ?? '')));
    expect(rows.length).toBe(8);
    expect(rows.some((r) => r.slice(1).some((v) => Number(v) > 0))).toBe(true);
    const csv = (await downloadBytes(page, 'school-over-time-csv')).toString('utf8').replace(/^\uFEFF/, '');
    const [header, ...csvRows] = Papa.parse<string[]>(csv, { skipEmptyLines: true }).data;
    expect(header).toEqual(await table.locator('thead th').allTextContents());
    expect(csvRows).toEqual(rows);
    expect(errors).toEqual([]);
  });

  it('exports as CSV the schools the table shows under its filters', async () => {
    const { page, errors } = await pageAsCoordinator();
    await page.goto('/reach/schools');
    await page.getByLabel('High-need').selectOption('true');
    await page.getByRole('button', { name: 'Filter' }).click();
    await page.waitForURL(/highNeed=true/);
    const heading = await page.getByRole('heading', { name: /^Directory/ }).textContent();
    const total = Number(/\((\d+)\)/.exec(heading!)![1]);
    // The demo seed has high-need schools.
    expect(total).toBeGreaterThan(0);
    const shown = await page
      .locator('section[aria-labelledby="directory-heading"] tbody tr td:first-child a')
      .allTextContents();

    const csv = (await downloadBytes(page, 'directory-csv')).toString('utf8').replace(/^\uFEFF/, '');
    const parsed = Papa.parse<string[]>(csv, { skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    const [header, ...rows] = parsed.data;
    const highNeed = header!.indexOf('High-need');
    expect(rows.length).toBe(total);
    expect(rows.slice(0, shown.length).map((r) => r[0])).toEqual(shown.map(csvCell));
    expect(new Set(rows.map((r) => r[highNeed]))).toEqual(new Set(['yes']));
    expect(errors).toEqual([]);
  });
});
