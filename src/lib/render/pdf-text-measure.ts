/**
 * Text widths as jspdf measures them with the embedded KitwrightSans faces (getTextWidth: the sum of the
 * face's advance widths, no kerning), kept per font file so a process that builds many kits measures each
 * label, name and sentence once. A width depends only on the face's file, the size and the text; measuring
 * writes nothing to the document (jspdf marks a font used when it draws text, not when it measures).
 */
import type { jsPDF } from 'jspdf';
import type { LabelMeasure } from './label-placement';
import { pdfFontUse, type PdfFonts } from './pdf-fonts';

const PT_PER_MM = 72 / 25.4;

/** Widths kept per font file before its table is emptied and starts again (a kit measures a few hundred). */
const WIDTHS_PER_FONT = 20_000;

const widthsByFont = new WeakMap<Uint8Array, Map<string, number>>();

/** The width in mm of a text at a size (em) in mm, measured on `doc` with its faces from `fonts`. */
export function pdfTextMeasure(doc: jsPDF, fonts: PdfFonts): LabelMeasure {
  return (text, sizeMm, bold) => {
    const face = bold ? fonts.fontBold : fonts.fontRegular;
    let widths = widthsByFont.get(face);
    if (!widths) widthsByFont.set(face, (widths = new Map()));
    const key = `${sizeMm}|${text}`;
    let width = widths.get(key);
    if (width === undefined) {
      pdfFontUse(doc, bold);
      doc.setFontSize(sizeMm * PT_PER_MM);
      width = doc.getTextWidth(text);
      if (widths.size >= WIDTHS_PER_FONT) widths.clear();
      widths.set(key, width);
    }
    return width;
  };
}
