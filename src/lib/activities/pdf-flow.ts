/**
 * A top-to-bottom text flow on a jspdf document for the printable guides: headings, wrapped paragraphs,
 * bullet and numbered lists and boxed notes, breaking to a new page when the next block would not fit.
 * Lengths in mm from the page's top-left corner; pages are the paper's exact size (jspdf writes the MediaBox
 * in points, 1 pt = 1/72 in, ISO 32000-1:2008 §8.3.2.3). Pure: the caller passes the font bytes.
 */
import { jsPDF } from 'jspdf';
import { pdfFontsAdd, pdfFontUse, type PdfFonts } from '../render/pdf-fonts';
import type { ActivityPaper } from './activity-links';

const PT_PER_MM = 72 / 25.4;
/** Line height as a multiple of the font size, a usual value for body text (common practice, no source). */
const LINE_HEIGHT = 1.3;
export const FLOW_MARGIN_MM = 16;
const INK = '#1b2330';
const SOFT = '#46505f';

export interface PdfFlow {
  doc: jsPDF;
  /** Top of the next block, mm. */
  y: number;
  readonly widthMm: number;
  readonly heightMm: number;
}

/** A new document on Letter or A4 with KitwrightSans registered and the cursor at the top margin. */
export function pdfFlowNew(paper: ActivityPaper, fonts: PdfFonts, title: string, subject: string): PdfFlow {
  const doc = new jsPDF({ unit: 'mm', format: paper, orientation: 'portrait', compress: true, putOnlyUsedFonts: true });
  pdfFontsAdd(doc, fonts);
  doc.setProperties({ title, subject, creator: 'Kitwright' });
  return {
    doc,
    y: FLOW_MARGIN_MM,
    widthMm: doc.internal.pageSize.getWidth(),
    heightMm: doc.internal.pageSize.getHeight(),
  };
}

/** Usable text width between the margins, mm. */
export function pdfFlowTextWidth(flow: PdfFlow): number {
  return flow.widthMm - 2 * FLOW_MARGIN_MM;
}

/** Height of one line at a font size, mm. */
export function pdfFlowLineMm(sizePt: number): number {
  return (sizePt * LINE_HEIGHT) / PT_PER_MM;
}

/** Starts a new page when fewer than `heightMm` remain above the bottom margin. */
export function pdfFlowEnsure(flow: PdfFlow, heightMm: number): void {
  if (flow.y + heightMm <= flow.heightMm - FLOW_MARGIN_MM) return;
  flow.doc.addPage();
  flow.y = FLOW_MARGIN_MM;
}

interface TextOptions {
  sizePt?: number;
  bold?: boolean;
  color?: string;
  /** Left indent from the margin, mm. */
  indentMm?: number;
  /** Space kept free before the right margin, mm. */
  rightMm?: number;
  /** Space after the block, mm. */
  afterMm?: number;
}

/** Wrapped text at the cursor; moves the cursor below it. Empty text adds only the spacing. */
export function pdfFlowText(flow: PdfFlow, text: string, opts: TextOptions = {}): void {
  const { sizePt = 10.5, bold = false, color = INK, indentMm = 0, rightMm = 0, afterMm = 2 } = opts;
  const { doc } = flow;
  pdfFontUse(doc, bold);
  doc.setFontSize(sizePt);
  doc.setTextColor(color);
  const lines: string[] = text ? doc.splitTextToSize(text, pdfFlowTextWidth(flow) - indentMm - rightMm) : [];
  const lineMm = pdfFlowLineMm(sizePt);
  for (const line of lines) {
    pdfFlowEnsure(flow, lineMm);
    doc.text(line, FLOW_MARGIN_MM + indentMm, flow.y, { baseline: 'top' });
    flow.y += lineMm;
  }
  flow.y += afterMm;
}

/** A section heading, kept on the same page as at least two lines of what follows. */
export function pdfFlowHeading(flow: PdfFlow, text: string, sizePt = 13): void {
  pdfFlowEnsure(flow, pdfFlowLineMm(sizePt) + 2 * pdfFlowLineMm(10.5) + 3);
  flow.y += 2;
  pdfFlowText(flow, text, { sizePt, bold: true, afterMm: 1.5 });
}

/** A list with bullets or numbers hanging in the left indent. */
export function pdfFlowList(flow: PdfFlow, items: readonly string[], numbered = false): void {
  const { doc } = flow;
  const indentMm = 7;
  items.forEach((item, i) => {
    pdfFlowEnsure(flow, pdfFlowLineMm(10.5));
    pdfFontUse(doc, numbered);
    doc.setFontSize(10.5);
    doc.setTextColor(numbered ? INK : SOFT);
    doc.text(numbered ? `${i + 1}.` : '•', FLOW_MARGIN_MM + 1, flow.y, { baseline: 'top' });
    pdfFlowText(flow, item, { indentMm, afterMm: 1.2 });
  });
  flow.y += 1;
}

/** One paragraph of a boxed block. */
export interface PdfFlowBlock extends TextOptions {
  text: string;
}

/** Height a paragraph will take, mm, spacing after included. */
export function pdfFlowMeasure(flow: PdfFlow, block: PdfFlowBlock): number {
  const { sizePt = 10.5, bold = false, indentMm = 0, rightMm = 0, afterMm = 2 } = block;
  pdfFontUse(flow.doc, bold);
  flow.doc.setFontSize(sizePt);
  const lines: string[] = block.text
    ? flow.doc.splitTextToSize(block.text, pdfFlowTextWidth(flow) - indentMm - rightMm)
    : [];
  return lines.length * pdfFlowLineMm(sizePt) + afterMm;
}

/**
 * Paragraphs inside a tinted box with a coloured rule on the left, kept on one page when they fit one; a
 * block taller than a page is drawn without the box rather than split.
 */
export function pdfFlowBox(flow: PdfFlow, blocks: readonly PdfFlowBlock[], tint: string, rule: string): void {
  const pad = 3;
  const inset = blocks.map((b) => ({ ...b, indentMm: (b.indentMm ?? 0) + pad + 1, rightMm: (b.rightMm ?? 0) + pad }));
  const contentMm = inset.reduce((sum, b) => sum + pdfFlowMeasure(flow, b), 0);
  const heightMm = contentMm + 2 * pad;
  const fits = heightMm <= flow.heightMm - 2 * FLOW_MARGIN_MM;
  if (fits) {
    pdfFlowEnsure(flow, heightMm);
    flow.doc.setFillColor(tint);
    flow.doc.rect(FLOW_MARGIN_MM, flow.y, pdfFlowTextWidth(flow), heightMm, 'F');
    flow.doc.setFillColor(rule);
    flow.doc.rect(FLOW_MARGIN_MM, flow.y, 1.2, heightMm, 'F');
    flow.y += pad;
  }
  for (const b of fits ? inset : blocks) pdfFlowText(flow, b.text, b);
  flow.y += fits ? pad + 3 : 3;
}

/** "Page n of m" and a left footer on every page; call last. */
export function pdfFlowFooters(flow: PdfFlow, left: string): void {
  const { doc } = flow;
  const pages = doc.getNumberOfPages();
  for (let n = 1; n <= pages; n++) {
    doc.setPage(n);
    pdfFontUse(doc, false);
    doc.setFontSize(8);
    doc.setTextColor(SOFT);
    const y = flow.heightMm - FLOW_MARGIN_MM / 2;
    doc.text(left, FLOW_MARGIN_MM, y, { baseline: 'middle' });
    doc.text(`Page ${n} of ${pages}`, flow.widthMm - FLOW_MARGIN_MM, y, { baseline: 'middle', align: 'right' });
  }
}

/** The finished document's bytes. */
export function pdfFlowBytes(flow: PdfFlow): Uint8Array<ArrayBuffer> {
  return new Uint8Array(flow.doc.output('arraybuffer'));
}
