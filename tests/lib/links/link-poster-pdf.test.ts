import { PDFDocument } from 'pdf-lib';
import { describe, expect, test } from 'vitest';
import { BOOKMARKS_PER_SHEET, linkPosterPdf } from '../../../src/lib/links/link-poster-pdf';
import { fixtureFonts } from '../../fixtures/pieces/kit-layout';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { LINK_PRINT_PAPERS } from '../../../src/lib/links/link-code';
import { pdfQrCodes, pdfQrSymbols } from '../../fixtures/pdf-qr';
import { pdfPageTexts } from '../../fixtures/pdf-text';

const fonts = fixtureFonts();
const link = { title: 'Skein activity bookmark', address: 'https://kitwright.example/go/SKEN42', code: 'SKEN42' };

/**
 * Page sizes in PDF points, 1/72 in (ISO 32000-1:2008, 8.3.2.3): Letter 8.5 × 11 in and Tabloid 11 × 17 in
 * (ASME Y14.1, ANSI A and B), A4 210 × 297 mm and A3 297 × 420 mm (ISO 216) at 72/25.4 pt per mm.
 */
const PAGE_PT = {
  letter: [612, 792],
  a4: [595.276, 841.89],
  tabloid: [792, 1224],
  a3: [841.89, 1190.551],
} as const;

/** How far below the top of the page (mm) pdf.js finds the first text item that is exactly `str`. */
async function textTopMm(bytes: Uint8Array, str: string): Promise<number | null> {
  const page = await (await getDocument({ data: bytes.slice(), disableFontFace: true }).promise).getPage(1);
  const heightPt = page.view[3]!;
  const item = (await page.getTextContent()).items.find((i) => 'str' in i && i.str === str);
  if (!item || !('transform' in item)) return null;
  // transform[5] is the text's baseline in points from the bottom of the page; the item's height is its size.
  return ((heightPt - item.transform[5] - item.height) * 25.4) / 72;
}

describe('linkPosterPdf', () => {
  test('prints three bookmarks whose QR codes decode (jsQR on a pdftoppm render) to the /go/ address', async () => {
    const bytes = linkPosterPdf(link, 'bookmark', 'letter', fonts);
    expect(await pdfQrCodes(bytes, { parts: BOOKMARKS_PER_SHEET })).toEqual(
      Array(BOOKMARKS_PER_SHEET).fill(link.address),
    );
    const text = (await pdfPageTexts(bytes))[0]!;
    expect(text.split(link.address)).toHaveLength(BOOKMARKS_PER_SHEET + 1);
    expect(text).toContain('Code SKEN42');
  });

  test.each(LINK_PRINT_PAPERS)(
    'prints a poster on %s with its title, the address and the code under the symbol',
    async (paper) => {
      const bytes = linkPosterPdf(link, 'poster', paper, fonts);
      const doc = await PDFDocument.load(bytes);
      expect(doc.getPageCount()).toBe(1);
      const { width, height } = doc.getPage(0).getSize();
      expect(width).toBeCloseTo(PAGE_PT[paper][0], 2);
      expect(height).toBeCloseTo(PAGE_PT[paper][1], 2);
      const text = (await pdfPageTexts(bytes))[0]!;
      expect(text).toContain(link.address);
      expect(text).toContain(`Code ${link.code}`);
      const [symbol] = await pdfQrSymbols(bytes);
      expect(symbol?.data).toBe(link.address);
      expect(await textTopMm(bytes, `Code ${link.code}`)).toBeGreaterThan(symbol!.bottomMm);
    },
  );

  test('grows the poster’s symbol with the width of the sheet', async () => {
    const side = async (paper: (typeof LINK_PRINT_PAPERS)[number]) =>
      (await pdfQrSymbols(linkPosterPdf(link, 'poster', paper, fonts)))[0]!.sideMm;
    const letter = await side('letter');
    // Same address, same symbol version: the sides go as the page widths (a 150 dpi render: within 1 %).
    for (const paper of ['a4', 'tabloid', 'a3'] as const) {
      const ratio = (await side(paper)) / letter / (PAGE_PT[paper][0] / PAGE_PT.letter[0]);
      expect(Math.abs(ratio - 1)).toBeLessThan(0.01);
    }
  });

  test('draws the symbol as vector squares, not an image', async () => {
    const bytes = linkPosterPdf(link, 'poster', 'letter', fonts);
    const raw = Buffer.from(bytes).toString('latin1');
    expect(raw).not.toContain('/Subtype /Image');
  });
});
