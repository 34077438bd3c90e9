/**
 * Where everything of a saved result's plot goes, for the writers that draw it without a browser (the SVG for
 * print in plot-svg.ts, the vectors of the PDF booklet in plot-pdf.ts): the same series, axes and kinds (line,
 * log-log, bar) as the uPlot chart on the tool page. Coordinates in px with y growing downwards. Points that cannot
 * be drawn (non-finite, or not positive on a log axis) are left out; with nothing left, the axes are null.
 */
import type { SavedPlot } from '../analysis/saved-result';

/** Series colours (tailwind.config.mjs's palette), shared with the uPlot chart so every picture matches. */
export const PLOT_COLOURS = ['#0d6b62', '#2b3a67', '#8a5300', '#b3261e', '#46505f', '#084a44'] as const;
/** Dash patterns per series, so series differ without relying on colour. */
export const PLOT_DASHES: readonly (readonly number[])[] = [[], [8, 4], [2, 3], [12, 3, 2, 3]];
export const PLOT_INK = '#1b2330';
export const PLOT_MARGIN = { left: 78, right: 20, top: 40, bottom: 56 };
export const PLOT_LEGEND_ROW_PX = 18;

export interface PlotAxis {
  lo: number;
  hi: number;
  log: boolean;
  ticks: number[];
}

export interface PlotLayout {
  widthPx: number;
  /** The chart without its legend. */
  chartHeightPx: number;
  /** The chart and its legend rows. */
  heightPx: number;
  /** The plotting area inside the axes. */
  area: { x: number; y: number; w: number; h: number };
  axes: { x: PlotAxis; y: PlotAxis } | null;
  /** The drawable points of each series, sorted by x. */
  series: [number, number][][];
  bar: boolean;
  /** Width of one bar, px (0 for line plots). */
  barWidthPx: number;
  px(x: number): number;
  py(y: number): number;
}

/** A "nice" step (1, 2 or 5 × 10^k) giving about `count` intervals over `span`. */
function stepNice(span: number, count: number): number {
  const raw = span / count;
  const power = 10 ** Math.floor(Math.log10(raw));
  const m = raw / power;
  return (m <= 1 ? 1 : m <= 2 ? 2 : m <= 5 ? 5 : 10) * power;
}

/** A linear axis covering [lo, hi], widened to whole steps, with its ticks. */
function axisLinear(lo: number, hi: number): PlotAxis {
  if (lo === hi) {
    const pad = Math.abs(lo) || 1;
    lo -= pad;
    hi += pad;
  }
  const step = stepNice(hi - lo, 5);
  const first = Math.floor(lo / step + 1e-9);
  const last = Math.ceil(hi / step - 1e-9);
  const ticks: number[] = [];
  // Rounded to the step's precision so labels read 0.3, not 0.30000000000000004.
  const digits = Math.max(0, -Math.floor(Math.log10(step)) + 1);
  for (let i = first; i <= last; i++) ticks.push(Number((i * step).toFixed(digits)));
  return { lo: ticks[0]!, hi: ticks[ticks.length - 1]!, log: false, ticks };
}

/** A logarithmic axis covering [lo, hi] (both > 0) in whole decades, a tick at each decade. */
function axisLog(lo: number, hi: number): PlotAxis {
  let first = Math.floor(Math.log10(lo) + 1e-9);
  let last = Math.ceil(Math.log10(hi) - 1e-9);
  if (first === last) {
    first -= 1;
    last += 1;
  }
  const ticks: number[] = [];
  for (let k = first; k <= last; k++) ticks.push(Number(`1e${k}`));
  return { lo: ticks[0]!, hi: ticks[ticks.length - 1]!, log: true, ticks };
}

/** Where a value falls along an axis, 0 at its low end and 1 at its high end. */
function axisFraction(axis: PlotAxis, v: number): number {
  return axis.log
    ? (Math.log10(v) - Math.log10(axis.lo)) / (Math.log10(axis.hi) - Math.log10(axis.lo))
    : (v - axis.lo) / (axis.hi - axis.lo);
}

/** The drawable points of each series: finite, positive on log axes, sorted by x. */
function plotPoints(plot: SavedPlot): [number, number][][] {
  const log = plot.kind === 'loglog';
  return plot.series.map((s) =>
    s.points
      .filter(([x, y]) => Number.isFinite(x) && Number.isFinite(y) && (!log || (x > 0 && y > 0)))
      .sort((a, b) => a[0] - b[0]),
  );
}

/** The plot laid out on `widthPx` × `chartHeightPx`, with a legend row per series below. */
export function plotLayout(plot: SavedPlot, widthPx = 640, chartHeightPx = 320): PlotLayout {
  const series = plotPoints(plot);
  const legendRows = plot.series.length;
  const area = {
    x: PLOT_MARGIN.left,
    y: PLOT_MARGIN.top,
    w: widthPx - PLOT_MARGIN.left - PLOT_MARGIN.right,
    h: chartHeightPx - PLOT_MARGIN.top - PLOT_MARGIN.bottom,
  };
  const bar = plot.kind === 'bar';
  const all = series.flat();
  const base = {
    widthPx,
    chartHeightPx,
    heightPx: chartHeightPx + legendRows * PLOT_LEGEND_ROW_PX + (legendRows ? 8 : 0),
    area,
    series,
    bar,
  };
  if (all.length === 0) return { ...base, axes: null, barWidthPx: 0, px: () => NaN, py: () => NaN };
  const xs = all.map((p) => p[0]);
  const ys = all.map((p) => p[1]);
  const x =
    plot.kind === 'loglog'
      ? axisLog(Math.min(...xs), Math.max(...xs))
      : axisLinear(Math.min(...xs) - (bar ? 0.75 : 0), Math.max(...xs) + (bar ? 0.75 : 0));
  const y =
    plot.kind === 'loglog'
      ? axisLog(Math.min(...ys), Math.max(...ys))
      : axisLinear(bar ? Math.min(0, ...ys) : Math.min(...ys), Math.max(...ys));
  return {
    ...base,
    axes: { x, y },
    barWidthPx: bar ? ((0.5 / (x.hi - x.lo)) * area.w) / Math.max(1, series.length) : 0,
    px: (v) => area.x + axisFraction(x, v) * area.w,
    py: (v) => area.y + area.h - axisFraction(y, v) * area.h,
  };
}

/** The x-offset of series i's bars from their x position, px (bars of several series stand side by side). */
export function plotBarOffsetPx(layout: PlotLayout, i: number): number {
  return (i - (layout.series.length - 1) / 2) * layout.barWidthPx;
}
