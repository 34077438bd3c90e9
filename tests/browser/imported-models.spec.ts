/**
 * Imported models in a real browser: a teacher imports a closed STL written by three.js's STLExporter (a
 * reference library, independent of the importer), reads what the check found, answers the unit question,
 * works out the kit summary, opens the builder from the model, saves a kit to a class and opens the kit page,
 * whose 3D fold-along preview draws the pieces (or its flat fallback); axe-core checks the model pages.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import type { Knex } from 'knex';
import { axeSerious, BASE_URL, browserLaunch, hydrated, pageWithSession } from './browser';
import { testKnex } from '../db/database';
import { octahedronStl } from '../fixtures/mesh-files';
import { accountCreate, classCreateDirect, userSessionCookie } from '../api/auth-helpers';

let browser: Browser;
let knex: Knex;
let teacherCookie: string;
let coordinatorCookie: string;
let otherTeacherCookie: string;

beforeAll(async () => {
  browser = await browserLaunch();
  knex = testKnex();
  const teacher = await accountCreate(knex, { role: 'teacher', label: 'imports-browser' });
  teacherCookie = await userSessionCookie(knex, teacher.id);
  await classCreateDirect(knex, teacher, 'Browser imports class');
  coordinatorCookie = await userSessionCookie(knex, (await accountCreate(knex, { role: 'coordinator' })).id);
  otherTeacherCookie = await userSessionCookie(knex, (await accountCreate(knex, { role: 'teacher' })).id);
});
afterAll(async () => {
  await browser?.close();
  await knex?.destroy();
});

describe('imported models', () => {
  it('imports an STL, answers the unit question, sums up the kit, then builds and saves it from the builder', async () => {
    const { page, errors } = await pageWithSession(browser, teacherCookie);
    await page.goto('/models/imports');
    await hydrated(page);
    expect(await axeSerious(page)).toEqual([]);

    await page.getByLabel('Mesh file').setInputFiles({
      name: 'practice-octahedron.stl',
      mimeType: 'model/stl',
      buffer: octahedronStl(),
    });
    await page.getByLabel('Title (optional)').fill('Practice octahedron');
    await page.getByRole('button', { name: 'Import and check' }).click();
    await page.waitForURL(/\/models\/imports\/[0-9a-f-]{36}$/);
    const modelId = page.url().split('/').pop()!;
    await hydrated(page);
    expect(await page.getByRole('heading', { level: 1 }).textContent()).toContain('Practice octahedron');
    const findings = await page.getByTestId('mesh-findings').textContent();
    expect(findings).toContain('8 triangles read from the file');
    expect(findings).toContain('1 separate surface (shell)');

    // A 60-unit box reads as centimetres (mesh-units.ts's guess); in millimetres it is a 6 cm solid.
    const unitGroup = page.getByRole('group', { name: 'Unit of the file’s numbers' });
    expect(await unitGroup.getByRole('radio', { name: /centimetres: 60 × 60 × 60 cm \(our guess/ }).isChecked()).toBe(
      true,
    );
    await unitGroup.getByRole('radio', { name: /millimetres: 6 × 6 × 6 cm/ }).check();
    await page.getByRole('button', { name: 'Use this unit' }).click();
    await page.getByText('Saved: the file’s numbers are millimetres.').waitFor();

    await page.getByLabel('Scale 1 :').fill('1');
    await page.getByRole('button', { name: 'Work out the kit' }).click();
    const summary = page.getByTestId('mesh-kit-summary');
    await page.waitForSelector('[data-testid="mesh-kit-summary"][data-state="done"]');
    const summaryText = await summary.textContent();
    expect(summaryText).toContain("At 1:1 the model's longest side is 6 cm.");
    expect(summaryText).toContain('8 faces');
    expect(summaryText).toContain('Fold-back check passed');
    expect(await axeSerious(page)).toEqual([]);

    await page.getByRole('link', { name: 'Build a kit from this model' }).click();
    await page.waitForURL(/\/kits\/new\?import=/);
    await hydrated(page);
    expect(await page.getByLabel('Model').inputValue()).toBe(`import:${modelId}`);
    await page.getByRole('button', { name: /^1:1( \(suggested\))?$/ }).click();
    await page.waitForFunction(
      () => document.querySelector('[data-testid="kit-summary"]')?.getAttribute('data-scale') === '1',
    );
    await page.waitForFunction(
      () => document.querySelector('[data-testid="build-status"]')?.getAttribute('data-building') === 'false',
    );
    await page.getByRole('button', { name: 'Save kit' }).click();
    const saved = page.getByTestId('kit-saved');
    await saved.waitFor();
    const kitPath = (await saved.getByRole('link', { name: 'Open the kit page' }).getAttribute('href'))!;
    const kit = await knex('kits')
      .where({ id: kitPath.split('/').pop() })
      .first();
    expect(kit.inputs.importId).toBe(modelId);
    expect(kit.inputs.modelId).toBeUndefined();

    await page.goto(kitPath);
    await page.getByTestId('fold-preview').scrollIntoViewIfNeeded();
    await page.waitForSelector(
      '[data-testid="fold-canvas"][data-scene-ready="true"], [data-testid="still-fallback"] svg',
      { timeout: 20_000 },
    );
    expect(errors).toEqual([]);
  });

  it('lets a coordinator share a model, which another teacher then finds in the builder', async () => {
    const { page: owner } = await pageWithSession(browser, teacherCookie);
    const created = await owner.request.post('/api/models/imports', {
      multipart: {
        title: 'Shared practice octahedron',
        file: { name: 'shared.stl', mimeType: 'model/stl', buffer: octahedronStl() },
      },
      headers: { origin: BASE_URL },
    });
    expect(created.status()).toBe(201);
    const { model } = (await created.json()) as { model: { id: string } };

    const { page, errors } = await pageWithSession(browser, coordinatorCookie);
    await page.goto(`/models/imports/${model.id}`);
    await hydrated(page);
    await page.getByLabel('Share with every account').check();
    await page.getByText('Shared: every teacher sees this model').waitFor();
    expect(errors).toEqual([]);

    const { page: other } = await pageWithSession(browser, otherTeacherCookie);
    await other.goto('/kits/new');
    await hydrated(other);
    const option = other.locator('select[name="modelId"] optgroup[label="Imported models"] option', {
      hasText: 'Shared practice octahedron',
    });
    expect(await option.getAttribute('value')).toBe(`import:${model.id}`);
  });

  it('says what a file that is not a mesh is, beside the form', async () => {
    const { page } = await pageWithSession(browser, teacherCookie);
    await page.goto('/models/imports');
    await hydrated(page);
    await page.getByLabel('Mesh file').setInputFiles({
      name: 'notes.stl',
      mimeType: 'model/stl',
      buffer: Buffer.from('solid notes\nfacet normal 0 0 1\nouter loop\n'),
    });
    await page.getByRole('button', { name: 'Import and check' }).click();
    const alert = page.getByRole('alert');
    await alert.waitFor();
    expect((await alert.textContent())?.length).toBeGreaterThan(10);
    expect(page.url()).toMatch(/\/models\/imports$/);
  });
});
