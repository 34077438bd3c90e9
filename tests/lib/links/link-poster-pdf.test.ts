import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import jsQR from 'jsqr';
import { PDFDocument } from 'pdf-lib';
import sharp from 'sharp';
import { describe, expect, test } from 'vitest';
import { BOOKMARKS_PER_SHEET, linkPosterPdf } from '../../../src/lib/links/link-poster-pdf';
import { fixtureFonts } from '../../fixtures/pieces/kit-layout';
import { pdfPageTexts } from '../../fixtures/pdf-text';

const fonts = fixtureFonts();
const link = { title: 'Skein activity bookmark', address: 'https://kitwright.example/go/SKEN42', code: 'SKEN42' };

/**
 * Page 1 rendered by poppler's pdftoppm (an independent renderer), cut into `parts` vertical strips (jsQR finds one
 * symbol per image), and the QR code jsQR decodes in each.
 */
async function decodeRendered(bytes: Uint8Array, parts: number): Promise<string[]> {
  const dir = mkdtempSync(join(tmpdir(), 'kw-poster-'));
  writeFileSync(join(dir, 'p.pdf'), bytes);
  execFileSync('pdftoppm', ['-r', '150', '-png', '-singlefile', join(dir, 'p.pdf'), join(dir, 'p')]);
  const png = readFileSync(join(dir, 'p.png'));
  const meta = await sharp(png).metadata();
  const found: string[] = [];
  for (let i = 0; i < parts; i++) {
    const width = Math.floor(meta.width! / parts);
    const { data, info } = await sharp(png)
      .extract({ left: i * width, top: 0, width, height: meta.height! })
      .ensureAlpha()
      .raw()
      .toBuffer({ resolveWithObject: true });
    const code = jsQR(new Uint8ClampedArray(data), info.width, info.height);
    if (code) found.push(code.data);
  }
  return found;
}

describe('linkPosterPdf', () => {
  test('prints three bookmarks whose QR codes decode (jsQR on a pdftoppm render) to the /go/ address', async () => {
    const bytes = linkPosterPdf(link, 'bookmark', 'letter', fonts);
    expect(await decodeRendered(bytes, BOOKMARKS_PER_SHEET)).toEqual(Array(BOOKMARKS_PER_SHEET).fill(link.address));
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
    expect(await decodeRendered(bytes, 1)).toEqual([link.address]);
    expect((await pdfPageTexts(bytes))[0]).toContain('Skein activity bookmark');
  });

  test('draws the symbol as vector squares, not an image', async () => {
    const bytes = linkPosterPdf(link, 'poster', 'letter', fonts);
    const raw = Buffer.from(bytes).toString('latin1');
    expect(raw).not.toContain('/Subtype /Image');
  });
});
