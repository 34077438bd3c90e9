import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { describe, expect, test } from 'vitest';
import { buildPlanDrawingScale, buildPlanPdf, type BuildPlanInput } from '../../../src/lib/events/build-plan-pdf';
import { stakeOutPlan } from '../../../src/lib/events/stake-out';
import { VENUES } from '../../../src/lib/layout/venues';
import { fixtureFonts } from '../../fixtures/pieces/kit-layout';
import { pdfPageTexts } from '../../fixtures/pdf-text';
import { demoModel } from '../geometry/fixtures';

const fonts = fixtureFonts();
const skein = demoModel('skein-probe');

function input(scale: number): BuildPlanInput {
  return {
    eventTitle: 'Skein probe life-size build',
    modelName: 'Skein probe',
    venueLabel: VENUES['football-field'].label,
    whenText: '2027-03-09 09:30 (America/Chicago).',
    plan: stakeOutPlan(skein, VENUES['football-field'], scale),
    cutList: {
      rows: [{ part: 'Top cap', widthMm: 2771, heightMm: 2400, quantity: 1, sheets: [2, 3] }],
      panels: 4,
      panelLabel: 'Panel 1220 × 2440 mm',
    },
    materials: [],
    paper: 'letter',
  };
}

/** Text items of page 1 with their x centre and baseline y in PDF points (pdf.js, an independent reader). */
async function firstPageItems(bytes: Uint8Array) {
  const doc = await getDocument({ data: bytes.slice(), disableFontFace: true, useSystemFonts: false }).promise;
  const content = await (await doc.getPage(1)).getTextContent();
  return content.items.flatMap((i) =>
    'str' in i ? [{ str: i.str, xPt: i.transform[4] + i.width / 2, yPt: i.transform[5] }] : [],
  );
}

describe('buildPlanPdf', () => {
  // ISO 32000-1:2008 §8.3.2.3: 1 pt = 1/72 in = 25.4/72 mm. The bar's end labels are centred on its ends, so
  // the distance between their centres, times the drawing scale, must equal the length the bar is labelled.
  test('draws a scale bar that measures its labelled length at the stated drawing scale', async () => {
    const bytes = buildPlanPdf(input(2), fonts);
    const items = await firstPageItems(bytes);
    const end = items.find((i) => /^\d+(\.\d+)? m$/.test(i.str))!;
    const zero = items.find((i) => i.str === '0' && Math.abs(i.yPt - end.yPt) < 0.5)!;
    const scaleText = items
      .map((i) => i.str)
      .join(' ')
      .match(/Drawing scale 1:(\d+(?:\.\d+)?)/)!;
    const drawing = Number(scaleText[1]);
    const paperMm = ((end.xPt - zero.xPt) * 25.4) / 72;
    const groundM = (paperMm * drawing) / 1000;
    expect(Math.abs(groundM - parseFloat(end.str))).toBeLessThan((0.2 * drawing) / 1000);
  });

  test('says plainly that the life-size probe does not fit the field and which scale would', async () => {
    const text = (await pdfPageTexts(buildPlanPdf(input(1), fonts))).join('\n').replace(/\s+/g, ' ');
    expect(text).toContain('It does not fit at 1:1.');
    expect(text).toContain(
      'football field with end zones (360 × 160 ft) with a 5 % clear border on every side is 1:2.',
    );
    expect(text).toContain('36.20 m (118.77 ft)');
    expect(text).toContain('Host school sign-off');
    expect(text).toContain('common practice');
  });

  test('picks a round drawing scale at least as small as the box needs', () => {
    const plan = stakeOutPlan(skein, VENUES['football-field'], 2);
    const { denominator, boundsM } = buildPlanDrawingScale(plan, [180, 110]);
    expect(((boundsM[2]! - boundsM[0]!) * 1000) / denominator).toBeLessThanOrEqual(180);
    expect(
      [1, 2, 2.5, 5].some((m) => Math.abs(denominator / 10 ** Math.floor(Math.log10(denominator)) - m) < 1e-9),
    ).toBe(true);
  });
});
