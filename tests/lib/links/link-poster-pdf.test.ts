import { PDFDocument } from 'pdf-lib';
import { describe, expect, test } from 'vitest';
import { BOOKMARKS_PER_SHEET, linkPosterPdf } from '../../../src/lib/links/link-poster-pdf';
import { fixtureFonts } from '../../fixtures/pieces/kit-layout';
import { pdfQrCodes } from '../../fixtures/pdf-qr';
import { pdfPageTexts } from '../../fixtures/pdf-text';

const fonts = fixtureFonts();
const link = { title: 'Skein activity bookmark', address: 'https://kitwright.example/go/SKEN42', code: 'SKEN42' };

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

  // ISO 32000-1:2008 §8.3.2.3: A4 (ISO 216, 210 × 297 mm) is 595.276 × 841.890 pt.
  test('prints a one-page poster on A4 whose code decodes and whose title is spelled out', async () => {
    const bytes = linkPosterPdf(link, 'poster', 'a4', fonts);
    const doc = await PDFDocument.load(bytes);
    expect(doc.getPageCount()).toBe(1);
    expect(doc.getPage(0).getSize().width).toBeCloseTo(595.276, 2);
    expect(await pdfQrCodes(bytes)).toEqual([link.address]);
    expect((await pdfPageTexts(bytes))[0]).toContain('Skein activity bookmark');
  });

  test('draws the symbol as vector squares, not an image', async () => {
    const bytes = linkPosterPdf(link, 'poster', 'letter', fonts);
    const raw = Buffer.from(bytes).toString('latin1');
    expect(raw).not.toContain('/Subtype /Image');
  });
});
