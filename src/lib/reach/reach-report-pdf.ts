/**
 * The quarterly reach report as a PDF for a funder: the office's name and the quarter, every headline figure
 * with the quarter before and its definition, a bar chart per figure by month drawn as vector rectangles, the
 * high-need share and the top schools. Pure: the caller passes the numbers (the same reachSummary the dashboard
 * shows) and the font bytes. Lengths in mm.
 */
import {
  FLOW_MARGIN_MM,
  pdfFlowBytes,
  pdfFlowEnsure,
  pdfFlowFooters,
  pdfFlowHeading,
  pdfFlowNew,
  pdfFlowText,
  pdfFlowTextWidth,
  type PdfFlow,
} from '../activities/pdf-flow';
import { pdfFontUse, type PdfFonts } from '../render/pdf-fonts';
import type { ReachFigureId } from './figures';

export interface ReachReportInput {
  officeName: string;
  quarterLabel: string;
  periodText: string;
  figures: { id: ReachFigureId; label: string; definition: string; value: number; previous: number }[];
  months: string[];
  series: Record<ReachFigureId, number[]>;
  /** Schools reached that are high-need, and all schools reached. */
  highNeed: { schools: number; of: number };
  topSchools: { name: string; students: number; kits: number; entries: number }[];
}

const CHART_HEIGHT_MM = 22;
const CHART_COLUMNS = 3;
const BAR = '#0d6b62';

/** The report's bytes. */
export function reachReportPdf(input: ReachReportInput, fonts: PdfFonts): Uint8Array<ArrayBuffer> {
  const flow = pdfFlowNew('letter', fonts, `Reach report ${input.quarterLabel}`, input.officeName);
  pdfFlowText(flow, input.officeName, { sizePt: 11, bold: true, afterMm: 1 });
  pdfFlowText(flow, `Reach report · ${input.quarterLabel}`, { sizePt: 18, bold: true, afterMm: 1 });
  pdfFlowText(flow, input.periodText, { sizePt: 10, afterMm: 4 });

  pdfFlowHeading(flow, 'Headline figures');
  for (const f of input.figures) {
    pdfFlowText(flow, `${f.label}: ${f.value.toLocaleString('en-US')}`, { bold: true, afterMm: 0.5 });
    pdfFlowText(flow, `Quarter before: ${f.previous.toLocaleString('en-US')}. ${f.definition}`, {
      sizePt: 9,
      indentMm: 4,
      afterMm: 1.5,
    });
  }
  const share = input.highNeed.of ? Math.round((100 * input.highNeed.schools) / input.highNeed.of) : 0;
  pdfFlowHeading(flow, 'High-need share');
  pdfFlowText(
    flow,
    `${input.highNeed.schools} of ${input.highNeed.of} schools reached are high-need (${share}%), as each school's record states with its basis and year.`,
  );

  pdfFlowHeading(flow, 'By month');
  reportCharts(flow, input);

  pdfFlowHeading(flow, 'Top schools by students reached');
  if (input.topSchools.length === 0) pdfFlowText(flow, 'No school was reached in this quarter.');
  input.topSchools.forEach((s, i) =>
    pdfFlowText(flow, `${i + 1}. ${s.name}: ${s.students} students, ${s.kits} kits, ${s.entries} entries published`, {
      afterMm: 0.8,
    }),
  );
  pdfFlowFooters(flow, `${input.officeName} · reach report ${input.quarterLabel}`);
  return pdfFlowBytes(flow);
}

/** One small bar chart per figure, three to a row, as filled rectangles with month labels. */
function reportCharts(flow: PdfFlow, input: ReachReportInput): void {
  const { doc } = flow;
  const gap = 6;
  const width = (pdfFlowTextWidth(flow) - gap * (CHART_COLUMNS - 1)) / CHART_COLUMNS;
  const rowHeight = CHART_HEIGHT_MM + 17;
  input.figures.forEach((f, i) => {
    const col = i % CHART_COLUMNS;
    if (col === 0) pdfFlowEnsure(flow, rowHeight);
    const x0 = FLOW_MARGIN_MM + col * (width + gap);
    const top = flow.y;
    const values = input.series[f.id];
    const max = Math.max(1, ...values);
    pdfFontUse(doc, true);
    doc.setFontSize(8);
    doc.setTextColor('#1b2330');
    doc.text(`${f.label} (max ${max})`, x0, top, { baseline: 'top' });
    // Room under the title for the value printed above the tallest bar.
    const base = top + 8 + CHART_HEIGHT_MM;
    const slot = width / Math.max(1, values.length);
    doc.setDrawColor('#46505f');
    doc.setLineWidth(0.2);
    doc.line(x0, base, x0 + width, base);
    doc.setFillColor(BAR);
    pdfFontUse(doc, false);
    doc.setFontSize(7);
    values.forEach((v, j) => {
      const h = (v / max) * CHART_HEIGHT_MM;
      // jspdf's text drawing changes the fill colour: set it again for every bar.
      doc.setFillColor(BAR);
      if (h > 0) doc.rect(x0 + j * slot + slot * 0.2, base - h, slot * 0.6, h, 'F');
      doc.text(String(v), x0 + j * slot + slot / 2, base - h - 0.8, { align: 'center', baseline: 'bottom' });
      doc.text(input.months[j] ?? '', x0 + j * slot + slot / 2, base + 1, { align: 'center', baseline: 'top' });
    });
    if (col === CHART_COLUMNS - 1 || i === input.figures.length - 1) flow.y = base + 8;
  });
}
