/**
 * The fonts of Kitwright's PDFs as tools outside the project read them: poppler's `pdffonts` lists each
 * embedded font with its name, whether it is embedded ("emb"), a subset ("sub": its name carries the
 * six-capital subset tag of ISO 32000-1:2008 §9.6.4) and has a ToUnicode map ("uni"); `qpdf --check` checks
 * the file's structure and streams; pdf-lib reads the embedded font programs (FontFile2) back. Both tools are
 * Debian packages (poppler-utils, qpdf).
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { decodePDFRawStream, PDFDict, PDFDocument, PDFName, PDFRawStream, PDFRef } from 'pdf-lib';
import { jsPDF } from 'jspdf';
import { afterAll, describe, expect, test, vi } from 'vitest';
import { guidePdf } from '../../../src/lib/activities/guide-pdf';
import { buildKit } from '../../../src/lib/kit/build-kit';
import { KitRequestSchema } from '../../../src/lib/kit/kit-request';
import { kitFonts } from '../../../src/lib/kit/fonts.server';
import { PDF_FONT_NAMES, pdfFontsAdd } from '../../../src/lib/render/pdf-fonts';
import { activitiesParsed } from '../activities/activity-files';
import { demoModel } from '../geometry/fixtures';
import { fixtureFonts } from '../../fixtures/pieces/kit-layout';

const fonts = fixtureFonts();
const dir = mkdtempSync(join(tmpdir(), 'kw-pdf-fonts-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function pdfFile(name: string, bytes: Uint8Array): string {
  const path = join(dir, name);
  writeFileSync(path, bytes);
  return path;
}

/** pdffonts rows: name, emb, sub, uni (its fixed-width table, columns found from the dashes line). */
function pdffonts(path: string) {
  const [header, dashes, ...rows] = execFileSync('pdffonts', [path], { encoding: 'utf8' }).trimEnd().split('\n');
  expect(header).toMatch(/^name\s+type\s+encoding\s+emb\s+sub\s+uni/);
  const spans = [...dashes!.matchAll(/-+/g)].map((m) => [m.index!, m.index! + m[0].length] as const);
  return rows.map((row) => {
    const [name, type, , emb, sub, uni] = spans.map(([a, b]) => row.slice(a, b).trim());
    return { name: name!, type: type!, emb, sub, uni };
  });
}

/** The uncompressed font program (FontFile2) of every font descriptor in the document. */
async function embeddedFontPrograms(bytes: Uint8Array): Promise<Uint8Array[]> {
  const doc = await PDFDocument.load(bytes);
  const programs: Uint8Array[] = [];
  for (const [, object] of doc.context.enumerateIndirectObjects()) {
    if (!(object instanceof PDFDict) || object.get(PDFName.of('Type')) !== PDFName.of('FontDescriptor')) continue;
    const ref = object.get(PDFName.of('FontFile2'));
    const stream = ref instanceof PDFRef ? doc.context.lookup(ref) : undefined;
    if (stream instanceof PDFRawStream) programs.push(decodePDFRawStream(stream).decode());
  }
  return programs;
}

/**
 * Glyphs of a TrueType font that have an outline, read from its tables as the OpenType specification lays them
 * out: the table directory (16-byte records after a 12-byte header), head.indexToLocFormat (offset 50),
 * maxp.numGlyphs (offset 4) and loca (glyph i has an outline when loca[i + 1] > loca[i]).
 */
function trueTypeOutlinedGlyphs(font: Uint8Array): number {
  const view = new DataView(font.buffer, font.byteOffset, font.byteLength);
  const tables = new Map<string, number>();
  for (let i = 0; i < view.getUint16(4); i++) {
    const at = 12 + 16 * i;
    tables.set(String.fromCharCode(...font.subarray(at, at + 4)), view.getUint32(at + 8));
  }
  const long = view.getInt16(tables.get('head')! + 50) === 1;
  const glyphs = view.getUint16(tables.get('maxp')! + 4);
  const loca = tables.get('loca')!;
  const offset = (i: number) => (long ? view.getUint32(loca + 4 * i) : 2 * view.getUint16(loca + 2 * i));
  let outlined = 0;
  for (let i = 0; i < glyphs; i++) if (offset(i + 1) > offset(i)) outlined++;
  return outlined;
}

describe('PDF fonts', () => {
  test('names each face differently, with a subset tag of six capitals and "+"', () => {
    for (const name of Object.values(PDF_FONT_NAMES)) expect(name).toMatch(/^[A-Z]{6}\+[A-Za-z-]+$/);
    expect(PDF_FONT_NAMES.normal).not.toBe(PDF_FONT_NAMES.bold);
  });

  test('the Skein kit at 1:20 embeds two distinct subset faces with ToUnicode maps, and passes qpdf --check', async () => {
    const request = KitRequestSchema.parse({
      model: demoModel('skein-probe'),
      scaleDenominator: 20,
      sheetSizeId: 'letter',
      qrUrl: 'https://kitwright.example/k/1',
    });
    const { pdf } = await buildKit(request, fonts, { outputs: ['pdf'] });
    const path = pdfFile('skein.pdf', pdf!);
    const rows = pdffonts(path);
    expect(rows.map((r) => r.name).sort()).toEqual([PDF_FONT_NAMES.bold, PDF_FONT_NAMES.normal]);
    for (const r of rows) expect([r.type, r.emb, r.sub, r.uni]).toEqual(['CID TrueType', 'yes', 'yes', 'yes']);
    // qpdf exits 0 and says so when it finds no error (2 on errors, 3 on warnings).
    expect(execFileSync('qpdf', ['--check', path], { encoding: 'utf8' })).toMatch(
      /No syntax or stream encoding errors/,
    );
    // The embedded programs keep the outlines of the glyphs the kit prints (digits, letters, a few signs), not
    // the shipped files' 280-odd.
    const shipped = Math.min(trueTypeOutlinedGlyphs(fonts.fontRegular), trueTypeOutlinedGlyphs(fonts.fontBold));
    expect(shipped).toBeGreaterThan(250);
    const programs = await embeddedFontPrograms(pdf!);
    expect(programs).toHaveLength(2);
    for (const program of programs) expect(trueTypeOutlinedGlyphs(program)).toBeLessThan(90);
  });

  test('a teacher guide embeds the same two subset faces and passes qpdf --check', () => {
    const path = pdfFile('guide.pdf', guidePdf(activitiesParsed()[0]!, fonts));
    const rows = pdffonts(path);
    expect(new Set(rows.map((r) => r.name))).toEqual(new Set(Object.values(PDF_FONT_NAMES)));
    for (const r of rows) expect(r.sub).toBe('yes');
    expect(execFileSync('qpdf', ['--check', path], { encoding: 'utf8' })).toMatch(
      /No syntax or stream encoding errors/,
    );
  });

  test('a document using the glyphs of an earlier one embeds the same program without rebuilding it', async () => {
    // Fresh arrays, so no program is kept for them yet.
    const own = { fontRegular: new Uint8Array(fonts.fontRegular), fontBold: new Uint8Array(fonts.fontBold) };
    const pdfOf = (text: string, register: (doc: jsPDF) => void) => {
      const doc = new jsPDF({ unit: 'mm', format: 'letter', compress: true, putOnlyUsedFonts: true });
      register(doc);
      doc.text(text, 20, 20);
      return new Uint8Array(doc.output('arraybuffer'));
    };
    const shared = (doc: jsPDF) => pdfFontsAdd(doc, own);
    // jspdf's own subsetting, nothing kept between documents.
    const unshared = (doc: jsPDF) => {
      doc.addFileToVFS('r.ttf', Buffer.from(own.fontRegular).toString('latin1'));
      doc.addFont('r.ttf', PDF_FONT_NAMES.normal, 'normal', 'Identity-H');
      doc.setFont(PDF_FONT_NAMES.normal, 'normal');
    };
    // jspdf's subset builder, watched from before the first document registers the faces.
    const probe = new jsPDF();
    shared(probe);
    const builder = Object.getPrototypeOf((probe.getFont().metadata as { subset: object }).subset) as {
      encode: () => unknown;
    };
    const builds = vi.spyOn(builder, 'encode');
    try {
      const [first] = await embeddedFontPrograms(pdfOf('Step 12: fold A', shared));
      expect(builds).toHaveBeenCalledTimes(1);
      const [again] = await embeddedFontPrograms(pdfOf('fold A: Step 21', shared));
      expect(builds).toHaveBeenCalledTimes(1);
      expect(again).toEqual(first);
      // Other glyphs get their own program, byte for byte the one jspdf builds unshared.
      const [other] = await embeddedFontPrograms(pdfOf('Valley 7', shared));
      expect(builds).toHaveBeenCalledTimes(2);
      expect(other).not.toEqual(first);
      expect(other).toEqual((await embeddedFontPrograms(pdfOf('Valley 7', unshared)))[0]);
    } finally {
      builds.mockRestore();
    }
  });

  test("turns each font file into jspdf's form once per process or worker, not once per document", async () => {
    // kitFonts hands every build of a process (a pool worker is one) the same byte arrays.
    const [first, second] = await Promise.all([kitFonts(), kitFonts()]);
    expect(second.fontRegular).toBe(first.fontRegular);
    expect(second.fontBold).toBe(first.fontBold);
    // Fresh arrays, so nothing is prepared yet; the preparation spreads 32 KiB chunks into String.fromCharCode.
    const own = { fontRegular: new Uint8Array(fonts.fontRegular), fontBold: new Uint8Array(fonts.fontBold) };
    const chunks = (bytes: Uint8Array) => Math.ceil(bytes.length / 0x8000);
    const spy = vi.spyOn(String, 'fromCharCode');
    const chunkCalls = () => spy.mock.calls.filter((args) => args.length > 1_000).length;
    try {
      pdfFontsAdd(new jsPDF({ unit: 'mm', format: 'letter' }), own);
      expect(chunkCalls()).toBe(chunks(own.fontRegular) + chunks(own.fontBold));
      spy.mockClear();
      for (let i = 0; i < 3; i++) pdfFontsAdd(new jsPDF({ unit: 'mm', format: 'letter' }), own);
      expect(chunkCalls()).toBe(0);
    } finally {
      spy.mockRestore();
    }
  });
});
