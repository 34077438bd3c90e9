import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import type { Browser, Page } from 'playwright-core';
import { browserLaunch, pageNew } from './browser';

let browser: Browser;
beforeAll(async () => {
  browser = await browserLaunch();
});
afterAll(async () => {
  await browser?.close();
});

/** Waits until the island of `component` has hydrated (Astro drops the ssr attribute then). */
async function islandReady(page: Page, component: string): Promise<void> {
  await page.waitForSelector(`astro-island[component-url*="${component}"]:not([ssr])`, { state: 'attached' });
}

/** Serious and critical axe-core violations on the page as it is now, as "id: help" lines. */
async function axeSerious(page: Page): Promise<string[]> {
  await page.evaluate(readFileSync('node_modules/axe-core/axe.min.js', 'utf8'));
  const violations = await page.evaluate(async () => {
    const axe = (
      window as unknown as {
        axe: { run: () => Promise<{ violations: { id: string; impact: string; help: string }[] }> };
      }
    ).axe;
    return (await axe.run()).violations.map((v) => ({ id: v.id, impact: v.impact, help: v.help }));
  });
  return violations.filter((v) => v.impact === 'serious' || v.impact === 'critical').map((v) => `${v.id}: ${v.help}`);
}

/** An accelerometer CSV of a 10 Hz, 1 g sine along x (gravity on z), 100 Hz for 5.12 s. */
function sineCsv(): Buffer {
  const lines = ['time_s,x_g,y_g,z_g'];
  for (let i = 0; i < 512; i++) {
    const t = i / 100;
    lines.push(`${t.toFixed(2)},${Math.sin(2 * Math.PI * 10 * t).toFixed(6)},0,1`);
  }
  return Buffer.from(lines.join('\n') + '\n');
}

describe('magnetic tool', () => {
  it('fits the sample readings to an exponent near −3 and draws the plot', async () => {
    const { page, errors } = await pageNew(browser);
    await page.goto('/tools/magnetic');
    await islandReady(page, 'MagneticTool');
    await page.getByRole('button', { name: 'Load sample data' }).click();
    await page.getByRole('button', { name: 'Fit the power law' }).click();
    const exponent = page.getByTestId('magnetic-exponent');
    await exponent.waitFor();
    // The sample is a dipole, whose far field falls as r⁻³ (Griffiths, §5.4.3); 0.1 allows the sample's noise.
    const n = Number((await exponent.textContent())!.split('±')[0]!.trim());
    expect(Math.abs(n + 3)).toBeLessThan(0.1);
    await page.waitForSelector('[data-testid="plot"][data-ready="true"] canvas');
    expect(await page.locator('[data-testid="plot"] figcaption').textContent()).toMatch(/exponent/);
    expect(await axeSerious(page)).toEqual([]);
    expect(errors).toEqual([]);
  });

  it('shows a typed cell’s problem next to that cell, and the API’s field error next to its cell', async () => {
    const { page } = await pageNew(browser);
    await page.goto('/tools/magnetic');
    await islandReady(page, 'MagneticTool');
    const distance1 = page.getByLabel('Distance, row 1');
    await distance1.fill('abc');
    await page.getByLabel('Field, row 1').fill('50');
    await page.getByRole('button', { name: 'Fit the power law' }).click();
    await expect(distance1.getAttribute('aria-invalid')).resolves.toBe('true');
    const describedBy = (await distance1.getAttribute('aria-describedby'))!;
    expect(await page.locator(`[id="${describedBy}"]`).textContent()).toBe('“abc” is not a number');

    // A number the API refuses (distance must be positive) comes back as readings.0.distanceCm.
    await distance1.fill('-2');
    for (const [row, d, b] of [
      [2, '5', '40'],
      [3, '6', '20'],
      [4, '8', '9'],
    ] as const) {
      await page.getByLabel(`Distance, row ${row}`).fill(d);
      await page.getByLabel(`Field, row ${row}`).fill(b);
    }
    await page.getByRole('button', { name: 'Fit the power law' }).click();
    await page.getByRole('alert').filter({ hasText: 'We could not compute that' }).waitFor();
    const id = (await distance1.getAttribute('aria-describedby'))!;
    expect(await page.locator(`[id="${id}"]`).textContent()).toMatch(/from 0.1 to 100000 cm/);
    expect(await axeSerious(page)).toEqual([]);
  });
});

describe('vibration tool', () => {
  it('analyses an uploaded CSV into Grms and a PSD plot', async () => {
    const { page, errors } = await pageNew(browser);
    await page.goto('/tools/vibration');
    await islandReady(page, 'VibrationTool');
    await page.getByLabel('Upload an accelerometer CSV').setInputFiles({
      name: 'shake.csv',
      mimeType: 'text/csv',
      buffer: sineCsv(),
    });
    const grms = page.getByTestId('vibration-grms');
    await grms.waitFor();
    // A sine of amplitude 1 g has an RMS of 1/√2 = 0.707 g; gravity on z is removed as the mean.
    expect(Math.abs(Number(await grms.textContent()) - Math.SQRT1_2)).toBeLessThan(0.01);
    await page.waitForSelector('[data-testid="plot"][data-ready="true"] canvas');
    expect(await page.locator('[data-testid="plot"] figcaption').first().textContent()).toMatch(/PSD/);
    expect(await axeSerious(page)).toEqual([]);
    expect(errors).toEqual([]);
  });
});

describe('vibration tool refusals', () => {
  it('refuses a file above the limit before sending it', async () => {
    const { page } = await pageNew(browser);
    await page.goto('/tools/vibration');
    await islandReady(page, 'VibrationTool');
    let posted = false;
    page.on('request', (req) => {
      if (req.url().includes('/api/analysis/vibration')) posted = true;
    });
    await page.getByLabel('Upload an accelerometer CSV').setInputFiles({
      name: 'huge.csv',
      mimeType: 'text/csv',
      buffer: Buffer.alloc(17_000_000, 'a'),
    });
    await page.getByText('“huge.csv” is 17 MB; this tool reads files up to 16 MB').waitFor();
    expect(posted).toBe(false);
  });

  it('shows the server’s message about a bad cell next to the upload', async () => {
    const { page } = await pageNew(browser);
    await page.goto('/tools/vibration');
    await islandReady(page, 'VibrationTool');
    // File row 4 (header, t = 0, t = 0.01, t = 0.02) gets text in its x cell.
    const lines = sineCsv().toString().split('\n');
    lines[3] = '0.02,oops,0,1';
    const text = lines.join('\n');
    await page
      .getByLabel('Upload an accelerometer CSV')
      .setInputFiles({ name: 'bad.csv', mimeType: 'text/csv', buffer: Buffer.from(text) });
    const upload = page.getByLabel('Upload an accelerometer CSV');
    await expect.poll(() => upload.getAttribute('aria-invalid')).toBe('true');
    const ids = (await upload.getAttribute('aria-describedby'))!.split(' ');
    expect(await page.locator(`[id="${ids.at(-1)}"]`).textContent()).toMatch(/^Row 4, column "x_g"/);
  });
});

describe('thermal and clean-room tools', () => {
  it('fits the thermal sample: the blanket run has the longer time constant', async () => {
    const { page, errors } = await pageNew(browser);
    await page.goto('/tools/thermal');
    await islandReady(page, 'ThermalTool');
    await page.getByRole('button', { name: 'Load sample data' }).click();
    await page.getByRole('button', { name: 'Fit the runs' }).click();
    const taus = page.getByTestId('thermal-tau');
    await taus.first().waitFor();
    const [bare, blanket] = (await taus.allTextContents()).map((t) => Number(t.split('±')[0]));
    // The sample's runs have τ = 5 and 12 min (thermal-sample.ts); a blanket slows the cooling.
    expect(blanket! > bare!).toBe(true);
    await page.waitForSelector('[data-testid="plot"][data-ready="true"] canvas');
    expect(await axeSerious(page)).toEqual([]);
    expect(errors).toEqual([]);
  });

  it('classifies the clean-room sample as ISO Class 7', async () => {
    const { page, errors } = await pageNew(browser);
    await page.goto('/tools/cleanroom');
    await islandReady(page, 'CleanroomTool');
    await page.getByRole('button', { name: 'Load sample data' }).click();
    await page.getByRole('button', { name: 'Classify the air' }).click();
    // The worst location's 254 000 particles/m³ ≥ 0.5 µm is under Class 7's 352 000 (ISO 14644-1:2015 Table 1).
    await expect.poll(() => page.getByTestId('cleanroom-class').textContent()).toBe('ISO Class 7');
    expect(await axeSerious(page)).toEqual([]);
    expect(errors).toEqual([]);
  });
});

describe('scale tool', () => {
  it('explains the scale for the venue chosen, without JavaScript help', async () => {
    const { page } = await pageNew(browser);
    await page.goto('/tools/scale');
    await page.getByLabel('Venue', { exact: true }).selectOption('gym-fiba');
    await page.getByRole('button', { name: 'Find the scale' }).click();
    await page.waitForURL(/venue=gym-fiba/);
    expect(await page.getByTestId('scale-explanation').textContent()).toMatch(/FIBA basketball court/);
    expect(await page.getByTestId('scale-venue-explanation').textContent()).toMatch(/largest scale that fits/);
    expect(await axeSerious(page)).toEqual([]);
  });

  it('lists every tool on the tools page', async () => {
    const { page } = await pageNew(browser);
    await page.goto('/tools');
    for (const name of [
      'Shake test',
      'Thermal cycling',
      'Clean room',
      'Magnetic field',
      'Scale it',
      'Four-point measurement',
      'Launch stack',
      'Deployment trials',
      'Interference hunt',
    ]) {
      expect(await page.getByRole('link', { name, exact: true }).count()).toBe(1);
    }
    expect(await axeSerious(page)).toEqual([]);
  });
});

describe('four-point tool', () => {
  it('finds the sample gradient, draws the formation and the arrow in 3D, and refuses the flat sample', async () => {
    const { page, errors } = await pageNew(browser);
    await page.goto('/tools/four-point');
    await islandReady(page, 'FourPointTool');
    await page.getByRole('button', { name: 'Load sample: one corner raised' }).click();
    await page.getByRole('button', { name: 'Find the gradient' }).click();
    const gradient = page.getByTestId('four-point-gradient');
    await gradient.waitFor();
    // The sample lamp stands at x < 0 and above the table: the field grows toward −x and +z.
    const [gx, , gz] = (await gradient.textContent())!
      .replace(/[()]/g, '')
      .split(',')
      .map((s) => Number(s.trim()));
    expect(gx).toBeLessThan(0);
    expect(gz).toBeGreaterThan(0);
    await page.getByTestId('formation-view').scrollIntoViewIfNeeded();
    await islandReady(page, 'FormationView');
    await page.waitForSelector('[data-testid="formation-canvas"][data-scene-ready="true"]', { timeout: 30_000 });
    expect(await page.getByTestId('formation-canvas').getAttribute('data-arrow')).toBe('shown');
    expect(await page.getByTestId('formation-arrow').textContent()).toMatch(/points where the reading grows fastest/);

    await page.getByRole('button', { name: 'Load sample: all four flat' }).click();
    await page.getByRole('button', { name: 'Find the gradient' }).click();
    await page
      .getByText(/like three points do: they cannot see how the field changes across that plane/)
      .first()
      .waitFor();
    await page.waitForSelector('[data-testid="formation-canvas"][data-arrow="none"]');
    expect(errors).toEqual([]);
  });
});

describe('launch stack tool', () => {
  it('checks the sample stack: height, centre of mass, fit, and the side view in stacking order', async () => {
    const { page, errors } = await pageNew(browser);
    await page.goto('/tools/launch-stack');
    await islandReady(page, 'LaunchStackTool');
    await page.getByRole('button', { name: 'Load sample data' }).click();
    await page.getByRole('button', { name: 'Check the stack' }).click();
    await page.getByTestId('stack-height').waitFor();
    // Hand calculation (tests/lib/analysis/launch-stack.test.ts): 4.1 m tall, centre of mass 3610.5/1530 m.
    expect(await page.getByTestId('stack-height').textContent()).toBe('4.1');
    expect(Number(await page.getByTestId('stack-centre-of-mass').textContent())).toBeCloseTo(2.36, 2);
    expect(await page.getByTestId('stack-fits').textContent()).toBe('Yes');
    const parts = await page.locator('[data-testid="launch-stack-view"] figcaption li').allTextContents();
    expect(parts[0]).toBe('Launch adapter');
    expect(parts.at(-1)).toBe('Probe 3');

    // A fairing too short: the tool says how much longer its cylinder must be.
    await page.getByLabel('Cylinder height').fill('3.5');
    await page.getByLabel('Fairing diameter').fill('3');
    await page.getByLabel('Cone height').fill('2.5');
    await page.getByRole('button', { name: 'Check the stack' }).click();
    await page.getByText(/too tall for this fairing/).waitFor();
    expect(await page.getByTestId('stack-fits').textContent()).toBe('No');
    expect(errors).toEqual([]);
  });

  it('shows the launch stack in the 3D fold-along preview, bottom part first', async () => {
    const { page, errors } = await pageNew(browser);
    await page.goto('/preview/skein-stack');
    await page.getByTestId('fold-preview').scrollIntoViewIfNeeded();
    await page.waitForSelector('[data-testid="fold-canvas"][data-scene-ready="true"]', { timeout: 30_000 });
    const steps = await page.locator('[data-testid="fold-preview"] ol li').allTextContents();
    expect(steps[0]).toMatch(/Launch adapter/);
    expect(steps.findIndex((s) => /Probe 3/.test(s))).toBeGreaterThan(steps.findIndex((s) => /Probe 1/.test(s)));
    expect(errors).toEqual([]);
  });
});

describe('deployment tool', () => {
  it('turns the sample trials into rates with their ranges, a comparison and the running-rate plot', async () => {
    const { page, errors } = await pageNew(browser);
    await page.goto('/tools/deployment');
    await islandReady(page, 'DeploymentTool');
    await page.getByRole('button', { name: 'Load sample data' }).click();
    await page.getByRole('button', { name: 'Work out the success rate' }).click();
    const summary = page.getByTestId('deployment-summary-0');
    await summary.waitFor();
    // Wilson 1927 score interval for 17 of 20 at 95 %: 0.6396–0.9476, i.e. 64 % and 95 %.
    expect(await summary.textContent()).toBe(
      '17 of 20 deployed fully: 85 %, and with this many trials the true rate is likely between 64 % and 95 %.',
    );
    // Textbook n = z²p(1 − p)/E² at p = 0.85, E = 0.1: 49 trials, 29 more than the 20 run.
    expect(await page.getByTestId('deployment-more-0').textContent()).toBe('49 in all: 29 more');
    expect(await page.getByTestId('deployment-comparison').textContent()).toMatch(
      /cannot yet tell the two designs apart/,
    );
    await page.waitForSelector('[data-testid="plot"][data-ready="true"] canvas');
    expect(await page.locator('[data-testid="plot"] figcaption').textContent()).toBe('Success rate over the trials');
    expect(await axeSerious(page)).toEqual([]);
    expect(errors).toEqual([]);
  });

  it('shows a mistyped outcome next to its cell before sending anything', async () => {
    const { page } = await pageNew(browser);
    await page.goto('/tools/deployment');
    await islandReady(page, 'DeploymentTool');
    await page.getByLabel('Design, row 1').fill('Boom');
    const outcome = page.getByLabel('Outcome, row 1');
    await outcome.fill('sort of');
    await page.getByRole('button', { name: 'Work out the success rate' }).click();
    await expect(outcome.getAttribute('aria-invalid')).resolves.toBe('true');
    const id = (await outcome.getAttribute('aria-describedby'))!;
    expect(await page.locator(`[id="${id}"]`).textContent()).toBe('write full, partial or none');
  });
});

describe('interference tool', () => {
  it('ranks the sample devices and draws one bar per device', async () => {
    const { page, errors } = await pageNew(browser);
    await page.goto('/tools/interference');
    await islandReady(page, 'InterferenceTool');
    await page.getByRole('button', { name: 'Load sample data' }).click();
    await page.getByRole('button', { name: 'Rank the devices' }).click();
    const table = page.getByTestId('interference-ranking');
    await table.waitFor();
    const names = await table.locator('tbody th').allTextContents();
    // The sample devices are dipoles; a stronger moment crosses the threshold farther out (Griffiths §5.4.3).
    expect(names).toEqual(['Phone charger', 'Desk fan', 'Toy motor']);
    expect(await page.getByTestId('interference-summary').textContent()).toMatch(/^Phone charger needs the most room/);
    await page.waitForSelector('[data-testid="plot"][data-ready="true"] canvas');
    expect(await axeSerious(page)).toEqual([]);
    expect(errors).toEqual([]);
  });

  it('ranks AM-radio listening distances', async () => {
    const { page } = await pageNew(browser);
    await page.goto('/tools/interference');
    await islandReady(page, 'InterferenceTool');
    await page.getByLabel('Receiver', { exact: true }).selectOption('am-radio');
    await page.getByRole('button', { name: 'Load sample data' }).click();
    await page.getByRole('button', { name: 'Rank the devices' }).click();
    const table = page.getByTestId('interference-ranking');
    await table.waitFor();
    expect(await table.locator('tbody tr').first().textContent()).toMatch(/1Phone charger65/);
  });
});
