/**
 * The class journal booklet, read back by pdf.js (a PDF reader independent of jspdf): the cover, one entry per
 * page with its text, its photos as images and its results' plots as vector paths placed where the data puts them.
 */
import { getDocument, OPS } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { describe, expect, it } from 'vitest';
import { vibrationSavedResult } from '../../../src/lib/analysis/saved-result-tools';
import type { SavedPlot, SavedResult } from '../../../src/lib/analysis/saved-result';
import { vibrationAnalyse } from '../../../src/lib/analysis/vibration';
import { vibrationInputFromCsv } from '../../../src/lib/analysis/vibration-csv';
import { journalBookletPdf, resultTableRows, type BookletEntry } from '../../../src/lib/journal/journal-booklet-pdf';
import { vibrationSampleCsv } from '../../../src/lib/tools/vibration-sample';
import { pdfPageTexts, pdfTextSquash as squash } from '../../fixtures/pdf-text';
import { photoJpeg } from '../../fixtures/photos';
import { fixtureFonts } from '../../fixtures/pieces/kit-layout';

const fonts = fixtureFonts();
const sample = vibrationInputFromCsv(vibrationSampleCsv(), { units: 'auto' });
const shake = vibrationSavedResult(vibrationAnalyse(sample.input, sample.unitSource));

const entry = (o: Partial<BookletEntry> = {}): BookletEntry => ({
  title: 'Our probe survived the shake table',
  byline: 'Team Comet · Period 3 Science',
  status: 'Published 2026-11-27',
  body: 'Two tabs came **loose** on the first run.\n\nWe added glue and it held.',
  photos: [],
  results: [],
  ...o,
});

/** The operators pdf.js reads from each page: how many images it paints and the boxes of the paths (pt). */
async function pageDrawing(bytes: Uint8Array) {
  const doc = await getDocument({ data: bytes.slice(), disableFontFace: true, useSystemFonts: false }).promise;
  const pages: { images: number; boxes: number[][] }[] = [];
  for (let n = 1; n <= doc.numPages; n++) {
    const ops = await (await doc.getPage(n)).getOperatorList();
    const page = { images: 0, boxes: [] as number[][] };
    ops.fnArray.forEach((fn, i) => {
      if (fn === OPS.paintImageXObject) page.images += 1;
      if (fn === OPS.constructPath) page.boxes.push(Array.from(ops.argsArray[i][2] as ArrayLike<number>));
    });
    pages.push(page);
  }
  return pages;
}

describe('journalBookletPdf', () => {
  it('has a cover, then each entry on its own page with its title, byline and body as plain text', async () => {
    const bytes = journalBookletPdf(
      {
        title: 'Period 3 Science journal',
        subtitle: 'Every entry of one class',
        madeText: 'made 2026-12-05',
        entries: [
          entry(),
          entry({ title: 'Blanket versus no blanket', body: 'With the <b>foil</b> it warmed slowly.' }),
        ],
      },
      fonts,
    );
    const pages = (await pdfPageTexts(bytes)).map(squash);
    expect(pages).toHaveLength(3);
    expect(pages[0]).toContain(squash('Period 3 Science journal'));
    expect(pages[0]).toContain(squash('2 entries · made 2026-12-05'));
    expect(pages[1]).toContain(squash('Our probe survived the shake table'));
    expect(pages[1]).toContain(squash('Team Comet · Period 3 Science · Published 2026-11-27'));
    // Markdown markup is dropped, not printed: "**loose**" reads "loose".
    expect(pages[1]).toContain(squash('Two tabs came loose on the first run.'));
    expect(pages[1]).toContain(squash('We added glue and it held.'));
    // Raw HTML stays text (markdown-it with html off), so its words are kept and no markup is interpreted.
    expect(pages[2]).toContain(squash('With the <b>foil</b> it warmed slowly.'));
  });

  it('says so on the cover when there are no entries', async () => {
    const bytes = journalBookletPdf({ title: 'Empty', subtitle: 'Nothing yet', madeText: 'today', entries: [] }, fonts);
    const pages = (await pdfPageTexts(bytes)).map(squash);
    expect(pages).toEqual([expect.stringContaining(squash('There are no entries to show yet.'))]);
  });

  it('paints each photo once with its alt text as the caption', async () => {
    const photo = { jpeg: await photoJpeg(640, 480), widthPx: 640, heightPx: 480 };
    const bytes = journalBookletPdf(
      {
        title: 'Photos',
        subtitle: 's',
        madeText: 'm',
        entries: [
          entry({
            photos: [
              { ...photo, altText: 'The finished probe on the shake table' },
              { ...photo, altText: 'Glue drying on the tabs' },
            ],
          }),
        ],
      },
      fonts,
    );
    const images = (await pageDrawing(bytes)).map((p) => p.images);
    expect(images[0]).toBe(0);
    expect(images.reduce((a, b) => a + b, 0)).toBe(2);
    const text = (await pdfPageTexts(bytes)).slice(1).map(squash).join('');
    expect(text).toContain(squash('The finished probe on the shake table'));
    expect(text).toContain(squash('Glue drying on the tabs'));
  });

  it('prints a saved result with its inputs, its figures and its plot title and axis labels as text', async () => {
    const bytes = journalBookletPdf(
      { title: 'R', subtitle: 's', madeText: 'm', entries: [entry({ results: [shake] })] },
      fonts,
    );
    const text = (await pdfPageTexts(bytes)).slice(1).map(squash).join('');
    expect(text).toContain(squash(`Result: ${shake.plot.title}`));
    expect(text).toContain(squash(shake.inputsSummary));
    expect(text).toContain(squash(shake.plot.xLabel));
    expect(text).toContain(squash(shake.plot.yLabel));
    for (const [label] of resultTableRows(shake)) expect(text).toContain(squash(label));
  });

  it('draws a series as a vector path where the linear axes put its points', async () => {
    // The axes run 0–10 on both sides (the second series spans them; 1-2-5 steps give ticks 0, 2, … 10), so the
    // first series, (2, 4)–(8, 6), spans 60 % of the plot area's width and 20 % of its height. The plot area is
    // 640 − 78 − 20 = 542 px wide and 320 − 40 − 56 = 224 px tall (plot-layout.ts margins), drawn 150 mm wide for
    // 640 px, in PDF points of 1/72 in (ISO 32000-1:2008 §8.3.2.3): 25.4 mm = 72 pt.
    const plot: SavedPlot = {
      kind: 'line',
      title: 'Two lines',
      xLabel: 'x',
      yLabel: 'y',
      series: [
        {
          label: 'short',
          points: [
            [2, 4],
            [8, 6],
          ],
        },
        {
          label: 'span',
          points: [
            [0, 0],
            [10, 10],
          ],
        },
      ],
    };
    const result: SavedResult = { ...shake, plot };
    const bytes = journalBookletPdf(
      { title: 'P', subtitle: 's', madeText: 'm', entries: [entry({ results: [result] })] },
      fonts,
    );
    const ptPerPx = ((150 / 640) * 72) / 25.4;
    const boxes = (await pageDrawing(bytes)).flatMap((p) => p.boxes);
    const sized = (w: number, h: number) =>
      boxes.some(([x0, y0, x1, y1]) => Math.abs(x1! - x0! - w) < 0.05 && Math.abs(y1! - y0! - h) < 0.05);
    expect(sized(0.6 * 542 * ptPerPx, 0.2 * 224 * ptPerPx)).toBe(true);
    expect(sized(542 * ptPerPx, 224 * ptPerPx)).toBe(true);
  });
});

describe('resultTableRows', () => {
  it('keeps the scalar figures in order with spaced, lower-case labels, and leaves out lists and objects', () => {
    const rows = resultTableRows({
      ...shake,
      result: { peakHz: 12.5, axis: 'z', passed: true, psd: [1, 2], limits: { lo: 1 }, grmsTotal: 3.14159 },
    });
    expect(rows).toEqual([
      ['peak hz', '12.5'],
      ['axis', 'z'],
      ['passed', 'yes'],
      ['grms total', '3.142'],
    ]);
  });
});
