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

describe('home page', () => {
  it('tells a teacher what Kitwright does and links to sign-up', async () => {
    const { page, errors } = await pageNew(browser);
    await page.goto('/');
    await expect(page.getByRole('heading', { level: 1 }).textContent()).resolves.toMatch(/spacecraft/i);
    expect(await page.getByRole('link', { name: 'Create a teacher account' }).getAttribute('href')).toBe('/sign-up');
    expect(await page.getByRole('heading', { name: 'Safety first' }).isVisible()).toBe(true);
    expect(errors).toEqual([]);
  });

  it('recomputes the scale answer when a scale button of the island is clicked', async () => {
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
    // 2.4 m / 5 = 480 mm = 18.9 in across: wider than Letter's 8.5 in.
    expect(await result.textContent()).toContain('18.9 in');
    expect(await result.textContent()).toContain('too wide');
  });
});
