import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { PDFDocument } from 'pdf-lib';
import { describe, expect, test } from 'vitest';
import { dataSheetPdf } from '../../../src/lib/activities/data-sheet-pdf';
import { guidePdf } from '../../../src/lib/activities/guide-pdf';
import { HAZARD_CAUTIONS, SAFETY_GENERAL_NOTE } from '../../../src/lib/activities/safety';
import { pdfTextSquash as squash } from '../../fixtures/pdf-text';
import { fixtureFonts } from '../../fixtures/pieces/kit-layout';
import { activitiesParsed, activityFiles } from './activity-files';

const fonts = fixtureFonts();
const activities = activitiesParsed();

/** Page sizes (pt) and the text of every page, read back by pdf.js (a reader independent of jspdf). */
async function pdfRead(bytes: Uint8Array) {
  const doc = await getDocument({ data: bytes.slice(), disableFontFace: true, useSystemFonts: false }).promise;
  const pages: { widthPt: number; heightPt: number; text: string }[] = [];
  for (let n = 1; n <= doc.numPages; n++) {
    const page = await doc.getPage(n);
    const [x0, y0, x1, y1] = page.view;
    const content = await page.getTextContent();
    const text = content.items.map((i) => ('str' in i ? i.str : '')).join(' ');
    pages.push({ widthPt: x1! - x0!, heightPt: y1! - y0!, text: text.replace(/\s+/g, ' ') });
  }
  return pages;
}

// ISO 32000-1:2008 §8.3.2.3: 1 unit = 1/72 in, so Letter (ASME Y14.1, 8.5 × 11 in) is 612 × 792 pt and A4
// (ISO 216, 210 × 297 mm) is 595.276 × 841.890 pt. jspdf rounds the MediaBox to 0.01 pt: tolerance 0.01 pt.
const PAPERS = [
  ['letter', 612, 792],
  ['a4', 595.276, 841.89],
] as const;

describe('dataSheetPdf', () => {
  test.each(PAPERS)('prints one %s page of the standard size for every activity', async (paper, w, h) => {
    for (const a of activities) {
      const pages = await pdfRead(dataSheetPdf(a, fonts, paper));
      expect(pages, a.slug).toHaveLength(1);
      expect(Math.abs(pages[0]!.widthPt - w)).toBeLessThan(0.01);
      expect(Math.abs(pages[0]!.heightPt - h)).toBeLessThan(0.01);
    }
  });

  test('contains every field and column name and unit of the data sheet, read back by pdf.js', async () => {
    for (const a of activities) {
      const text = squash((await pdfRead(dataSheetPdf(a, fonts)))[0]!.text);
      for (const c of [...a.record.fields, ...a.record.columns]) {
        expect(text, `${a.slug}: ${c.name}`).toContain(squash(c.name));
        if (c.unit) expect(text, `${a.slug}: ${c.unit}`).toContain(squash(`(${c.unit})`));
      }
      expect(text).toContain(squash(a.title));
      expect(text).toContain('Classcode');
    }
  });

  test('sets each column unit on its own line below every line of the column name', async () => {
    for (const a of activities) {
      const doc = await getDocument({ data: dataSheetPdf(a, fonts).slice(), disableFontFace: true }).promise;
      const items = (await (await doc.getPage(1)).getTextContent()).items.flatMap((i) =>
        'str' in i && i.str.trim()
          ? [{ str: i.str.trim(), x: i.transform[4]!, w: i.width, y: i.transform[5]!, h: i.height }]
          : [],
      );
      for (const c of a.record.columns.filter((col) => col.unit)) {
        const centre = (i: (typeof items)[number]) => i.x + i.w / 2;
        const names = items.filter((i) => squash(c.name).includes(squash(i.str)));
        // The unit printed under this column's name (two columns may share a unit).
        const unit = items.find(
          (i) => squash(i.str) === squash(`(${c.unit})`) && names.some((n) => Math.abs(centre(n) - centre(i)) < 1),
        )!;
        expect(unit, `${a.slug}: ${c.name} (${c.unit})`).toBeDefined();
        const nameLines = names.filter((n) => Math.abs(centre(n) - centre(unit)) < 1 && n.y > unit.y);
        // PDF y grows upwards (ISO 32000-1 §8.3.2.3). Two lines do not overlap when their baselines are at least
        // one font size apart (the em square holds ascender and descender; DejaVu's sit inside it).
        const lowestName = Math.min(...nameLines.map((i) => i.y));
        expect(lowestName - unit.y, `${a.slug}: ${c.name} over (${c.unit})`).toBeGreaterThanOrEqual(unit.h);
      }
    }
  });

  test('agrees with pdf-lib on the page count and size', async () => {
    const lib = await PDFDocument.load(dataSheetPdf(activities[0]!, fonts, 'a4'));
    expect(lib.getPageCount()).toBe(1);
    expect(lib.getPage(0).getSize().width).toBeCloseTo(595.276, 2);
  });
});

describe('guidePdf', () => {
  test.each(PAPERS)('prints %s pages of the standard size', async (paper, w, h) => {
    const pages = await pdfRead(guidePdf(activities[0]!, fonts, { paper }));
    expect(pages.length).toBeGreaterThanOrEqual(2);
    for (const p of pages) {
      expect(Math.abs(p.widthPt - w)).toBeLessThan(0.01);
      expect(Math.abs(p.heightPt - h)).toBeLessThan(0.01);
    }
  });

  test('prints each hazard caution, the school-rules note, every step and the kit builder link', async () => {
    const files = activityFiles();
    for (const [i, a] of activities.entries()) {
      const pages = await pdfRead(guidePdf(a, fonts, { body: files[i]!.body, origin: 'https://kits.example.org' }));
      const text = squash(pages.map((p) => p.text).join(' '));
      for (const h of a.safety?.hazards ?? [])
        expect(text, `${a.slug} ${h}`).toContain(squash(HAZARD_CAUTIONS[h].caution));
      expect(text).toContain(squash(SAFETY_GENERAL_NOTE));
      for (const s of a.steps) expect(text, a.slug).toContain(squash(s));
      expect(text).toContain(squash(`https://kits.example.org/kits/new?model=${a.models[0]}&activity=${a.slug}`));
      expect(text).toContain('Whyflighthardwaredoesthis');
    }
  });
});

describe('activity text and the KitwrightSans subset', () => {
  // assets/fonts/README.md: the subset keeps Basic Latin, Latin-1, General Punctuation, ← ↑ → ↓, U+2212, ✓ and ✗;
  // jspdf silently drops glyphs a font lacks, so every printed character must fall in those ranges.
  const inSubset = (cp: number) =>
    (cp >= 0x20 && cp <= 0x7e) ||
    (cp >= 0xa0 && cp <= 0xff) ||
    (cp >= 0x2000 && cp <= 0x206f) ||
    (cp >= 0x2190 && cp <= 0x2193) ||
    [0x0a, 0x2212, 0x2713, 0x2717].includes(cp);

  test('uses only characters the embedded font has', () => {
    const texts = [
      ...activitiesParsed().map((a) => JSON.stringify(a)),
      ...activityFiles().map((f) => f.body),
      ...Object.values(HAZARD_CAUTIONS).map((c) => c.label + c.caution),
      SAFETY_GENERAL_NOTE,
    ];
    const outside = new Set<string>();
    for (const t of texts) for (const ch of t) if (!inSubset(ch.codePointAt(0)!)) outside.add(ch);
    expect([...outside]).toEqual([]);
  });
});
