/**
 * A saved result's plot as a static SVG string, for a journal entry's printout and the PDF booklet: the same
 * series, axes and kinds (line, log-log, bar) as the uPlot chart on the tool page, drawn with presentation
 * attributes only (no style attributes or scripts, so it passes the pages' Content-Security-Policy). Coordinates
 * are SVG user units (px) with y growing downwards. Points that cannot be drawn (non-finite, or not positive on a
 * log axis) are left out; a plot with nothing to draw says so in the picture.
 */
import type { SavedPlot } from '../analysis/saved-result';
import { numberFormat } from '../tools/number-format';

/** Series colours (tailwind.config.mjs's palette), shared with the uPlot chart so both pictures match. */
export const PLOT_COLOURS = ['#0d6b62', '#2b3a67', '#8a5300', '#b3261e', '#46505f', '#084a44'] as const;
/** Dash patterns per series, so series differ without relying on colour. */
export const PLOT_DASHES: readonly (readonly number[])[] = [[], [8, 4], [2, 3], [12, 3, 2, 3]];

/** Size of the picture, px. */
export interface PlotSvgOptions {
  widthPx?: number;
  heightPx?: number;
}

interface Axis {
  lo: number;
  hi: number;
  log: boolean;
  ticks: number[];
}

const INK = '#1b2330';
const MARGIN = { left: 78, right: 20, top: 40, bottom: 56 };
const LEGEND_ROW_PX = 18;

/** Escapes text for SVG content and attribute values. */
function xmlText(text: string): string {
  return text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

const fixed = (v: number) => String(Math.round(v * 100) / 100);

/** A "nice" step (1, 2 or 5 × 10^k) giving about `count` intervals over `span`. */
function stepNice(span: number, count: number): number {
  const raw = span / count;
  const power = 10 ** Math.floor(Math.log10(raw));
  const m = raw / power;
  return (m <= 1 ? 1 : m <= 2 ? 2 : m <= 5 ? 5 : 10) * power;
}

/** A linear axis covering [lo, hi], widened to whole steps, with its ticks. */
function axisLinear(lo: number, hi: number): Axis {
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
function axisLog(lo: number, hi: number): Axis {
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
function axisFraction(axis: Axis, v: number): number {
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

/** The plot as an SVG document string (`<svg>` root with its namespace), `widthPx` × `heightPx` plus the legend. */
export function plotSvg(plot: SavedPlot, options: PlotSvgOptions = {}): string {
  const widthPx = options.widthPx ?? 640;
  const chartHeightPx = options.heightPx ?? 320;
  const series = plotPoints(plot);
  const legendRows = plot.series.length;
  const heightPx = chartHeightPx + legendRows * LEGEND_ROW_PX + (legendRows ? 8 : 0);
  const area = {
    x: MARGIN.left,
    y: MARGIN.top,
    w: widthPx - MARGIN.left - MARGIN.right,
    h: chartHeightPx - MARGIN.top - MARGIN.bottom,
  };
  const label = `${plot.title}. ${plot.yLabel} against ${plot.xLabel}${plot.kind === 'loglog' ? ', both on logarithmic axes' : ''}.`;
  const out: string[] = [
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${widthPx} ${heightPx}" width="${widthPx}" height="${heightPx}" role="img" aria-label="${xmlText(label)}" font-family="sans-serif" font-size="12" fill="${INK}">`,
    `<title>${xmlText(plot.title)}</title>`,
    `<text x="${widthPx / 2}" y="22" text-anchor="middle" font-size="15" font-weight="bold">${xmlText(plot.title)}</text>`,
  ];
  const all = series.flat();
  if (all.length === 0) {
    out.push(
      `<text x="${widthPx / 2}" y="${area.y + area.h / 2}" text-anchor="middle">No points to plot.</text>`,
      '</svg>',
    );
    return out.join('');
  }
  const xs = all.map((p) => p[0]);
  const ys = all.map((p) => p[1]);
  const bar = plot.kind === 'bar';
  const xAxis =
    plot.kind === 'loglog'
      ? axisLog(Math.min(...xs), Math.max(...xs))
      : axisLinear(Math.min(...xs) - (bar ? 0.75 : 0), Math.max(...xs) + (bar ? 0.75 : 0));
  const yAxis =
    plot.kind === 'loglog'
      ? axisLog(Math.min(...ys), Math.max(...ys))
      : axisLinear(bar ? Math.min(0, ...ys) : Math.min(...ys), Math.max(...ys));
  const px = (x: number) => area.x + axisFraction(xAxis, x) * area.w;
  const py = (y: number) => area.y + area.h - axisFraction(yAxis, y) * area.h;

  out.push(
    `<rect class="plot-area" x="${area.x}" y="${area.y}" width="${area.w}" height="${area.h}" fill="none" stroke="${INK}" stroke-opacity="0.4"/>`,
  );
  for (const t of xAxis.ticks) {
    const x = fixed(px(t));
    out.push(
      `<g class="tick-x" data-value="${t}"><line x1="${x}" y1="${area.y}" x2="${x}" y2="${area.y + area.h + 5}" stroke="${INK}" stroke-opacity="0.15"/>`,
      `<text x="${x}" y="${area.y + area.h + 18}" text-anchor="middle">${xmlText(numberFormat(t, 3))}</text></g>`,
    );
  }
  for (const t of yAxis.ticks) {
    const y = fixed(py(t));
    out.push(
      `<g class="tick-y" data-value="${t}"><line x1="${area.x - 5}" y1="${y}" x2="${area.x + area.w}" y2="${y}" stroke="${INK}" stroke-opacity="0.15"/>`,
      `<text x="${area.x - 8}" y="${y}" dy="4" text-anchor="end">${xmlText(numberFormat(t, 3))}</text></g>`,
    );
  }
  out.push(
    `<text x="${area.x + area.w / 2}" y="${area.y + area.h + 40}" text-anchor="middle" font-weight="bold">${xmlText(plot.xLabel)}</text>`,
    `<text transform="translate(16 ${area.y + area.h / 2}) rotate(-90)" text-anchor="middle" font-weight="bold">${xmlText(plot.yLabel)}</text>`,
  );

  const barWidthPx = bar ? ((0.5 / (xAxis.hi - xAxis.lo)) * area.w) / Math.max(1, series.length) : 0;
  series.forEach((points, i) => {
    const colour = PLOT_COLOURS[i % PLOT_COLOURS.length]!;
    const dash = PLOT_DASHES[i % PLOT_DASHES.length]!;
    const name = xmlText(plot.series[i]!.label);
    if (bar) {
      const offset = (i - (series.length - 1) / 2) * barWidthPx;
      const rects = points.map(([x, y]) => {
        const top = Math.min(py(y), py(0));
        const left = px(x) + offset - barWidthPx / 2;
        return `<rect x="${fixed(left)}" y="${fixed(top)}" width="${fixed(barWidthPx)}" height="${fixed(Math.abs(py(y) - py(0)))}" fill="${colour}" fill-opacity="0.8" data-x="${x}" data-y="${y}"/>`;
      });
      out.push(`<g class="series" data-series="${name}">${rects.join('')}</g>`);
      return;
    }
    const coords = points.map(([x, y]) => `${fixed(px(x))},${fixed(py(y))}`).join(' ');
    out.push(
      `<polyline class="series" data-series="${name}" points="${coords}" fill="none" stroke="${colour}" stroke-width="2"${dash.length ? ` stroke-dasharray="${dash.join(' ')}"` : ''}/>`,
    );
  });

  plot.series.forEach((s, i) => {
    const y = chartHeightPx + 4 + i * LEGEND_ROW_PX;
    const colour = PLOT_COLOURS[i % PLOT_COLOURS.length]!;
    const dash = PLOT_DASHES[i % PLOT_DASHES.length]!;
    out.push(
      `<g class="legend"><line x1="${area.x}" y1="${y + 6}" x2="${area.x + 28}" y2="${y + 6}" stroke="${colour}" stroke-width="${bar ? 8 : 2}"${dash.length && !bar ? ` stroke-dasharray="${dash.join(' ')}"` : ''}/>`,
      `<text x="${area.x + 36}" y="${y + 10}">${xmlText(s.label)}</text></g>`,
    );
  });
  out.push('</svg>');
  return out.join('');
}
