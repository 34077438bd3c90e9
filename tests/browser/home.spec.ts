import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { readFileSync } from 'node:fs';
import { browserLaunch, pageNew } from './browser';
import { ModelContentSchema } from '../../src/lib/geometry/model-schema';
import { HOME_EXAMPLE } from '../../src/lib/kit/home-example';
import { solvePaperScale } from '../../src/lib/layout/scale-solver';

const skein = ModelContentSchema.parse(JSON.parse(readFileSync(`content/models/${HOME_EXAMPLE.modelId}.json`, 'utf8')));

let browser: Browser;
beforeAll(async () => {
  browser = await browserLaunch();
});
afterAll(async () => {
  await browser?.close();
});

describe('home page', () => {
  it('tells a teacher what Kitwright does and links to sign-up', async () => {
    const { page, errors } = await pageNew(browser);
    await page.goto('/');
    await expect(page.getByRole('heading', { level: 1 }).textContent()).resolves.toMatch(/spacecraft/i);
    expect(await page.getByRole('link', { name: 'Create a teacher account' }).getAttribute('href')).toBe('/sign-up');
    expect(await page.getByRole('heading', { name: 'Safety first' }).isVisible()).toBe(true);
    expect(errors).toEqual([]);
  });

  it("states the worked example in the scale solver's own words", async () => {
    const { page } = await pageNew(browser);
    await page.goto('/');
    const { scaleDenominator, sheetSizeId, paperGsm } = HOME_EXAMPLE;
    const solved = solvePaperScale(skein.model, { sheetId: sheetSizeId, paperGsm, scaleDenominator });
    expect(await page.getByTestId('scale-teaser-kit').textContent()).toBe(`The kit: ${solved.explanation}`);
  });

  it('recomputes the body size when a scale button of the island is clicked, and asks the solver for the rest', async () => {
    const { page } = await pageNew(browser);
    await page.goto('/');
    const result = page.getByTestId('scale-teaser-result');
    await expect(result.textContent()).resolves.toContain('1:20');
    // Wait for hydration: the island's buttons work only once React has attached.
    await page.waitForFunction(() => !document.querySelector('astro-island[ssr]'));
    await page.getByRole('button', { name: '1:5', exact: true }).click();
    await page.waitForFunction(() =>
      document.querySelector('[data-testid="scale-teaser-result"]')?.textContent?.includes('1:5 '),
    );
    // 2.4 m / 5 = 480 mm = 18.9 in across (the Skein probe, content/models/skein-probe.json).
    expect(await result.textContent()).toContain('18.9 in');
    const kit = page.getByTestId('scale-teaser-kit');
    expect(await kit.getByRole('link', { name: 'ask the scale solver' }).getAttribute('href')).toBe(
      '/tools/scale?sheet=letter&units=us',
    );
  });
});
