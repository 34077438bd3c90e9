import { getDocument, OPS } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { PDFDocument } from 'pdf-lib';
import { describe, expect, test } from 'vitest';
import { pdfKit } from '../../../src/lib/render/pdf-kit';
import { instructionsPages } from '../../../src/lib/render/instructions-page';
import { textWidthMm } from '../../../src/lib/render/text-width';
import { fixtureFonts, fixtureKit } from '../../fixtures/pieces/kit-layout';

const fonts = fixtureFonts();

async function pdfjsPages(bytes: Uint8Array) {
  const doc = await getDocument({ data: bytes.slice(), disableFontFace: true, useSystemFonts: false }).promise;
  return doc;
}

/** Boxes (pt) of every path drawn on a page, from pdf.js's operator list: [minX, minY, maxX, maxY]. */
async function pathBoxes(
  page: Awaited<ReturnType<Awaited<ReturnType<typeof pdfjsPages>>['getPage']>>,
): Promise<number[][]> {
  const ops = await page.getOperatorList();
  const boxes: number[][] = [];
  ops.fnArray.forEach((fn, i) => {
    if (fn === OPS.constructPath) boxes.push(Array.from(ops.argsArray[i][2] as ArrayLike<number>));
  });
  return boxes;
}

describe('pdfKit', () => {
  // ISO 32000-1:2008 §8.3.2.3: default user space unit 1/72 in; Letter (ASME Y14.1 ANSI A, 8.5 × 11 in) is
  // 612 × 792 pt and A4 (ISO 216, 210 × 297 mm) 595.276 × 841.890 pt. jspdf writes the MediaBox to 0.01 pt.
  test('has one Letter page per sheet and per instructions page, 612 × 792 pt, read back by pdf.js and pdf-lib', async () => {
    const kit = fixtureKit('letter', 'us');
    const bytes = pdfKit(kit, fonts);
    const doc = await pdfjsPages(bytes);
    const pages = kit.sheets.length + instructionsPages(kit, kit.sheetSize, textWidthMm).length;
    expect(doc.numPages).toBe(pages);
    for (let n = 1; n <= doc.numPages; n++) {
      const [x0, y0, x1, y1] = (await doc.getPage(n)).view;
      expect(x1! - x0!).toBeCloseTo(612, 2);
      expect(y1! - y0!).toBeCloseTo(792, 2);
    }
    const lib = await PDFDocument.load(bytes);
    expect(lib.getPageCount()).toBe(pages);
    expect(lib.getPage(0).getSize().width).toBeCloseTo(612, 2);
  });

  test('has A4 pages of 595.276 × 841.890 pt and Tabloid pages of 792 × 1224 pt', async () => {
    for (const [id, w, h] of [
      ['a4', 595.276, 841.89],
      ['a3', 841.89, 1190.551],
      ['tabloid', 792, 1224],
      ['legal', 612, 1008],
    ] as const) {
      const doc = await PDFDocument.load(pdfKit(fixtureKit(id, 'metric'), fonts));
      const size = doc.getPage(0).getSize();
      expect(Math.abs(size.width - w)).toBeLessThan(0.006);
      expect(Math.abs(size.height - h)).toBeCloseTo(0, 2);
    }
  });

  test('draws a check square of exactly 2 in (144 pt) on every US sheet and 50 mm (141.732 pt) on metric ones', async () => {
    // 2 in = 50.8 mm exactly (NIST SP 811, App. B); 50 mm = 141.732 pt. pdf.js reports path boxes as float32,
    // so allow 0.01 pt (3.5 µm).
    for (const [units, side] of [
      ['us', 144],
      ['metric', (50 * 72) / 25.4],
    ] as const) {
      const kit = fixtureKit('letter', units);
      const doc = await pdfjsPages(pdfKit(kit, fonts));
      // The sheets come first; the instructions pages after them carry no check square.
      for (let n = 1; n <= kit.sheets.length; n++) {
        const boxes = await pathBoxes(await doc.getPage(n));
        const squares = boxes.filter(
          ([a, b, c, d]) => Math.abs(c! - a! - side) < 0.01 && Math.abs(d! - b! - side) < 0.01,
        );
        expect(squares.length).toBeGreaterThanOrEqual(1);
      }
    }
  });

  test('prints the sheet number, title, scale and engine version in text pdf.js can extract', async () => {
    const kit = fixtureKit('a4', 'metric');
    const doc = await pdfjsPages(pdfKit(kit, fonts));
    const page = await doc.getPage(2);
    const text = (await page.getTextContent()).items.map((i) => ('str' in i ? i.str : '')).join(' ');
    expect(text).toContain(`Sheet 2 of ${kit.sheets.length}`);
    expect(text).toContain('Fixture probe');
    expect(text).toContain('1:20');
    expect(text).toContain('0.0.0-test');
  });

  test('prints the cut list of a stock kit on its first panel, read back as text lines by pdf.js', async () => {
    const kit = fixtureKit('panel-1220x2440', 'metric', 2);
    const page = await (await pdfjsPages(pdfKit(kit, fonts))).getPage(1);
    // Text items on one baseline (same PDF y, 0.01 pt) form a line, read left to right.
    const lines = new Map<number, { x: number; s: string }[]>();
    for (const item of (await page.getTextContent()).items) {
      if (!('str' in item) || !item.str.trim()) continue;
      const y = Math.round(item.transform[5] * 100) / 100;
      lines.set(y, [...(lines.get(y) ?? []), { x: item.transform[4], s: item.str }]);
    }
    const texts = [...lines.values()].map((l) => l.sort((a, b) => a.x - b.x).map((i) => i.s));
    expect(texts).toContainEqual(['Cut list']);
    expect(texts).toContainEqual(['Part', 'Size', 'Qty', 'Sheets']);
    // The fixture's strip is a 400 × 40 mm rectangle (tests/fixtures/pieces), two copies for two teams.
    const onSheets = kit.sheets.filter((s) => s.placements.some((p) => p.pieceId === 'long')).map((s) => s.number);
    expect(texts).toContainEqual(['Panel long', '400 × 40 mm', '2', onSheets.join(', ')]);
    expect(kit.cutList.length).toBe(kit.pieces.length);
    for (const row of kit.cutList) expect(texts.some((t) => t[0] === row.part && t[2] === '2')).toBe(true);
  });

  test('prints no cut list on paper kits', async () => {
    const page = await (await pdfjsPages(pdfKit(fixtureKit('letter', 'us'), fonts))).getPage(1);
    const text = (await page.getTextContent()).items.map((i) => ('str' in i ? i.str : '')).join(' ');
    expect(text).not.toContain('Cut list');
  });

  test('embeds the KitwrightSans subset rather than a standard font', async () => {
    const bytes = pdfKit(fixtureKit(), fonts);
    const raw = new TextDecoder('latin1').decode(bytes);
    expect(raw).toMatch(/\/BaseFont \/[A-Z]{6}\+KitwrightSans-Regular/);
    expect(raw).toMatch(/\/BaseFont \/[A-Z]{6}\+KitwrightSans-Bold/);
    expect(raw).not.toMatch(/\/BaseFont \/Helvetica/);
    // Two embedded subsets of ~35 kB each, compressed with the page streams: well under the 760 kB full font.
    expect(bytes.length).toBeLessThan(200_000);
  });
});
