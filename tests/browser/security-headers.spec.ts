/**
 * Every page under the Content-Security-Policy, in chromium: each .astro page on disk is visited (a page without
 * a URL here FAILS, like a route without a row in the authorization matrix), as the visitor who may see it, with
 * its islands hydrated and scrolled into view; any securitypolicyviolation event or CSP console message fails the
 * test. Each page must also carry the policy (no 'unsafe-inline' for scripts, frame-ancestors 'none') and the
 * other headers of src/lib/http/security-headers.ts.
 */
import { readdirSync } from 'node:fs';
import { join, relative } from 'node:path';
import type { Knex } from 'knex';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { testKnex } from '../db/database';
import { accountCreate, classCreateDirect, classSessionCookie, userSessionCookie } from '../api/auth-helpers';
import { BASE_URL, browserLaunch, hydrated, kitSaveRequest, pageNew } from './browser';
import { octahedronStl } from '../fixtures/mesh-files';

type Visitor = 'anonymous' | 'teacher' | 'admin' | 'classSession';
interface Fixtures {
  classId: string;
  kitId: string;
  activitySlug: string;
  eventId: string;
  /** A draft entry of the teacher's class. */
  draftId: string;
  /** A submitted entry of the same class, approved and waiting for review. */
  submittedId: string;
  schoolId: string;
  /** A model the teacher imported. */
  importedModelId: string;
}
interface PageVisit {
  path: string | ((f: Fixtures) => string);
  as: Visitor;
}

/** Pages whose path is not their file name, or that need another visitor than the teacher. */
const VISITS: Record<string, PageVisit> = {
  '/404': { path: '/no-such-page', as: 'anonymous' },
  '/index': { path: '/', as: 'anonymous' },
  '/activities/[slug]': { path: (f) => `/activities/${f.activitySlug}`, as: 'teacher' },
  '/admin/accounts': { path: '/admin/accounts', as: 'admin' },
  '/admin/outbox': { path: '/admin/outbox', as: 'admin' },
  '/class': { path: '/class', as: 'classSession' },
  '/classes/[id]': { path: (f) => `/classes/${f.classId}`, as: 'teacher' },
  '/classes/[id]/poster': { path: (f) => `/classes/${f.classId}/poster`, as: 'teacher' },
  '/kits/[id]': { path: (f) => `/kits/${f.kitId}`, as: 'teacher' },
  '/kits/[id]/handout': { path: (f) => `/kits/${f.kitId}/handout`, as: 'teacher' },
  '/preview/[model]': { path: '/preview/skein-probe', as: 'teacher' },
  '/kits/new': { path: '/kits/new?model=skein-probe', as: 'teacher' },
  '/models/imports/[id]': { path: (f) => `/models/imports/${f.importedModelId}`, as: 'teacher' },
  '/sign-in': { path: '/sign-in', as: 'anonymous' },
  '/sign-up': { path: '/sign-up', as: 'anonymous' },
  '/forgot-password': { path: '/forgot-password', as: 'anonymous' },
  '/reset-password': { path: '/reset-password?token=x', as: 'anonymous' },
  '/verify-email': { path: '/verify-email?token=x', as: 'anonymous' },
  '/invitation': { path: '/invitation?token=x', as: 'anonymous' },
  '/join': { path: '/join', as: 'anonymous' },
  '/go/[code]': { path: '/go/ZZZZZZ', as: 'anonymous' },
  '/activities/[slug]/journal': { path: (f) => `/activities/${f.activitySlug}/journal`, as: 'anonymous' },
  '/journal/classes/[id]': { path: (f) => `/journal/classes/${f.classId}`, as: 'anonymous' },
  '/reach/schools/[id]': { path: (f) => `/reach/schools/${f.schoolId}`, as: 'admin' },
  '/events': { path: '/events', as: 'anonymous' },
  '/events/[id]': { path: (f) => `/events/${f.eventId}`, as: 'anonymous' },
  '/events/registration': { path: '/events/registration?confirm=not-a-token-from-any-mail', as: 'anonymous' },
  '/events/manage': { path: '/events/manage', as: 'admin' },
  '/events/manage/new': { path: '/events/manage/new', as: 'admin' },
  '/events/manage/[id]': { path: (f) => `/events/manage/${f.eventId}`, as: 'admin' },
  '/links': { path: '/links', as: 'admin' },
  '/journal/[id]': { path: (f) => `/journal/${f.draftId}`, as: 'teacher' },
  '/entries/[id]/edit': { path: (f) => `/entries/${f.draftId}/edit`, as: 'teacher' },
  '/review': { path: '/review', as: 'admin' },
  '/review/[id]': { path: (f) => `/review/${f.submittedId}`, as: 'admin' },
};

/** A saved result for the entries, so their plots (uPlot and the static SVG) load under the policy too. */
const CSP_SAVED_RESULT = {
  tool: 'thermal',
  toolVersion: '1.0.0',
  inputsSummary: 'invented readings for the page visit',
  result: {},
  plot: {
    kind: 'line',
    title: 'Puck temperature',
    xLabel: 'Time (s)',
    yLabel: 'Temperature (°C)',
    series: [
      {
        label: 'Puck',
        points: [
          [0, 20],
          [60, 31],
          [120, 38],
        ],
      },
    ],
  },
};

const PAGES_DIR = join(process.cwd(), 'src', 'pages');

/** Every .astro page as Astro names its route ('/kits/[id]', '/index' for the home page). */
function pagesOnDisk(): string[] {
  const found: string[] = [];
  const walk = (dir: string) => {
    for (const entry of readdirSync(dir, { withFileTypes: true })) {
      if (entry.name.startsWith('_') || entry.name === 'api') continue;
      const full = join(dir, entry.name);
      if (entry.isDirectory()) walk(full);
      else if (entry.name.endsWith('.astro')) {
        const route =
          '/' +
          relative(PAGES_DIR, full)
            .replace(/\\/g, '/')
            .replace(/\.astro$/, '');
        found.push(route === '/index' ? route : route.replace(/\/index$/, ''));
      }
    }
  };
  walk(PAGES_DIR);
  return found.sort();
}

/** A page's visit: its own entry, or the teacher at the file's own path when it has no parameter. */
function visitOf(route: string): PageVisit | null {
  if (VISITS[route]) return VISITS[route];
  return route.includes('[') ? null : { path: route, as: 'teacher' };
}

let browser: Browser;
let knex: Knex;
let fixtures: Fixtures;
const cookies = {} as Record<Exclude<Visitor, 'anonymous'>, string>;

beforeAll(async () => {
  browser = await browserLaunch();
  knex = testKnex();
  const teacher = await accountCreate(knex, { role: 'teacher', label: 'csp-teacher' });
  const admin = await accountCreate(knex, { role: 'admin', label: 'csp-admin' });
  const klass = await classCreateDirect(knex, teacher, 'CSP class');
  cookies.teacher = await userSessionCookie(knex, teacher.id);
  cookies.admin = await userSessionCookie(knex, admin.id);
  cookies.classSession = await classSessionCookie(knex, klass.id);
  const { page } = await pageAs('teacher');
  const saved = await kitSaveRequest(page, klass.id, { modelId: 'skein-probe', scaleDenominator: 20 });
  expect(saved.status()).toBe(201);
  const kitId = ((await saved.json()) as { kit: { id: string } }).kit.id;
  const imported = await page.request.post('/api/models/imports', {
    multipart: { file: { name: 'csp.stl', mimeType: 'model/stl', buffer: octahedronStl() } },
    headers: { origin: BASE_URL },
  });
  expect(imported.status()).toBe(201);
  const importedModelId = ((await imported.json()) as { model: { id: string } }).model.id;
  await page.context().close();
  const activitySlug = readdirSync(join(process.cwd(), 'content', 'activities'))
    .filter((f) => f.endsWith('.md'))
    .sort()[0]!
    .replace(/\.md$/, '');
  // The demo seed's published event and a school of the directory.
  const event = await knex('events').where({ state: 'published' }).first('id');
  const entry = (state: string, title: string) => ({
    class_id: klass.id,
    author_kind: 'teacher',
    author_id: teacher.id,
    title,
    body: 'Two tabs came *loose*.',
    activity_slug: activitySlug,
    state,
    teacher_approved: state !== 'draft',
    submitted_at: state === 'draft' ? null : new Date(),
    published_at: state === 'published' ? new Date() : null,
    saved_results: JSON.stringify([CSP_SAVED_RESULT]),
  });
  const [draft, submitted] = (await knex('entries')
    .insert([entry('draft', 'CSP draft'), entry('submitted', 'CSP submitted'), entry('published', 'CSP published')])
    .returning('id')) as { id: string }[];
  const school = (await knex('schools').first('id')) as { id: string };
  fixtures = {
    classId: klass.id,
    kitId,
    activitySlug,
    draftId: draft!.id,
    submittedId: submitted!.id,
    eventId: event.id,
    schoolId: school.id,
    importedModelId,
  };
}, 60_000);

afterAll(async () => {
  await browser?.close();
  await knex?.destroy();
});

/** A fresh page for the visitor that records every CSP violation the document reports. */
async function pageAs(as: Visitor): Promise<{ page: Page; violations: string[] }> {
  const { page } = await pageNew(browser);
  page.setDefaultTimeout(10_000);
  if (as !== 'anonymous') {
    const [name, value] = cookies[as].split(/=(.*)/s) as [string, string];
    await page.context().addCookies([{ name, value, url: BASE_URL }]);
  }
  const violations: string[] = [];
  await page.addInitScript(() => {
    document.addEventListener('securitypolicyviolation', (e) => {
      const w = window as unknown as { cspViolations?: string[] };
      (w.cspViolations ??= []).push(
        `${e.violatedDirective} blocked ${e.blockedURI || 'inline'} (${e.sourceFile}:${e.lineNumber})`,
      );
    });
  });
  page.on('console', (m) => {
    if (/Content Security Policy/i.test(m.text())) violations.push(`console: ${m.text()}`);
  });
  return { page, violations };
}

describe('Content-Security-Policy on every page', () => {
  it('has a visit for every page on disk', () => {
    const missing = pagesOnDisk().filter((route) => visitOf(route) === null);
    expect(missing, 'give these pages a VISITS entry').toEqual([]);
  });

  it('sends the policy and the other security headers, and no page reports a violation', async () => {
    const failures: string[] = [];
    for (const route of pagesOnDisk()) {
      const visit = visitOf(route)!;
      const path = typeof visit.path === 'function' ? visit.path(fixtures) : visit.path;
      const { page, violations } = await pageAs(visit.as);
      const response = await page.goto(path, { waitUntil: 'load' });
      const headers = response!.headers();
      const csp = headers['content-security-policy'] ?? '';
      const scriptSrc = /script-src ([^;]*)/.exec(csp)?.[1] ?? '';
      if (!scriptSrc) failures.push(`${path}: no script-src in "${csp}"`);
      if (scriptSrc.includes("'unsafe-inline'")) failures.push(`${path}: script-src allows 'unsafe-inline'`);
      if (!/frame-ancestors 'none'/.test(csp)) failures.push(`${path}: no frame-ancestors 'none'`);
      if (headers['x-frame-options'] !== 'DENY')
        failures.push(`${path}: X-Frame-Options ${headers['x-frame-options']}`);
      if (headers['x-content-type-options'] !== 'nosniff') failures.push(`${path}: no X-Content-Type-Options`);
      if (!headers['referrer-policy']) failures.push(`${path}: no Referrer-Policy`);
      // client:visible islands (the 3D preview, plots) load once they scroll into view: scroll a screen at a time.
      await page.evaluate(async () => {
        for (let y = 0; y < document.body.scrollHeight; y += window.innerHeight / 2) {
          window.scrollTo(0, y);
          await new Promise((r) => setTimeout(r, 50));
        }
      });
      await page.waitForLoadState('networkidle');
      const settled = await hydrated(page).then(
        () => true,
        () => false,
      );
      if (!settled) failures.push(`${path} (${visit.as}): islands did not hydrate`);
      const events = await page.evaluate(() => (window as unknown as { cspViolations?: string[] }).cspViolations ?? []);
      for (const v of [...events, ...violations]) failures.push(`${path} (${visit.as}): ${v}`);
      await page.context().close();
    }
    expect(failures).toEqual([]);
  }, 180_000);
});
