/**
 * The two KitwrightSans faces as every Kitwright PDF embeds them (kits, guides, data sheets). jspdf embeds a
 * TrueType face as a CIDFontType2 font whose program keeps only the glyph outlines the document used; each
 * face is registered under its own PDF name, the PostScript name of the face after a subset tag — six capital
 * letters and "+", which marks an embedded subset (ISO 32000-1:2008 §9.6.4) — so a reader and `pdffonts` see
 * two distinct subset fonts, not two fonts of one name.
 *
 * The font files are turned into the form jspdf reads (a binary string) once per byte array and kept, so a
 * process or worker that builds many PDFs from the same PdfFonts prepares them once; the subset programs
 * embedded at output are kept too (pdf-font-subsets.ts).
 */
import type { jsPDF } from 'jspdf';
import { pdfFontSubsetsShare } from './pdf-font-subsets';

export interface PdfFonts {
  /** KitwrightSans-Regular.ttf, the whole file. */
  fontRegular: Uint8Array;
  /** KitwrightSans-Bold.ttf, the whole file. */
  fontBold: Uint8Array;
}

/**
 * PDF names of the embedded faces: subset tag + PostScript name (name ID 6 of each shipped file). The tags are
 * fixed: ISO 32000-1 §9.6.4 asks only that different subsets in one file have different tags.
 */
export const PDF_FONT_NAMES = {
  normal: 'KWSANR+KitwrightSans-Regular',
  bold: 'KWSANB+KitwrightSans-Bold',
} as const;

const prepared = new WeakMap<Uint8Array, string>();

/** The font file as jspdf's virtual file system takes it: one char per byte (a TrueType file starts 00 01 00 00). */
function pdfFontFile(bytes: Uint8Array): string {
  let file = prepared.get(bytes);
  if (file === undefined) {
    const parts: string[] = [];
    const chunk = 0x8000;
    for (let i = 0; i < bytes.length; i += chunk) parts.push(String.fromCharCode(...bytes.subarray(i, i + chunk)));
    file = parts.join('');
    prepared.set(bytes, file);
  }
  return file;
}

/** Registers both faces on a new document and selects the regular one. */
export function pdfFontsAdd(doc: jsPDF, fonts: PdfFonts): void {
  for (const [style, bytes] of [
    ['normal', fonts.fontRegular],
    ['bold', fonts.fontBold],
  ] as const) {
    const file = `${PDF_FONT_NAMES[style]}.ttf`;
    doc.addFileToVFS(file, pdfFontFile(bytes));
    doc.addFont(file, PDF_FONT_NAMES[style], style, 'Identity-H');
    doc.setFont(PDF_FONT_NAMES[style], style);
    pdfFontSubsetsShare(doc, bytes);
  }
  pdfFontUse(doc, false);
}

/** Selects the bold or the regular face for the text that follows. */
export function pdfFontUse(doc: jsPDF, bold: boolean): void {
  const style = bold ? 'bold' : 'normal';
  doc.setFont(PDF_FONT_NAMES[style], style);
}
