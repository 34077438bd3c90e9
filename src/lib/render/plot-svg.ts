/**
 * A saved result's plot as a static SVG string, for a journal entry's printout: the layout of plot-layout.ts
 * drawn with presentation attributes only (no style attributes or scripts, so it passes the pages'
 * Content-Security-Policy). Coordinates are SVG user units (px) with y growing downwards; a plot with nothing to
 * draw says so in the picture.
 */
import type { SavedPlot } from '../analysis/saved-result';
import { numberFormat } from '../tools/number-format';
import {
  PLOT_COLOURS,
  PLOT_DASHES,
  PLOT_INK as INK,
  PLOT_LEGEND_ROW_PX,
  plotBarOffsetPx,
  plotLayout,
} from './plot-layout';

/** Size of the picture, px. */
export interface PlotSvgOptions {
  widthPx?: number;
  heightPx?: number;
}

/** Escapes text for SVG content and attribute values. */
function xmlText(text: string): string {
  return text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

const fixed = (v: number) => String(Math.round(v * 100) / 100);

/** The plot as an SVG document string (`<svg>` root with its namespace), `widthPx` × `heightPx` plus the legend. */
export function plotSvg(plot: SavedPlot, options: PlotSvgOptions = {}): string {
  const layout = plotLayout(plot, options.widthPx, options.heightPx);
  const { widthPx, heightPx, chartHeightPx, area, series, bar, px, py } = layout;
  const label = `${plot.title}. ${plot.yLabel} against ${plot.xLabel}${plot.kind === 'loglog' ? ', both on logarithmic axes' : ''}.`;
  const out: string[] = [
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${widthPx} ${heightPx}" width="${widthPx}" height="${heightPx}" role="img" aria-label="${xmlText(label)}" font-family="sans-serif" font-size="12" fill="${INK}">`,
    `<title>${xmlText(plot.title)}</title>`,
    `<text x="${widthPx / 2}" y="22" text-anchor="middle" font-size="15" font-weight="bold">${xmlText(plot.title)}</text>`,
  ];
  if (!layout.axes) {
    out.push(
      `<text x="${widthPx / 2}" y="${area.y + area.h / 2}" text-anchor="middle">No points to plot.</text>`,
      '</svg>',
    );
    return out.join('');
  }
  const { x: xAxis, y: yAxis } = layout.axes;

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

  const { barWidthPx } = layout;
  series.forEach((points, i) => {
    const colour = PLOT_COLOURS[i % PLOT_COLOURS.length]!;
    const dash = PLOT_DASHES[i % PLOT_DASHES.length]!;
    const name = xmlText(plot.series[i]!.label);
    if (bar) {
      const offset = plotBarOffsetPx(layout, i);
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
    const y = chartHeightPx + 4 + i * PLOT_LEGEND_ROW_PX;
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
