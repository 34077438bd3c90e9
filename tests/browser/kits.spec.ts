/**
 * The kit flow in a real browser: build a kit, change the scale and watch the summary and sheets follow,
 * save it, download the PDF and count its pages with pdf-lib, open the kit as a student through the class
 * code, and check the builder and kit pages with axe-core (no serious or critical violations).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readFile } from 'node:fs/promises';
import { gzipSync } from 'node:zlib';
import type { Browser, Page } from 'playwright-core';
import type { Knex } from 'knex';
import { PDFDocument } from 'pdf-lib';
import { kitPdfPageKinds, pdfPageTexts } from '../fixtures/pdf-text';
import { QR_CAPTION, QR_PREVIEW_NOTE } from '../../src/lib/render/scene-footer';
import { axeSerious, BASE_URL, browserLaunch, hydrated, kitSaveRequest, pageNew } from './browser';
import { testKnex } from '../db/database';
import { accountCreate, classCreateDirect, userSessionCookie } from '../api/auth-helpers';
import { SAFETY_GENERAL_NOTE } from '../../src/lib/activities/safety';

let browser: Browser;
let knex: Knex;
let teacherCookie: string;
let teacherAccount: Awaited<ReturnType<typeof accountCreate>>;
let classCode: string;
let kitPath = '';

beforeAll(async () => {
  browser = await browserLaunch();
  knex = testKnex();
  const teacher = await accountCreate(knex, { role: 'teacher', label: 'kits-browser' });
  teacherAccount = teacher;
  teacherCookie = await userSessionCookie(knex, teacher.id);
  classCode = (await classCreateDirect(knex, teacher, 'Browser kits class')).code;
});
afterAll(async () => {
  await browser?.close();
  await knex?.destroy();
});

async function signedIn(): Promise<{ page: Page; errors: string[] }> {
  const { page, errors } = await pageNew(browser);
  const [name, value] = teacherCookie.split('=') as [string, string];
  await page.context().addCookies([{ name, value, url: BASE_URL }]);
  return { page, errors };
}

const sheetsText = (page: Page) => page.getByTestId('sheet-previews').innerHTML();

describe('kit builder', () => {
  it('updates the summary and sheets when the scale changes, then saves the kit', async () => {
    const { page, errors } = await signedIn();
    await page.goto('/kits/new?model=skein-probe');
    await hydrated(page);
    // 1:25 is the suggested scale for grades 6–8 (its button is named "1:25 (suggested)").
    await page.getByRole('button', { name: /^1:25( \(suggested\))?$/ }).click();
    await page.waitForFunction(
      () => document.querySelector('[data-testid="kit-summary"]')?.getAttribute('data-scale') === '25',
    );
    const before = await sheetsText(page);
    await page.getByRole('button', { name: '1:20', exact: true }).click();
    await page.waitForFunction(
      () => document.querySelector('[data-testid="kit-summary"]')?.getAttribute('data-scale') === '20',
    );
    await page.waitForFunction(
      () => document.querySelector('[data-testid="build-status"]')?.getAttribute('data-building') === 'false',
    );
    // 2.4 m across the flats at 1:20 is 12 cm (the Skein probe, content/models/skein-probe.json).
    expect(await page.getByTestId('kit-summary').textContent()).toContain('Body 12 cm across the flats');
    expect(await sheetsText(page)).not.toBe(before);

    await page.getByRole('button', { name: 'Save kit' }).click();
    const saved = page.getByTestId('kit-saved');
    await saved.waitFor();
    kitPath = (await saved.getByRole('link', { name: 'Open the kit page' }).getAttribute('href')) ?? '';
    expect(kitPath).toMatch(/^\/kits\/[0-9a-f-]{36}$/);
    expect(errors).toEqual([]);
  });

  it('shows each build stage as the server finishes it, and Cancel keeps the sheets it had', async () => {
    const { page, errors } = await signedIn();
    await page.goto('/kits/new?model=skein-probe');
    await hydrated(page);
    const idle = () =>
      page.waitForFunction(
        () => document.querySelector('[data-testid="build-status"]')?.getAttribute('data-building') === 'false',
      );
    // Thirty teams take the server several hundred milliseconds a build, long enough to watch and cancel. A
    // title of its own (it is printed, so it is in the content hash) keeps the server's cache from answering.
    await page.getByLabel('Title on the sheets (optional)').fill(`Cancel check ${Date.now()}`);
    await page.getByLabel('Copies (one per team)').fill('30');
    await page.waitForFunction(() =>
      document.querySelector('[data-testid="kit-summary"]')?.textContent?.includes('for 30 teams'),
    );
    await idle();
    const before = await sheetsText(page);
    // One change, built at once (Enter), so exactly one build runs while the test watches it.
    await page.getByLabel('Any scale 1 :').fill('19');
    await page.getByLabel('Any scale 1 :').press('Enter');
    await page.locator('[data-testid="build-progress"] [data-stage="patterns"][data-state="done"]').waitFor();
    expect(await page.getByRole('progressbar', { name: 'Building the sheets' }).getAttribute('aria-valuenow')).not.toBe(
      '0',
    );
    await page.getByRole('button', { name: 'Cancel' }).click();
    await idle();
    expect(await sheetsText(page)).toBe(before);
    expect(await page.getByTestId('build-status').getByRole('alert').count()).toBe(0);
    expect(await page.getByTestId('build-status').textContent()).toContain('Cancelled.');
    await page.getByRole('button', { name: 'Build these settings' }).click();
    await page.waitForFunction(
      () => document.querySelector('[data-testid="kit-summary"]')?.getAttribute('data-scale') === '19',
    );
    expect(await page.getByTestId('kit-summary').textContent()).toContain('for 30 teams');
    expect(errors).toEqual([]);
  });

  it('follows the class chosen to save to, then shows the saved kit’s sheets with its QR code', async () => {
    // A newer class of the same teacher, for grades 3–5: the builder starts from it (the newest class), and
    // choosing the older grades 6–8 class in the save panel sets the grade band to 6–8.
    const younger = await classCreateDirect(knex, teacherAccount, 'Browser kits younger class');
    await knex('classes').where({ id: younger.id }).update({ grade_band: '3-5' });
    const { page, errors } = await signedIn();
    await page.goto('/kits/new?model=skein-probe');
    await hydrated(page);
    expect(await page.getByLabel('Who builds it').inputValue()).toBe('3-5');
    await page.getByText('From your class Browser kits younger class.').waitFor();
    await page.getByLabel('Save to class').selectOption({ label: 'Browser kits class' });
    expect(await page.getByLabel('Who builds it').inputValue()).toBe('6-8');
    await page.getByText('From your class Browser kits class.').waitFor();
    await page.getByLabel('Instructions pages in the PDF').selectOption('first');
    const idle = () =>
      page.waitForFunction(
        () => document.querySelector('[data-testid="build-status"]')?.getAttribute('data-building') === 'false',
      );
    await idle();
    // Unsaved: the first sheet says where the QR code goes (sheet-scene.ts's note), and no QR code is drawn.
    const previews = page.getByTestId('sheet-previews');
    expect(await previews.getAttribute('data-qr')).toBe('note');
    expect(await previews.locator('li').first().textContent()).toContain(QR_PREVIEW_NOTE[0]);
    await page.getByRole('button', { name: 'Save kit' }).click();
    await page.getByTestId('kit-saved').waitFor();
    await page.waitForFunction(
      () => document.querySelector('[data-testid="sheet-previews"]')?.getAttribute('data-qr') === 'saved',
    );
    const first = previews.locator('li').first();
    expect(await first.textContent()).not.toContain(QR_PREVIEW_NOTE[0]);
    expect(await first.textContent()).toContain(QR_CAPTION);
    // The saved kit is in the chosen class, for its band, with the instructions first (read back by pdf.js).
    const kitHref = (await page.getByRole('link', { name: 'Open the kit page' }).getAttribute('href'))!;
    const kit = await knex('kits')
      .where({ id: kitHref.split('/').pop() })
      .first();
    expect(kit.class_id).not.toBe(younger.id);
    expect(kit.inputs.gradeBand).toBe('6-8');
    expect(kit.inputs.instructionsAt).toBe('first');
    const pdf = await page.request.get(`/api${kitHref}.pdf`);
    const texts = await pdfPageTexts(new Uint8Array(await pdf.body()));
    expect(texts[0]).toMatch(/^How to build it: Skein probe/);
    expect(errors).toEqual([]);
    await knex('classes').where({ id: younger.id }).delete();
  });

  it('ships at most 60 kB of JavaScript (gzip) before the 3D island', async () => {
    const { page } = await signedIn();
    const scripts: Promise<number>[] = [];
    page.on('response', (res) => {
      if (res.request().resourceType() === 'script')
        scripts.push(res.body().then((b) => gzipSync(b, { level: 9 }).length));
    });
    await page.goto('/kits/new?model=skein-probe', { waitUntil: 'networkidle' });
    await hydrated(page);
    const total = (await Promise.all(scripts)).reduce((a, b) => a + b, 0);
    expect(scripts.length).toBeGreaterThan(0);
    expect(total / 1024).toBeLessThanOrEqual(60);
  });

  it('has no serious or critical axe violations', async () => {
    const { page } = await signedIn();
    await page.goto('/kits/new');
    await hydrated(page);
    expect(await axeSerious(page)).toEqual([]);
  });

  it('prints the STL for the chosen bed and nozzle: a plate that fits, named by its own scale', async () => {
    const { page } = await signedIn();
    await page.goto('/kits/new?model=skein-probe');
    await hydrated(page);
    const plate = page.getByTestId('print-plate');
    await plate.waitFor();
    await page.getByLabel('Print bed').selectOption('compact');
    await page.getByLabel('Nozzle, mm').selectOption('0.6');
    await page.waitForFunction(() =>
      /Compact bed, 120 × 120 × 120 mm, 0\.6 mm nozzle/.test(
        document.querySelector('[data-testid="print-plate"]')?.textContent ?? '',
      ),
    );
    const scale = Number(await plate.getAttribute('data-scale'));
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Download STL for a 3D printer' }).click(),
    ]);
    expect(download.suggestedFilename()).toBe(`skein-probe-print-1-${scale}.stl`);
    // Binary STL (80-byte header, uint32 count, 50 bytes a triangle, float32 vertices from byte 96 of each).
    const stl = await readFile((await download.path())!);
    const view = new DataView(stl.buffer, stl.byteOffset, stl.byteLength);
    const triangles = view.getUint32(80, true);
    expect(stl.byteLength).toBe(84 + 50 * triangles);
    let top = 0;
    for (let t = 0; t < triangles; t++)
      for (let v = 0; v < 3; v++)
        for (let k = 0; k < 3; k++) top = Math.max(top, view.getFloat32(84 + 50 * t + 12 + 12 * v + 4 * k, true));
    expect(top).toBeLessThanOrEqual(120 + 1e-3);
    await page.getByLabel('Print bed').selectOption('custom');
    await page.getByLabel('Width, mm').fill('20');
    // The resolver validates the new bed asynchronously; the message appears under the field.
    await page.getByText('the bed width must be at least 50 mm').waitFor();
  });

  it('shows a field error and keeps the old sheets for an impossible copy count', async () => {
    const { page } = await signedIn();
    await page.goto('/kits/new');
    await hydrated(page);
    await page.getByLabel('Copies (one per team)').fill('0');
    await expect(page.getByText('copies must be at least 1').isVisible()).resolves.toBe(true);
  });
});

describe('kit page', () => {
  it('downloads a PDF with one page per sheet shown', async () => {
    expect(kitPath).not.toBe('');
    const { page } = await signedIn();
    await page.goto(kitPath);
    const sheets = await page.getByTestId('kit-sheets').locator('li').count();
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('link', { name: 'Download the PDF to print' }).click(),
    ]);
    const bytes = new Uint8Array(await readFile((await download.path())!));
    const pages = await kitPdfPageKinds(bytes);
    expect(pages.sheets).toBe(sheets);
    expect((await PDFDocument.load(bytes)).getPageCount()).toBe(sheets + pages.instructions.length);
  });

  it('has no serious or critical axe violations', async () => {
    const { page } = await signedIn();
    await page.goto(kitPath);
    // The 3D preview mounts client:visible: bring it into view so the check covers the hydrated island.
    await page.getByTestId('fold-preview').scrollIntoViewIfNeeded();
    await hydrated(page);
    expect(await axeSerious(page)).toEqual([]);
  });

  it("shows the kit's activity with its steps, cautions and printouts", async () => {
    const { page } = await signedIn();
    const classes = await page.request.get('/api/classes');
    const classId = ((await classes.json()) as { classes: { id: string }[] }).classes[0]!.id;
    const saved = await kitSaveRequest(page, classId, {
      modelId: 'skein-probe',
      activitySlug: 'shake-test',
      scaleDenominator: 25,
      sheetSizeId: 'a4',
    });
    expect(saved.status()).toBe(201);
    const { kit } = (await saved.json()) as { kit: { id: string } };
    await page.goto(`/kits/${kit.id}`);
    const section = page.getByTestId('kit-activity');
    expect(await section.getByRole('heading', { name: 'The activity: Shake test' }).count()).toBe(1);
    expect(await section.getByTestId('activity-safety').textContent()).toContain(SAFETY_GENERAL_NOTE);
    // The kit is on A4, so its printouts are too.
    expect(await section.getByRole('link', { name: 'Student data sheet (PDF)' }).getAttribute('href')).toBe(
      '/activities/shake-test/data-sheet.pdf?paper=a4',
    );
  });

  it('opens for a student through the class code and not before', async () => {
    const { page } = await pageNew(browser);
    const refused = await page.goto(kitPath);
    expect(refused?.status()).toBe(401);
    const join = await page.request.post('/api/classes/join', {
      data: { code: classCode },
      headers: { origin: BASE_URL },
    });
    expect(join.status()).toBe(200);
    await page.goto(kitPath);
    expect(await page.getByRole('heading', { level: 1 }).textContent()).toBe('Skein probe');
    expect(await page.getByTestId('kit-sheets').locator('img').count()).toBeGreaterThan(0);
  });

  it('tells an anonymous visitor of the handout to open the class first, like the kit page', async () => {
    const { page } = await pageNew(browser);
    const handoutPath = `${kitPath}/handout`;
    const refused = await page.goto(handoutPath);
    expect(refused?.status()).toBe(401);
    expect(await page.getByRole('heading', { level: 1 }).textContent()).toBe('Open your class first');
    const next = `?next=${encodeURIComponent(handoutPath)}`;
    const notice = page.getByTestId('kit-unavailable');
    expect(await notice.getByRole('link', { name: 'Enter the class code' }).getAttribute('href')).toBe(`/join${next}`);
    expect(await notice.getByRole('link', { name: 'sign in' }).getAttribute('href')).toBe(`/sign-in${next}`);
    expect(await page.getByTestId('handout-steps').count()).toBe(0);
  });
});
