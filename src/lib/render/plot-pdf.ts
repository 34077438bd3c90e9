/**
 * A saved result's plot drawn as vectors on a jspdf page (the PDF booklet): the layout of plot-layout.ts — the
 * same axes, ticks, series, bars and legend as the SVG for print and the uPlot chart — scaled from its px to mm.
 * Lines are PDF path operators and text is the embedded KitwrightSans, so the plot stays sharp at any zoom and its
 * words can be searched. A plot with nothing to draw says so.
 */
import type { jsPDF } from 'jspdf';
import type { SavedPlot } from '../analysis/saved-result';
import { numberFormat } from '../tools/number-format';
import { pdfFontUse } from './pdf-fonts';
import { PLOT_COLOURS, PLOT_DASHES, PLOT_INK, PLOT_LEGEND_ROW_PX, plotBarOffsetPx, plotLayout } from './plot-layout';

const PT_PER_MM = 72 / 25.4;
const GRID = '#d1d5db';

/** Draws the plot with its top-left corner at (xMm, yMm), `widthMm` wide; returns its height, mm. */
export function plotPdfDraw(doc: jsPDF, plot: SavedPlot, xMm: number, yMm: number, widthMm: number): number {
  const layout = plotLayout(plot);
  const k = widthMm / layout.widthPx;
  const X = (px: number) => xMm + px * k;
  const Y = (px: number) => yMm + px * k;
  const text = (
    s: string,
    x: number,
    y: number,
    sizePx: number,
    opts: { bold?: boolean; align?: 'left' | 'center' | 'right'; angle?: number } = {},
  ) => {
    pdfFontUse(doc, opts.bold ?? false);
    doc.setFontSize(sizePx * k * PT_PER_MM);
    doc.setTextColor(PLOT_INK);
    doc.text(s, X(x), Y(y), { align: opts.align ?? 'left', baseline: 'middle', angle: opts.angle });
  };
  const { area, axes, series } = layout;
  text(plot.title, layout.widthPx / 2, 18, 15, { bold: true, align: 'center' });
  if (!axes) {
    text('No points to plot.', layout.widthPx / 2, area.y + area.h / 2, 12, { align: 'center' });
    return layout.chartHeightPx * k;
  }
  doc.setLineDashPattern([], 0);
  doc.setLineWidth(0.15);
  doc.setDrawColor(GRID);
  for (const t of axes.x.ticks) {
    doc.line(X(layout.px(t)), Y(area.y), X(layout.px(t)), Y(area.y + area.h + 5));
    text(numberFormat(t, 3), layout.px(t), area.y + area.h + 14, 11, { align: 'center' });
  }
  for (const t of axes.y.ticks) {
    doc.line(X(area.x - 5), Y(layout.py(t)), X(area.x + area.w), Y(layout.py(t)));
    text(numberFormat(t, 3), area.x - 8, layout.py(t), 11, { align: 'right' });
  }
  doc.setDrawColor(PLOT_INK);
  doc.rect(X(area.x), Y(area.y), area.w * k, area.h * k, 'S');
  text(plot.xLabel, area.x + area.w / 2, area.y + area.h + 36, 12, { bold: true, align: 'center' });
  text(plot.yLabel, 16, area.y + area.h / 2, 12, { bold: true, align: 'center', angle: 90 });

  series.forEach((points, i) => {
    const colour = PLOT_COLOURS[i % PLOT_COLOURS.length]!;
    if (layout.bar) {
      doc.setFillColor(colour);
      const offset = plotBarOffsetPx(layout, i);
      for (const [x, y] of points) {
        const top = Math.min(layout.py(y), layout.py(0));
        const h = Math.abs(layout.py(y) - layout.py(0));
        if (h > 0)
          doc.rect(X(layout.px(x) + offset - layout.barWidthPx / 2), Y(top), layout.barWidthPx * k, h * k, 'F');
      }
      return;
    }
    if (points.length < 2) return;
    doc.setDrawColor(colour);
    doc.setLineWidth(2 * k);
    doc.setLineDashPattern(
      PLOT_DASHES[i % PLOT_DASHES.length]!.map((d) => d * k),
      0,
    );
    const [first, ...rest] = points.map(([x, y]) => [X(layout.px(x)), Y(layout.py(y))] as const);
    let [lx, ly] = first!;
    const deltas = rest.map(([x, y]) => {
      const d: [number, number] = [x - lx, y - ly];
      [lx, ly] = [x, y];
      return d;
    });
    doc.lines(deltas, first![0], first![1], [1, 1], 'S', false);
  });
  doc.setLineDashPattern([], 0);

  plot.series.forEach((s, i) => {
    const y = layout.chartHeightPx + 4 + i * PLOT_LEGEND_ROW_PX + 6;
    const colour = PLOT_COLOURS[i % PLOT_COLOURS.length]!;
    doc.setDrawColor(colour);
    doc.setLineWidth((layout.bar ? 8 : 2) * k);
    if (!layout.bar)
      doc.setLineDashPattern(
        PLOT_DASHES[i % PLOT_DASHES.length]!.map((d) => d * k),
        0,
      );
    doc.line(X(area.x), Y(y), X(area.x + 28), Y(y));
    doc.setLineDashPattern([], 0);
    text(s.label, area.x + 36, y, 12);
  });
  return layout.heightPx * k;
}
