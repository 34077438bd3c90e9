/**
 * The student's way in a real browser: a kit's URL (what its QR code encodes) opened by a new visitor, the
 * class code typed on /join, and the student back on that kit with its 3D preview; a `next` pointing off the
 * site ignored; the class page listing the class's kits and the tools of their activities; the teacher's
 * class page and its printable poster, whose QR code is read back with jsQR (an independent decoder of
 * ISO/IEC 18004) from a screenshot.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import jsQR from 'jsqr';
import sharp from 'sharp';
import type { Knex } from 'knex';
import type { Browser, Page } from 'playwright-core';
import { axeSerious, BASE_URL, browserLaunch, hydrated, kitSaveRequest, pageNew } from './browser';
import { testKnex } from '../db/database';
import { accountCreate, classCreateDirect, userSessionCookie } from '../api/auth-helpers';

let browser: Browser;
let knex: Knex;
let teacherCookie: string;
let otherTeacherCookie: string;
let klass: { id: string; code: string };
let emptyClass: { id: string; code: string };
let kitPath = '';
const KIT_TITLE = `Scan flow probe ${Date.now()}`;

async function asCookie(cookie: string): Promise<Page> {
  const { page } = await pageNew(browser);
  const [name, value] = cookie.split('=') as [string, string];
  await page.context().addCookies([{ name, value, url: BASE_URL }]);
  return page;
}

/** Types the class code on /join (already open) and submits it. */
async function joinWith(page: Page, code: string): Promise<void> {
  await hydrated(page);
  await page.getByLabel('Class code').fill(code);
  await page.getByRole('button', { name: 'Open our class' }).click();
}

beforeAll(async () => {
  browser = await browserLaunch();
  knex = testKnex();
  const teacher = await accountCreate(knex, { role: 'teacher', label: 'scan-flow' });
  const other = await accountCreate(knex, { role: 'teacher', label: 'scan-flow-other' });
  teacherCookie = await userSessionCookie(knex, teacher.id);
  otherTeacherCookie = await userSessionCookie(knex, other.id);
  klass = await classCreateDirect(knex, teacher, 'Scan flow class');
  emptyClass = await classCreateDirect(knex, teacher, 'Scan flow empty class');
  const page = await asCookie(teacherCookie);
  const saved = await kitSaveRequest(page, klass.id, {
    modelId: 'skein-probe',
    activitySlug: 'shake-test',
    title: KIT_TITLE,
    scaleDenominator: 25,
  });
  expect(saved.status()).toBe(201);
  kitPath = `/kits/${((await saved.json()) as { kit: { id: string } }).kit.id}`;
  await page.context().close();
});
afterAll(async () => {
  await browser?.close();
  await knex?.destroy();
});

describe('scan flow', () => {
  it("brings a new visitor from a kit's URL through the class code back to that kit and its 3D preview", async () => {
    const { page, errors } = await pageNew(browser);
    const first = await page.goto(kitPath);
    expect(first?.status()).toBe(401);
    await page.getByRole('link', { name: 'Enter the class code' }).click();
    await page.waitForURL(`**/join?next=${encodeURIComponent(kitPath)}`);
    expect(await page.getByTestId('join-next').isVisible()).toBe(true);
    await joinWith(page, klass.code.toLowerCase());
    await page.waitForURL(`${BASE_URL}${kitPath}`);
    expect(await page.getByRole('heading', { level: 1 }).textContent()).toBe(KIT_TITLE);
    await page.getByTestId('fold-preview').scrollIntoViewIfNeeded();
    await page.waitForSelector('[data-testid="fold-canvas"][data-scene-ready="true"]', { timeout: 30_000 });
    expect(errors).toEqual([]);
  });

  it.each(['//evil.example/', '/%09/evil.example', 'https://evil.example/kits', '/\\evil.example'])(
    'ignores the off-site next %s and lands on the class page',
    async (next) => {
      const { page } = await pageNew(browser);
      await page.goto(`/join?next=${encodeURIComponent(next)}`);
      expect(await page.getByTestId('join-next').count()).toBe(0);
      await joinWith(page, klass.code);
      await page.waitForURL(`${BASE_URL}/class`);
      expect(new URL(page.url()).origin).toBe(BASE_URL);
    },
  );

  it("fills in the code from a poster's link", async () => {
    const { page } = await pageNew(browser);
    await page.goto(`/join?code=${klass.code.slice(0, 4).toLowerCase()}-${klass.code.slice(4)}`);
    await hydrated(page);
    expect(await page.getByLabel('Class code').inputValue()).toBe(`${klass.code.slice(0, 4)}-${klass.code.slice(4)}`);
    await page.getByRole('button', { name: 'Open our class' }).click();
    await page.waitForURL(`${BASE_URL}/class`);
  });
});

describe('class page', () => {
  it("lists the class's kits with a thumbnail that loads and the tools of their activities", async () => {
    const { page, errors } = await pageNew(browser);
    await page.goto('/join');
    await joinWith(page, klass.code);
    await page.waitForURL(`${BASE_URL}/class`);
    const card = page.getByTestId('class-kit').filter({ hasText: KIT_TITLE });
    expect(await card.count()).toBe(1);
    const img = card.locator('img');
    await img.scrollIntoViewIfNeeded();
    await page.waitForFunction(
      (title) =>
        [...document.querySelectorAll<HTMLElement>('[data-testid="class-kit"]')]
          .find((li) => li.textContent?.includes(title))
          ?.querySelector('img')?.naturalWidth,
      KIT_TITLE,
      { timeout: 30_000 },
    );
    expect(await card.getByRole('link', { name: KIT_TITLE, exact: true }).getAttribute('href')).toBe(kitPath);
    // The shake test records into the vibration tool.
    const tools = page.getByTestId('class-tools');
    expect(await tools.getByRole('link', { name: 'Shaking (vibration)' }).getAttribute('href')).toBe(
      '/tools/vibration',
    );
    expect(await axeSerious(page)).toEqual([]);
    await page.screenshot({ path: 'test-results/scan-flow/class-page.png', fullPage: true });
    expect(errors).toEqual([]);
  });

  it('says plainly when the class has no kits yet', async () => {
    const { page } = await pageNew(browser);
    await page.goto('/join');
    await joinWith(page, emptyClass.code);
    await page.waitForURL(`${BASE_URL}/class`);
    expect(await page.getByTestId('class-kits-empty').textContent()).toContain('No kits yet');
    expect(await page.getByTestId('class-kit').count()).toBe(0);
  });
});

describe("teacher's class page and poster", () => {
  it('shows the code large and links the poster', async () => {
    const page = await asCookie(teacherCookie);
    await page.goto(`/classes/${klass.id}`);
    await hydrated(page);
    const code = page.getByTestId('class-code');
    expect((await code.textContent())?.trim()).toBe(`${klass.code.slice(0, 4)}-${klass.code.slice(4)}`);
    const fontPx = await code.evaluate((el) => parseFloat(getComputedStyle(el).fontSize));
    expect(fontPx).toBeGreaterThanOrEqual(48);
    expect(await axeSerious(page)).toEqual([]);
    await page.screenshot({ path: 'test-results/scan-flow/teacher-class-page.png', fullPage: true });
    await page.getByTestId('poster-link').click();
    await page.waitForURL(`**/classes/${klass.id}/poster`);
  });

  it('prints a poster whose QR code opens /join with the code filled in and spells out the address', async () => {
    const page = await asCookie(teacherCookie);
    await page.goto(`/classes/${klass.id}/poster`);
    const host = new URL(BASE_URL).host;
    expect((await page.getByTestId('poster-address').textContent())?.trim()).toBe(`${host}/join`);
    expect(await page.getByTestId('poster-code').textContent()).toContain(klass.code.slice(4));
    const shot = await page.locator('.poster-qr').screenshot();
    const { data, info } = await sharp(shot).ensureAlpha().raw().toBuffer({ resolveWithObject: true });
    const decoded = jsQR(new Uint8ClampedArray(data), info.width, info.height);
    expect(decoded?.data).toBe(`${BASE_URL}/join?code=${klass.code}`);
    expect(await axeSerious(page)).toEqual([]);
    await page.screenshot({ path: 'test-results/scan-flow/poster-screen.png', fullPage: true });
    await page.emulateMedia({ media: 'print' });
    expect(await page.locator('body > header').isVisible()).toBe(false);
    expect(await page.getByRole('button', { name: 'Print the poster' }).isVisible()).toBe(false);
    await page.pdf({ path: 'test-results/scan-flow/poster.pdf', format: 'Letter' });
  });

  it('answers 404 to another teacher and sends an anonymous visitor to sign in', async () => {
    const other = await asCookie(otherTeacherCookie);
    expect((await other.goto(`/classes/${klass.id}/poster`))?.status()).toBe(404);
    const { page } = await pageNew(browser);
    await page.goto(`/classes/${klass.id}/poster`);
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    expect(new URL(page.url()).searchParams.get('next')).toBe(`/classes/${klass.id}/poster`);
  });
});
