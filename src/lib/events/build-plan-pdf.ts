/**
 * The big-build plan packet as a PDF: the venue drawn to scale with the model's footprint, its booms' lines
 * from the centre stake and a scale bar; the stake-out table in metres and feet; rope per boom; the cut list on
 * sheet stock the kit engine makes; materials; crew and safety; the host school's sign-off. Pure: the caller
 * passes the stake-out, the cut list and the font bytes. Lengths on paper in mm.
 */
import {
  FLOW_MARGIN_MM,
  pdfFlowBox,
  pdfFlowBytes,
  pdfFlowEnsure,
  pdfFlowFooters,
  pdfFlowHeading,
  pdfFlowLineMm,
  pdfFlowList,
  pdfFlowNew,
  pdfFlowText,
  pdfFlowTextWidth,
  type PdfFlow,
} from '../activities/pdf-flow';
import type { ActivityPaper } from '../activities/activity-links';
import { pdfFontUse, type PdfFonts } from '../render/pdf-fonts';
import type { CutListRow } from '../layout/types';
import type { Vec2Mm } from '../geometry/types';
import { stakeOutFeet, stakeOutInverse, stakeOutQuadrant, type StakeOut } from './stake-out';

export interface BuildPlanInput {
  eventTitle: string;
  modelName: string;
  /** e.g. "football field with end zones (360 × 160 ft)". */
  venueLabel: string;
  whenText: string;
  plan: StakeOut;
  /** Cut list on sheet stock at the plan's scale, or the reason there is none. */
  cutList: { rows: CutListRow[]; panels: number; panelLabel: string } | { reason: string };
  /** Materials lines beyond the panels and rope (the kit's list). */
  materials: string[];
  paper: ActivityPaper;
}

const INK = '#1b2330';
const FIELD = '#e6f2e8';
const FOOTPRINT = '#0d6b62';
const WARN_TINT = '#fdf0e6';
const WARN_RULE = '#b4531c';
const NOTE_TINT = '#eef3f8';
const NOTE_RULE = '#2f5f8f';
/** Round scale bar lengths, m. */
const BAR_STEPS_M = [0.1, 0.2, 0.5, 1, 2, 5, 10, 20, 50, 100, 200, 500, 1000];

/** "12.35 m (40.52 ft)". */
export function buildPlanLength(lengthM: number): string {
  return `${lengthM.toFixed(2)} m (${stakeOutFeet(lengthM).toFixed(2)} ft)`;
}

/** The drawing's 1:D (paper mm to venue m) that fits both the venue and the layout into a box. */
export function buildPlanDrawingScale(
  plan: StakeOut,
  boxMm: [number, number],
): { denominator: number; boundsM: number[] } {
  const xs = [0, plan.venueM[0], ...plan.points.map((p) => p.xM), ...plan.footprintOutlineM.map((p) => p[0])];
  const ys = [0, plan.venueM[1], ...plan.points.map((p) => p.yM), ...plan.footprintOutlineM.map((p) => p[1])];
  const boundsM = [Math.min(...xs), Math.min(...ys), Math.max(...xs), Math.max(...ys)];
  const need = Math.max(
    ((boundsM[2]! - boundsM[0]!) * 1000) / boxMm[0],
    ((boundsM[3]! - boundsM[1]!) * 1000) / boxMm[1],
  );
  // A round drawing scale (1, 2, 2.5 or 5 × 10^k) so the plan can be measured with a ruler.
  const k = 10 ** Math.floor(Math.log10(need));
  const denominator = [1, 2, 2.5, 5, 10].map((m) => m * k).find((d) => d >= need - 1e-9)!;
  return { denominator, boundsM };
}

/** The packet's bytes. */
export function buildPlanPdf(input: BuildPlanInput, fonts: PdfFonts): Uint8Array<ArrayBuffer> {
  const { plan } = input;
  const flow = pdfFlowNew(input.paper, fonts, `Big-build plan: ${input.eventTitle}`, input.modelName);
  pdfFlowText(flow, 'Big-build plan', { sizePt: 11, bold: true, afterMm: 1 });
  pdfFlowText(flow, input.eventTitle, { sizePt: 17, bold: true, afterMm: 1 });
  pdfFlowText(
    flow,
    `${input.modelName} at 1:${plan.scaleDenominator} on the ${input.venueLabel}: ${buildPlanLength(plan.venueM[0])} × ${buildPlanLength(plan.venueM[1])}. ${input.whenText}`,
    { sizePt: 10, afterMm: 3 },
  );
  const v = plan.venueScale;
  const layout = `At 1:${plan.scaleDenominator} the layout spans ${buildPlanLength(plan.extentM[0])} × ${buildPlanLength(plan.extentM[1])}.`;
  if (plan.fits) {
    pdfFlowBox(
      flow,
      [{ text: `${layout} It fits inside a 5 % clear border on every side.`, sizePt: 10 }],
      NOTE_TINT,
      NOTE_RULE,
    );
  } else {
    pdfFlowBox(
      flow,
      [
        { text: `It does not fit at 1:${plan.scaleDenominator}.`, bold: true, afterMm: 1 },
        {
          text: `${layout} The largest scale that fits the ${input.venueLabel} with a 5 % clear border on every side is 1:${v.scaleDenominator}${v.usualScaleDenominator !== v.scaleDenominator ? ` (1:${v.usualScaleDenominator} among the usual ratios)` : ''}. Regenerate this plan at that scale, or for a larger venue.`,
          sizePt: 10,
        },
      ],
      WARN_TINT,
      WARN_RULE,
    );
  }
  planDrawing(flow, plan);
  stakeOutTable(flow, plan);
  ropeSection(flow, plan);
  cutListSection(flow, input);
  pdfFlowHeading(flow, 'Materials');
  const stakes = plan.points.length + 1;
  pdfFlowList(flow, [
    `${stakes} stakes or marker cones (the centre stake and one per point of the table), and flags to mark them.`,
    'Two long tape measures (at least as long as the longest distance in the table) and a builder’s square or a 3-4-5 rope for right angles.',
    ...plan.booms
      .filter((b) => b.cutLengthM !== null)
      .map((b) => `${b.label}: ${b.material}, ${buildPlanLength(b.cutLengthM!)}.`),
    ...input.materials,
  ]);
  crewSection(flow);
  signOff(flow);
  pdfFlowFooters(flow, `${input.eventTitle} · big-build plan at 1:${plan.scaleDenominator}`);
  return pdfFlowBytes(flow);
}

/** The venue and the layout to a round drawing scale, with plan north, the baseline and a scale bar. */
function planDrawing(flow: PdfFlow, plan: StakeOut): void {
  const { doc } = flow;
  const widthMm = pdfFlowTextWidth(flow);
  const boxHeightMm = Math.min(110, flow.heightMm - FLOW_MARGIN_MM - flow.y - 30);
  const heightMm = boxHeightMm > 60 ? boxHeightMm : 110;
  pdfFlowHeading(flow, 'Plan');
  pdfFlowEnsure(flow, heightMm + 22);
  const { denominator, boundsM } = buildPlanDrawingScale(plan, [widthMm, heightMm]);
  const k = 1000 / denominator; // paper mm per venue m
  const x0 = FLOW_MARGIN_MM;
  const top = flow.y;
  // Plan north (+y) points up the page.
  const at = (p: Vec2Mm): [number, number] => [x0 + (p[0] - boundsM[0]!) * k, top + (boundsM[3]! - p[1]) * k];
  const [vx, vy] = at([0, plan.venueM[1]]);
  doc.setFillColor(FIELD);
  doc.setDrawColor(INK);
  doc.setLineWidth(0.3);
  doc.rect(vx, vy, plan.venueM[0] * k, plan.venueM[1] * k, 'FD');
  const [bx0, by] = at([0, 0]);
  doc.setLineWidth(0.8);
  doc.line(bx0, by, bx0 + plan.venueM[0] * k, by);
  doc.setLineWidth(0.25);
  doc.setDrawColor(FOOTPRINT);
  const poly = (pts: Vec2Mm[], style: 'S' | 'F') => {
    if (pts.length < 3) return;
    const p = pts.map(at);
    const deltas = p.slice(1).map((q, i) => [q[0] - p[i]![0], q[1] - p[i]![1]]);
    doc.lines(deltas, p[0]![0], p[0]![1], [1, 1], style, true);
  };
  doc.setFillColor(FOOTPRINT);
  poly(plan.footprintOutlineM, 'F');
  doc.setDrawColor(FOOTPRINT);
  const [cx, cy] = at(plan.centreM);
  plan.booms.forEach((b) => {
    const [tx, ty] = at(b.tipM);
    const [fx, fy] = at(b.footM);
    doc.setLineDashPattern([1, 1], 0);
    doc.line(cx, cy, fx, fy);
    doc.setLineDashPattern([], 0);
    doc.setLineWidth(0.4);
    doc.line(fx, fy, tx, ty);
    doc.setLineWidth(0.25);
  });
  pdfFontUse(doc, true);
  doc.setFontSize(7);
  doc.setTextColor(INK);
  doc.setFillColor(INK);
  plan.points.forEach((p, i) => {
    const [px, py] = at([p.xM, p.yM]);
    doc.circle(px, py, 0.5, 'F');
    if (p.kind === 'boom-tip') doc.text(String(i + 1), px + 1, py - 1);
  });
  doc.circle(cx, cy, 0.8, 'F');
  // North arrow at the top right of the drawing.
  const nx = x0 + widthMm - 6;
  doc.setLineWidth(0.4);
  doc.line(nx, top + 12, nx, top + 3);
  doc.triangle(nx - 1.5, top + 5, nx + 1.5, top + 5, nx, top + 2, 'F');
  doc.text('Plan N', nx, top + 15, { align: 'center' });
  flow.y = top + (boundsM[3]! - boundsM[1]!) * k + 4;
  // Scale bar: the longest round length up to a third of the width, in black and white quarters.
  const barM = [...BAR_STEPS_M].reverse().find((m) => m * k <= widthMm / 3) ?? BAR_STEPS_M[0]!;
  const barMm = barM * k;
  for (let i = 0; i < 4; i++) {
    doc.setFillColor(i % 2 === 0 ? INK : '#ffffff');
    doc.rect(x0 + (i * barMm) / 4, flow.y, barMm / 4, 1.6, i % 2 === 0 ? 'F' : 'FD');
  }
  pdfFontUse(doc, false);
  doc.setFontSize(7.5);
  doc.text('0', x0, flow.y + 2.4, { align: 'center', baseline: 'top' });
  doc.text(`${barM} m`, x0 + barMm, flow.y + 2.4, { align: 'center', baseline: 'top' });
  flow.y += 7;
  pdfFlowText(
    flow,
    `Drawing scale 1:${denominator} (1 mm on paper is ${denominator / 1000} m on the ground); the thick line is the baseline, the dot in the middle the centre stake, dashed lines run from it to each boom’s foot. Plan north is straight across the venue from the baseline, not compass north. Booms standing up from the ground are not staked${plan.upright.length ? `: ${plan.upright.join(', ')}` : ''}.`,
    { sizePt: 8.5, afterMm: 2 },
  );
}

/** One row of cells at fixed x offsets (mm from the margin). */
function row(flow: PdfFlow, cells: string[], xs: number[], bold = false): void {
  const lineMm = pdfFlowLineMm(8);
  pdfFlowEnsure(flow, lineMm);
  pdfFontUse(flow.doc, bold);
  flow.doc.setFontSize(8);
  flow.doc.setTextColor(INK);
  cells.forEach((c, i) => flow.doc.text(c, FLOW_MARGIN_MM + xs[i]!, flow.y, { baseline: 'top' }));
  flow.y += lineMm;
}

function stakeOutTable(flow: PdfFlow, plan: StakeOut): void {
  pdfFlowHeading(flow, 'Stake-out table');
  pdfFlowText(
    flow,
    `Set the centre stake at x ${buildPlanLength(plan.centreM[0])}, y ${buildPlanLength(plan.centreM[1])} from the baseline’s left corner. Measure each point either by distance and bearing from the centre stake, or by x along the baseline and y square to it; check one against the other.`,
    { sizePt: 9 },
  );
  const xs = [0, 6, 34, 64, 104, 144];
  row(flow, ['#', 'Point', 'Distance', 'Bearing', 'x along baseline', 'y across'], xs, true);
  plan.points.forEach((p, i) =>
    row(
      flow,
      [
        String(i + 1),
        p.label,
        buildPlanLength(p.distanceM),
        `${p.bearingDeg.toFixed(1)}° (${stakeOutQuadrant(p.bearingDeg)})`,
        buildPlanLength(p.xM),
        buildPlanLength(p.yM),
      ],
      xs,
    ),
  );
  flow.y += 2;
}

function ropeSection(flow: PdfFlow, plan: StakeOut): void {
  pdfFlowHeading(flow, 'Rope per boom');
  if (plan.booms.length === 0) {
    pdfFlowText(flow, 'This model has no booms on the ground.');
    return;
  }
  pdfFlowList(
    flow,
    plan.booms.map((b) => {
      const line = stakeOutInverse(b.footM, b.tipM);
      return b.cutLengthM === null
        ? `${b.label}: a pole or tube ${buildPlanLength(b.lengthM)} long.`
        : `${b.label}: cut ${buildPlanLength(b.cutLengthM)} of ${b.material}: ${buildPlanLength(b.lengthM)} laid out plus ${buildPlanLength(b.allowanceM)} for the knots at the body and the tip stake (common practice). It runs ${line.bearingDeg.toFixed(1)}° from plan north.`;
    }),
  );
}

function cutListSection(flow: PdfFlow, input: BuildPlanInput): void {
  pdfFlowHeading(flow, 'Cut list on sheet stock');
  const cut = input.cutList;
  if ('reason' in cut) {
    pdfFlowText(flow, cut.reason);
    return;
  }
  pdfFlowText(
    flow,
    `${cut.panels} panels of ${cut.panelLabel}. Parts larger than a panel are split into tiles that overlap and carry matching letters; print the kit at this scale on panels for the full-size patterns.`,
    { sizePt: 9 },
  );
  const xs = [0, 62, 120, 140];
  row(flow, ['Part', 'Size', 'Quantity', 'Panels'], xs, true);
  for (const r of cut.rows)
    row(
      flow,
      [
        r.part,
        `${(r.widthMm / 1000).toFixed(2)} × ${(r.heightMm / 1000).toFixed(2)} m (${stakeOutFeet(r.widthMm / 1000).toFixed(1)} × ${stakeOutFeet(r.heightMm / 1000).toFixed(1)} ft)`,
        String(r.quantity),
        r.sheets.join(', '),
      ],
      xs,
    );
  flow.y += 2;
}

function crewSection(flow: PdfFlow): void {
  pdfFlowHeading(flow, 'Crew and safety');
  pdfFlowBox(
    flow,
    [
      {
        text: 'Follow the host school’s safety rules and local codes, and the directions of its trained staff: they decide over this plan.',
        bold: true,
        sizePt: 10,
      },
    ],
    WARN_TINT,
    WARN_RULE,
  );
  pdfFlowList(flow, [
    'Crew: one lead who holds this plan, two people per tape measure, one person per stake, and an adult with every group of students.',
    'Ladders: only adults on ladders, on firm level ground, with someone holding the foot; no students above the first step.',
    'Power tools (saws, drills for the panels): adults trained on the tool only, with eye and hearing protection, away from the students’ area.',
    'Sun and heat: shade, water and breaks; sunscreen and hats; move the build to a cooler hour on a hot day.',
    'Keep the venue’s edges, gates and exits clear: no rope, stake or panel across a path or exit; mark stakes with flags or cones so nobody trips.',
    'Lift panels in pairs; keep them flat on the ground in wind.',
    'Take up every stake and rope at the end and check the ground for anything left behind.',
  ]);
}

function signOff(flow: PdfFlow): void {
  // Heading, line and four signature lines stay on one page.
  pdfFlowEnsure(flow, 70);
  pdfFlowHeading(flow, 'Host school sign-off');
  pdfFlowText(flow, 'The host school approves the venue, the date and this plan.', { sizePt: 9, afterMm: 4 });
  const { doc } = flow;
  for (const label of ['School', 'Name and role', 'Signature', 'Date']) {
    pdfFlowEnsure(flow, 12);
    flow.y += 7;
    doc.setDrawColor(INK);
    doc.setLineWidth(0.2);
    doc.line(FLOW_MARGIN_MM + 32, flow.y, FLOW_MARGIN_MM + pdfFlowTextWidth(flow), flow.y);
    pdfFontUse(doc, false);
    doc.setFontSize(9);
    doc.setTextColor(INK);
    doc.text(label, FLOW_MARGIN_MM, flow.y - 1);
    flow.y += 2;
  }
}
