/**
 * The kit as one PDF, one page per sheet at the sheet's exact size (jspdf writes the MediaBox in points,
 * 1 pt = 1/72 in, ISO 32000-1:2008 §8.3.2.3), drawn as vector paths with subsets of the shipped KitwrightSans
 * faces embedded (pdf-fonts.ts). Pure: the caller passes the font bytes (the server reads them with
 * fonts.server.ts).
 */
import { jsPDF } from 'jspdf';
import { placementApply } from '../layout/placement';
import type { KitLayout, LaidOutSheet, SheetVec2Mm } from '../layout/types';
import { GLUE_TINT, LINE_STYLES, TEXT_COLOR } from './line-styles';
import { pieceLines } from './piece-lines';
import { pdfFontsAdd, pdfFontUse } from './pdf-fonts';
import type { PdfFonts } from './pdf-fonts';
import { sheetScene } from './sheet-scene';
import type { SceneText } from './scene-types';
import { instructionsPages, type InstructionsPage } from './instructions-page';
import type { LabelMeasure } from './label-placement';
import { pdfTextMeasure } from './pdf-text-measure';

export type { PdfFonts } from './pdf-fonts';
const PT_PER_MM = 72 / 25.4;

/** The PDF bytes of a kit; a kit without sheets gives a PDF of its single empty first page layout. */
export function pdfKit(kit: KitLayout, fonts: PdfFonts): Uint8Array {
  const first = kit.sheets[0];
  const pageFormat = (s: Pick<LaidOutSheet, 'widthMm' | 'heightMm'>): [number, number] => [s.widthMm, s.heightMm];
  const doc = new jsPDF({
    unit: 'mm',
    format: first ? pageFormat(first) : [kit.sheetSize.widthMm, kit.sheetSize.heightMm],
    orientation: 'portrait',
    compress: true,
    putOnlyUsedFonts: true,
  });
  pdfFontsAdd(doc, fonts);
  doc.setProperties({
    title: kit.title,
    subject: `Paper model kit, scale 1:${kit.scaleDenominator}`,
    creator: `Kitwright engine ${kit.engineVersion}`,
  });
  const measure = pdfTextMeasure(doc, fonts);
  const pageSize = first ?? kit.sheetSize;
  const instructions = instructionsPages(kit, pageSize, measure);
  let pages = 0;
  const addPage = (format: [number, number]) => {
    if (pages++ > 0) doc.addPage(format, 'portrait');
  };
  const drawInstructions = () =>
    instructions.forEach((page) => {
      addPage(pageFormat(pageSize));
      pdfInstructionsPage(doc, page, measure);
    });
  if (kit.instructionsAt === 'first') drawInstructions();
  kit.sheets.forEach((sheet) => {
    addPage(pageFormat(sheet));
    pdfSheet(doc, kit, sheet, measure);
  });
  if (kit.instructionsAt !== 'first') drawInstructions();
  return new Uint8Array(doc.output('arraybuffer'));
}

function pdfSheet(doc: jsPDF, kit: KitLayout, sheet: LaidOutSheet, measure: LabelMeasure) {
  const byId = new Map(kit.pieces.map((p) => [p.id, p]));
  // Labels are laid out with the embedded font's own advance widths (jspdf's getTextWidth, in mm).
  const scene = sheetScene(kit, sheet, measure);
  doc.setLineJoin('round');
  for (const placement of sheet.placements) {
    const piece = byId.get(placement.pieceId);
    if (!piece) continue;
    const lines = pieceLines(piece, placement, (polylines) =>
      polylines.map((line) => line.map((p) => placementApply(placement, p))),
    );
    if (lines.tabs.length) {
      doc.saveGraphicsState();
      const w = placement.tile?.windowMm;
      if (w) doc.rect(w.xMm, w.yMm, w.widthMm, w.heightMm, null).clip().discardPath();
      doc.setFillColor(GLUE_TINT);
      for (const tab of lines.tabs) pdfPolygonFill(doc, tab);
      doc.restoreGraphicsState();
    }
    pdfPolylines(doc, lines.cut, LINE_STYLES.cut);
    pdfPolylines(doc, lines.mountain, LINE_STYLES.mountain);
    pdfPolylines(doc, lines.valley, LINE_STYLES.valley);
  }
  for (const fill of scene.fills) {
    doc.setFillColor(fill.color);
    for (const r of fill.rects) doc.rect(r.xMm, r.yMm, r.widthMm, r.heightMm, 'F');
  }
  for (const stroke of scene.strokes) pdfPolylines(doc, [stroke.points], stroke);
  pdfTexts(doc, scene.texts, measure);
}

function pdfTexts(doc: jsPDF, texts: readonly SceneText[], measure: LabelMeasure) {
  doc.setTextColor(TEXT_COLOR);
  for (const t of texts) {
    const half = t.anchor === 'middle' ? measure(t.text, t.sizeMm, t.bold) / 2 : 0;
    pdfFontUse(doc, t.bold);
    doc.setFontSize(t.sizeMm * PT_PER_MM);
    const x = t.atMm[0] - half * Math.cos(t.angleRad);
    const y = t.atMm[1] - half * Math.sin(t.angleRad);
    // jspdf turns text counter-clockwise on the page; the scene's angles are clockwise.
    doc.text(t.text, x, y, { baseline: 'middle', angle: t.angleRad ? (-t.angleRad * 180) / Math.PI : 0 });
  }
}

/** One instructions page: the step drawings' shapes, then the texts. */
function pdfInstructionsPage(doc: jsPDF, page: InstructionsPage, measure: LabelMeasure) {
  doc.setLineJoin('round');
  doc.setLineDashPattern([], 0);
  for (const shape of page.shapes) {
    if (shape.points.length < 2) continue;
    doc.setDrawColor(shape.stroke);
    doc.setLineWidth(shape.widthMm);
    doc.moveTo(shape.points[0]![0], shape.points[0]![1]);
    for (let i = 1; i < shape.points.length; i++) doc.lineTo(shape.points[i]![0], shape.points[i]![1]);
    if (shape.closed) doc.close();
    if (shape.fill) {
      doc.setFillColor(shape.fill);
      doc.fillStroke();
    } else doc.stroke();
  }
  pdfTexts(doc, page.texts, measure);
}

function pdfPolylines(
  doc: jsPDF,
  polylines: readonly (readonly SheetVec2Mm[])[],
  style: { widthMm: number; color: string; dashMm: readonly number[] },
) {
  if (polylines.length === 0) return;
  doc.setDrawColor(style.color);
  doc.setLineWidth(style.widthMm);
  doc.setLineDashPattern([...style.dashMm], 0);
  for (const line of polylines) {
    if (line.length < 2) continue;
    doc.moveTo(line[0]![0], line[0]![1]);
    for (let i = 1; i < line.length; i++) doc.lineTo(line[i]![0], line[i]![1]);
  }
  doc.stroke();
}

function pdfPolygonFill(doc: jsPDF, polygon: readonly SheetVec2Mm[]) {
  if (polygon.length < 3) return;
  doc.moveTo(polygon[0]![0], polygon[0]![1]);
  for (let i = 1; i < polygon.length; i++) doc.lineTo(polygon[i]![0], polygon[i]![1]);
  doc.close();
  doc.fill();
}
