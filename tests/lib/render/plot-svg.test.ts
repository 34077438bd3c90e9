/**
 * The static SVG of a saved plot, read back with @xmldom/xmldom (an XML parser outside the renderer): each drawn
 * point must sit where the axes' own ticks place its data value — linear interpolation between two ticks on a
 * linear axis, interpolation of log10 on a log-log plot — so the picture is checked against the data, not against
 * the renderer's own scale function.
 */
import { DOMParser } from '@xmldom/xmldom';
import type { Element } from '@xmldom/xmldom';
import { describe, expect, it } from 'vitest';
import type { SavedPlot } from '../../../src/lib/analysis/saved-result';
import { plotSvg } from '../../../src/lib/render/plot-svg';

// Coordinates are written to 0.01 px; the check allows twice that for the rounding of two ticks and one point.
const TOLERANCE_PX = 0.03;

function parse(svg: string) {
  const errors: string[] = [];
  const doc = new DOMParser({ onError: (level, msg) => void errors.push(`${level}: ${msg}`) }).parseFromString(
    svg,
    'image/svg+xml',
  );
  expect(errors).toEqual([]);
  return doc.documentElement!;
}

const elements = (root: Element, tag: string) => Array.from(root.getElementsByTagName(tag));

/** The ticks of one axis as [value, pixel position], read from the tick's label group and its line. */
function ticks(root: Element, axis: 'x' | 'y'): [number, number][] {
  return elements(root, 'g')
    .filter((g) => g.getAttribute('class') === `tick-${axis}`)
    .map((g) => {
      const line = elements(g, 'line')[0]!;
      const label = elements(g, 'text')[0]!.textContent!;
      const value = Number(g.getAttribute('data-value'));
      // The printed label says the same number the tick stands for (three significant figures).
      expect(
        Number(
          label
            .replace(/,/g, '')
            .replace(' × 10', 'e')
            .replace(/[⁻⁰¹²³⁴⁵⁶⁷⁸⁹]/g, toDigit),
        ),
      ).toBeCloseTo(value, 10);
      return [value, Number(line.getAttribute(axis === 'x' ? 'x1' : 'y1'))];
    });
}

function toDigit(c: string): string {
  return '-0123456789'['⁻⁰¹²³⁴⁵⁶⁷⁸⁹'.indexOf(c)]!;
}

/** Where the axis's first and last ticks place a value (log10 of it on a log axis). */
function pixelOf(axisTicks: [number, number][], v: number, log: boolean): number {
  const f = (x: number) => (log ? Math.log10(x) : x);
  const [v0, p0] = axisTicks[0]!;
  const [v1, p1] = axisTicks[axisTicks.length - 1]!;
  return p0 + ((f(v) - f(v0)) / (f(v1) - f(v0))) * (p1 - p0);
}

function polylinePoints(root: Element, series: string): [number, number][] {
  const line = elements(root, 'polyline').find((p) => p.getAttribute('data-series') === series)!;
  return line
    .getAttribute('points')!
    .split(' ')
    .map((pair) => pair.split(',').map(Number) as [number, number]);
}

describe('plotSvg', () => {
  it('places every point of a log-log PSD profile where the decade ticks put it', () => {
    // GSFC-STD-7000A (GEVS), Table 2.4-3: qualification random vibration, components of 22.7 kg or less.
    const gevs: [number, number][] = [
      [20, 0.026],
      [50, 0.16],
      [800, 0.16],
      [2000, 0.026],
    ];
    const plot: SavedPlot = {
      kind: 'loglog',
      title: 'Qualification profile',
      xLabel: 'Frequency (Hz)',
      yLabel: 'ASD (g²/Hz)',
      series: [{ label: 'GEVS qualification', points: gevs }],
    };
    const root = parse(plotSvg(plot));
    const xTicks = ticks(root, 'x');
    const yTicks = ticks(root, 'y');
    expect(xTicks.map((t) => t[0])).toEqual([10, 100, 1000, 10000]);
    expect(yTicks.map((t) => t[0])).toEqual([0.01, 0.1, 1]);
    const drawn = polylinePoints(root, 'GEVS qualification');
    expect(drawn).toHaveLength(gevs.length);
    gevs.forEach(([x, y], i) => {
      expect(Math.abs(drawn[i]![0] - pixelOf(xTicks, x, true))).toBeLessThan(TOLERANCE_PX);
      expect(Math.abs(drawn[i]![1] - pixelOf(yTicks, y, true))).toBeLessThan(TOLERANCE_PX);
    });
    // The flat top of the profile (50 to 800 Hz at the same ASD) is drawn level.
    expect(drawn[1]![1]).toBe(drawn[2]![1]);
  });

  it('places the points of two linear series on the same axes, sorted by x, and drops non-finite ones', () => {
    // Newton's law of cooling, T = T∞ + (T0 − T∞)·e^(−t/τ) (Incropera et al., Fundamentals of Heat and Mass
    // Transfer, ch. 5), for T0 = 60 °C, T∞ = 20 °C, τ = 300 s.
    const cooling: [number, number][] = [0, 60, 120, 300, 600, 900].map((t) => [t, 20 + 40 * Math.exp(-t / 300)]);
    const ambient: [number, number][] = [
      [900, 20],
      [0, 20],
      [450, Number.NaN],
    ];
    const plot: SavedPlot = {
      kind: 'line',
      title: 'Cooling <puck> & "lid"',
      xLabel: 'Time (s)',
      yLabel: 'Temperature (°C)',
      series: [
        { label: 'Puck', points: cooling },
        { label: 'Room', points: ambient },
      ],
    };
    const svg = plotSvg(plot);
    const root = parse(svg);
    expect(elements(root, 'title')[0]!.textContent).toBe('Cooling <puck> & "lid"');
    const xTicks = ticks(root, 'x');
    const yTicks = ticks(root, 'y');
    for (const [series, data] of [
      ['Puck', cooling],
      ['Room', ambient.filter(([, y]) => Number.isFinite(y)).sort((a, b) => a[0] - b[0])],
    ] as const) {
      const drawn = polylinePoints(root, series);
      expect(drawn).toHaveLength(data.length);
      data.forEach(([x, y], i) => {
        expect(Math.abs(drawn[i]![0] - pixelOf(xTicks, x, false))).toBeLessThan(TOLERANCE_PX);
        expect(Math.abs(drawn[i]![1] - pixelOf(yTicks, y, false))).toBeLessThan(TOLERANCE_PX);
      });
    }
    // Every tick lies on the linear scale of the first and last (evenly spaced values, evenly spaced pixels).
    for (const [v, p] of [...xTicks]) expect(Math.abs(p - pixelOf(xTicks, v, false))).toBeLessThan(TOLERANCE_PX);
    // No script, style attribute or event handler: the picture passes the pages' Content-Security-Policy.
    expect(svg).not.toMatch(/<script|style=|\son[a-z]+=/i);
  });

  it('draws bars from zero to each value', () => {
    const plot: SavedPlot = {
      kind: 'bar',
      title: 'Time in sunlight and eclipse',
      xLabel: 'Phase',
      yLabel: 'Minutes',
      series: [
        {
          label: 'Orbit at 400 km',
          points: [
            [1, 56.5],
            [2, 36.1],
          ],
        },
      ],
    };
    const root = parse(plotSvg(plot));
    const yTicks = ticks(root, 'y');
    const xTicks = ticks(root, 'x');
    const bars = elements(root, 'rect').filter((r) => r.getAttribute('data-y') !== null);
    expect(bars).toHaveLength(2);
    for (const bar of bars) {
      const x = Number(bar.getAttribute('data-x'));
      const y = Number(bar.getAttribute('data-y'));
      const top = Number(bar.getAttribute('y'));
      const bottom = top + Number(bar.getAttribute('height'));
      const centre = Number(bar.getAttribute('x')) + Number(bar.getAttribute('width')) / 2;
      expect(Math.abs(top - pixelOf(yTicks, y, false))).toBeLessThan(TOLERANCE_PX);
      expect(Math.abs(bottom - pixelOf(yTicks, 0, false))).toBeLessThan(TOLERANCE_PX);
      expect(Math.abs(centre - pixelOf(xTicks, x, false))).toBeLessThan(TOLERANCE_PX);
    }
  });

  it('says there is nothing to plot when no point can be drawn', () => {
    const root = parse(
      plotSvg({
        kind: 'loglog',
        title: 'Empty',
        xLabel: 'x',
        yLabel: 'y',
        series: [{ label: 'none', points: [[0, 1]] }],
      }),
    );
    expect(elements(root, 'polyline')).toHaveLength(0);
    expect(elements(root, 'text').some((t) => t.textContent === 'No points to plot.')).toBe(true);
  });
});
