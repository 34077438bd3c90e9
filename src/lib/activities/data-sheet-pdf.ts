/**
 * The student data sheet of an activity as a one-page PDF: a header for the team (no names: a team label and
 * the class code), the sheet's instructions and a ruled table with one heading per column, its unit under it,
 * and the sheet's number of blank rows sized to fill the page.
 */
import type { PdfFonts } from '../render/pdf-kit';
import { pdfFontUse } from '../render/pdf-fonts';
import { TEST_KIND_LABELS } from './activity-facets';
import type { ActivityPaper } from './activity-links';
import type { Activity, DataSheetColumn } from './activity-schema';
import {
  FLOW_MARGIN_MM,
  pdfFlowBytes,
  pdfFlowFooters,
  pdfFlowNew,
  pdfFlowText,
  pdfFlowTextWidth,
  type PdfFlow,
} from './pdf-flow';

/** Row height limits, mm: 7 mm is about the smallest a student writes into (common practice, no source). */
const ROW_MIN_MM = 7;
const ROW_MAX_MM = 12;

/** Column heading type: names in bold over at most three lines, the unit in a smaller line under them. */
const NAME_PT = 9.5;
const UNIT_PT = 8.5;
const NAME_LINES_MAX = 3;
const HEADER_PAD_MM = 1.8;
/** jspdf's default line height is 1.15 × the font size; 1 pt = 25.4 / 72 mm (ISO 32000-1 §8.3.2.3). */
const lineMm = (pt: number) => (pt * 1.15 * 25.4) / 72;

/** Relative width of a column: free-text columns (no unit, no tool) get more room for words. */
export function dataSheetColumnWeight(column: DataSheetColumn): number {
  return column.unit === '' && !column.tool ? 1.6 : 1;
}

/** The data sheet's PDF bytes on Letter or A4; always one page. */
export function dataSheetPdf(
  activity: Activity,
  fonts: PdfFonts,
  paper: ActivityPaper = 'letter',
): Uint8Array<ArrayBuffer> {
  const sheet = activity.record;
  const flow = pdfFlowNew(paper, fonts, `${activity.title}: data sheet`, 'Student data sheet');
  pdfFlowText(flow, `Data sheet · ${activity.title}`, { sizePt: 16, bold: true, afterMm: 3 });
  pdfFlowText(flow, 'Team: ____________________    Class code: __________    Date: ______________', { afterMm: 3 });
  pdfFlowText(flow, sheet.instructions, { afterMm: 1.5 });
  pdfFlowText(flow, `Then type the numbers into the Kitwright ${TEST_KIND_LABELS[sheet.tool].toLowerCase()} tool.`, {
    sizePt: 9.5,
    color: '#46505f',
    afterMm: 4,
  });
  for (const f of sheet.fields) {
    pdfFlowText(flow, `${f.name}${f.unit ? ` (${f.unit})` : ''}: ______________`, { bold: true, afterMm: 2.5 });
  }
  dataSheetTable(flow, sheet.columns, sheet.rows);
  pdfFlowFooters(flow, `Kitwright · ${activity.slug} · student data sheet`);
  return pdfFlowBytes(flow);
}

function dataSheetTable(flow: PdfFlow, columns: readonly DataSheetColumn[], rows: number): void {
  const { doc } = flow;
  const widthMm = pdfFlowTextWidth(flow);
  const weights = columns.map(dataSheetColumnWeight);
  const total = weights.reduce((a, b) => a + b, 0);
  const xs = [FLOW_MARGIN_MM];
  for (const w of weights) xs.push(xs.at(-1)! + (w / total) * widthMm);
  pdfFontUse(doc, true);
  doc.setFontSize(NAME_PT);
  const names = columns.map((c, i): string[] =>
    doc.splitTextToSize(c.name, xs[i + 1]! - xs[i]! - 2).slice(0, NAME_LINES_MAX),
  );
  const nameLines = Math.max(...names.map((n) => n.length));
  const unitTopMm = HEADER_PAD_MM + nameLines * lineMm(NAME_PT);
  const headerMm = unitTopMm + (columns.some((c) => c.unit) ? lineMm(UNIT_PT) : 0) + HEADER_PAD_MM;
  const room = flow.heightMm - FLOW_MARGIN_MM - 4 - flow.y - headerMm;
  const rowMm = Math.max(ROW_MIN_MM, Math.min(ROW_MAX_MM, room / rows));
  const fitRows = Math.min(rows, Math.floor(room / rowMm));
  const top = flow.y;
  const bottom = top + headerMm + fitRows * rowMm;

  doc.setFillColor('#e3e7f4');
  doc.rect(FLOW_MARGIN_MM, top, widthMm, headerMm, 'F');
  doc.setTextColor('#1b2330');
  columns.forEach((c, i) => {
    const cx = (xs[i]! + xs[i + 1]!) / 2;
    pdfFontUse(doc, true);
    doc.setFontSize(NAME_PT);
    doc.text(names[i]!, cx, top + HEADER_PAD_MM, { baseline: 'top', align: 'center' });
    if (c.unit) {
      // Every unit on one line under the tallest name, so the units of a table line up.
      pdfFontUse(doc, false);
      doc.setFontSize(UNIT_PT);
      doc.text(`(${c.unit})`, cx, top + unitTopMm, { baseline: 'top', align: 'center' });
    }
  });
  doc.setDrawColor('#46505f');
  doc.setLineWidth(0.25);
  doc.setLineDashPattern([], 0);
  for (let r = 0; r <= fitRows; r++) {
    const y = top + headerMm + r * rowMm;
    doc.line(FLOW_MARGIN_MM, y, FLOW_MARGIN_MM + widthMm, y);
  }
  doc.line(FLOW_MARGIN_MM, top, FLOW_MARGIN_MM + widthMm, top);
  for (const x of xs) doc.line(x, top, x, bottom);
  flow.y = bottom + 4;
}
