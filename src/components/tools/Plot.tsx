/**
 * The tools' one chart: a saved-result plot (line, log-log or bar) drawn with uPlot inside a <figure> whose
 * caption names it, with the plotted points as a table a screen reader or a printout can use.
 * Why uPlot: it is small (about 50 kB minified) and draws 100 000-point series fast on a canvas, so a PSD
 * or an hour-long log stays smooth on a school laptop; larger chart libraries add weight and little else.
 */
import 'uplot/dist/uPlot.min.css';
import { useEffect, useId, useRef, useState } from 'react';
import type uPlot from 'uplot';
import type { SavedPlot } from '../../lib/analysis/saved-result';
import { PLOT_COLOURS, PLOT_DASHES } from '../../lib/render/plot-layout';
import { numberFormat } from '../../lib/tools/number-format';

interface Props {
  plot: SavedPlot;
  /** Series drawn as dots only (measured readings beside a fitted line). */
  pointsOnly?: (label: string) => boolean;
  heightPx?: number;
  /** Writes an x value for the axis, the legend and the table (a day number as its date); numbers otherwise. */
  xFormat?: (x: number) => string;
}

// Our palette plus dash patterns (shared with the static SVG), so series differ without relying on colour.
const COLOURS = PLOT_COLOURS;
const DASHES = PLOT_DASHES;
const PRINT_WIDTH_PX = 680;
/** Most bars that each get their own tick label. */
const BAR_TICKS_MAX = 16;

// uPlot's own tick labels round small log-axis values to "0"; ours keep two significant figures.
const tickLabels = (_u: uPlot, splits: number[]) => splits.map((v) => (v == null ? '' : numberFormat(v, 2)));
const tickLabelsWith = (format: (x: number) => string) => (_u: uPlot, splits: number[]) =>
  splits.map((v) => (v == null ? '' : format(v)));

function plotOptions(
  plot: SavedPlot,
  width: number,
  height: number,
  pointsOnly: Props['pointsOnly'],
  U: typeof uPlot,
  xFormat: Props['xFormat'],
): uPlot.Options {
  const log = plot.kind === 'loglog';
  const bars = plot.kind === 'bar' ? U.paths.bars!({ size: [0.5, 80] }) : undefined;
  return {
    width,
    height,
    scales: {
      x: log
        ? { time: false, distr: 3, log: 10 }
        : { time: false, ...(bars ? { range: (_u, lo, hi) => [lo - 0.75, hi + 0.75] } : {}) },
      y: log ? { distr: 3, log: 10 } : bars ? { range: (_u, _lo, hi) => [0, hi * 1.15 || 1] } : {},
    },
    axes: [
      {
        label: plot.xLabel,
        stroke: '#1b2330',
        grid: { stroke: '#1b233018' },
        values: xFormat ? tickLabelsWith(xFormat) : tickLabels,
        // Bars stand at their own x values (1 = sunlight, 2 = eclipse): ticks there and nowhere else, unless there
        // are too many bars to label each (a month of days), when uPlot spaces the ticks itself.
        ...(bars && plot.series.every((s) => s.points.length <= BAR_TICKS_MAX)
          ? { splits: (u: uPlot) => Array.from(u.data[0]) }
          : {}),
      },
      { label: plot.yLabel, stroke: '#1b2330', grid: { stroke: '#1b233018' }, size: 80, values: tickLabels },
    ],
    series: [
      { label: plot.xLabel, value: (_u, v) => (xFormat ? xFormat(v) : numberFormat(v)) },
      ...plot.series.map((s, i): uPlot.Series => {
        const colour = COLOURS[i % COLOURS.length]!;
        const dots = pointsOnly?.(s.label) ?? false;
        return {
          label: s.label,
          stroke: colour,
          width: 2,
          dash: [...DASHES[i % DASHES.length]!],
          spanGaps: true,
          value: (_u, v) => numberFormat(v),
          ...(bars ? { paths: bars, fill: `${colour}cc` } : {}),
          ...(dots
            ? { paths: () => null, points: { show: true, size: 7, fill: colour } }
            : { points: { show: false } }),
        };
      }),
    ],
  };
}

function alignedData(plot: SavedPlot, U: typeof uPlot): uPlot.AlignedData {
  const positive = (p: [number, number]) => plot.kind !== 'loglog' || (p[0] > 0 && p[1] > 0);
  const tables = plot.series.map((s): uPlot.AlignedData => {
    const pts = s.points.filter(positive).sort((a, b) => a[0] - b[0]);
    return [pts.map((p) => p[0]), pts.map((p) => p[1])];
  });
  return tables.length === 1 ? tables[0]! : U.join(tables);
}

/** A plot of a saved result's series, with a caption, a legend and a table of its points. */
export default function Plot({ plot, pointsOnly, heightPx = 320, xFormat }: Props) {
  const box = useRef<HTMLDivElement>(null);
  const [tableOpen, setTableOpen] = useState(false);
  const [ready, setReady] = useState(false);
  const captionId = useId();

  useEffect(() => {
    const el = box.current;
    if (!el) return;
    let chart: uPlot | null = null;
    let cancelled = false;
    const widthNow = () => Math.max(280, Math.floor(el.clientWidth));
    const resize = new ResizeObserver(() => chart?.setSize({ width: widthNow(), height: heightPx }));
    const beforePrint = () => chart?.setSize({ width: PRINT_WIDTH_PX, height: heightPx });
    const afterPrint = () => chart?.setSize({ width: widthNow(), height: heightPx });
    // uPlot touches the DOM when it loads, so it is loaded in the browser only (and off the first paint).
    void import('uplot').then(({ default: U }) => {
      if (cancelled) return;
      chart = new U(plotOptions(plot, widthNow(), heightPx, pointsOnly, U, xFormat), alignedData(plot, U), el);
      resize.observe(el);
      setReady(true);
    });
    window.addEventListener('beforeprint', beforePrint);
    window.addEventListener('afterprint', afterPrint);
    return () => {
      cancelled = true;
      resize.disconnect();
      window.removeEventListener('beforeprint', beforePrint);
      window.removeEventListener('afterprint', afterPrint);
      chart?.destroy();
    };
  }, [plot, pointsOnly, heightPx, xFormat]);

  const summary = `${plot.title}. ${plot.yLabel} against ${plot.xLabel}${plot.kind === 'loglog' ? ', both on logarithmic axes' : ''}. Series: ${plot.series.map((s) => s.label).join(', ')}.`;
  return (
    <figure
      className="card break-inside-avoid"
      data-testid="plot"
      data-ready={ready ? 'true' : undefined}
      aria-labelledby={captionId}
    >
      <figcaption id={captionId} className="font-display text-lg font-bold">
        {plot.title}
      </figcaption>
      <div
        ref={box}
        role="img"
        aria-label={summary}
        className="mt-2 w-full overflow-hidden"
        style={{ minHeight: heightPx + 40 }}
      />
      <details className="mt-3 print:hidden" onToggle={(e) => setTableOpen(e.currentTarget.open)}>
        <summary className="cursor-pointer font-semibold text-fold-dark">Show the plotted points as a table</summary>
        {tableOpen && (
          <div
            className="mt-2 max-h-80 overflow-auto"
            tabIndex={0}
            role="region"
            aria-label={`Points of ${plot.title}`}
          >
            <table className="w-full text-left text-sm">
              <thead>
                <tr>
                  <th scope="col">Series</th>
                  <th scope="col">{plot.xLabel}</th>
                  <th scope="col">{plot.yLabel}</th>
                </tr>
              </thead>
              <tbody>
                {plot.series.flatMap((s) =>
                  s.points.map(([x, y], i) => (
                    <tr key={`${s.label}-${i}`}>
                      <td>{s.label}</td>
                      <td>{xFormat ? xFormat(x) : numberFormat(x, 4)}</td>
                      <td>{numberFormat(y, 4)}</td>
                    </tr>
                  )),
                )}
              </tbody>
            </table>
          </div>
        )}
      </details>
    </figure>
  );
}
