/**
 * What a class journal entry stores when a tool's result is saved: the tool, a short summary of the
 * inputs, the result data and one plot, all bounded in size. Builders per tool turn a result into it.
 */
import { z } from 'zod';
import type { CleanroomResult } from './cleanroom';
import type { EquilibriumTemperatureInput, EquilibriumTemperatureResult } from './equilibrium-temperature';
import type { MagneticResult } from './magnetic';
import type { OrbitEclipseInput, OrbitEclipseResult } from './orbit-eclipse';
import type { PsdProfileResult } from './psd-profile';
import type { ThermalInput, ThermalResult } from './thermal';
import type { VibrationResult } from './vibration';

/** Most points a saved plot series may hold; longer series are downsampled. */
export const SAVED_RESULT_MAX_POINTS = 2_000;
export const SAVED_RESULT_MAX_SERIES = 12;
/** Largest serialised saved result, bytes (checked by savedResultParse). */
export const SAVED_RESULT_MAX_BYTES = 400_000;
/** Version of the computations in src/lib/analysis; bump when a result would change. */
export const ANALYSIS_TOOL_VERSION = '1.0.0';

export const SAVED_RESULT_TOOLS = [
  'vibration',
  'psd-profile',
  'thermal',
  'cleanroom',
  'magnetic',
  'orbit-eclipse',
  'equilibrium-temperature',
] as const;

const text = (max: number) => z.string().trim().max(max);
const point = z.tuple([z.number().finite(), z.number().finite()]);

export const SavedPlotSchema = z
  .object({
    kind: z.enum(['line', 'loglog', 'bar']),
    title: text(120),
    xLabel: text(60),
    yLabel: text(60),
    series: z
      .array(z.object({ label: text(60), points: z.array(point).max(SAVED_RESULT_MAX_POINTS) }).strict())
      .max(SAVED_RESULT_MAX_SERIES),
  })
  .strict();

export const SavedResultSchema = z
  .object({
    tool: z.enum(SAVED_RESULT_TOOLS),
    toolVersion: text(20),
    /** One line a reader can scan, e.g. "3 axes, 100 Hz, 60 s". */
    inputsSummary: text(300),
    /** The tool's result object, JSON-serialisable. */
    result: z.record(z.unknown()),
    plot: SavedPlotSchema,
  })
  .strict()
  .refine(
    (v) => JSON.stringify(v).length <= SAVED_RESULT_MAX_BYTES,
    `a saved result may be at most ${SAVED_RESULT_MAX_BYTES} bytes`,
  );
export type SavedResult = z.infer<typeof SavedResultSchema>;
export type SavedPlot = z.infer<typeof SavedPlotSchema>;

/**
 * Keeps at most `maxPoints` points of a series, as the minimum and maximum of equal-count buckets in
 * their original order, so peaks survive (a PSD's resonance, a temperature extreme); shorter series are
 * returned unchanged.
 */
export function seriesDownsample(points: [number, number][], maxPoints = SAVED_RESULT_MAX_POINTS): [number, number][] {
  if (points.length <= maxPoints) return points;
  const buckets = Math.floor(maxPoints / 2);
  const out: [number, number][] = [];
  for (let b = 0; b < buckets; b++) {
    const start = Math.floor((b * points.length) / buckets);
    const end = Math.floor(((b + 1) * points.length) / buckets);
    let lo = start;
    let hi = start;
    for (let i = start; i < end; i++) {
      if (points[i]![1] < points[lo]![1]) lo = i;
      if (points[i]![1] > points[hi]![1]) hi = i;
    }
    if (lo === hi) out.push(points[lo]!);
    else out.push(points[Math.min(lo, hi)]!, points[Math.max(lo, hi)]!);
  }
  return out;
}

const zip = (x: ArrayLike<number>, y: ArrayLike<number>): [number, number][] =>
  Array.from({ length: Math.min(x.length, y.length) }, (_, i) => [x[i]!, y[i]!]);
const series = (label: string, pts: [number, number][]) => ({ label, points: seriesDownsample(pts) });
const positive = (pts: [number, number][]) => pts.filter(([x, y]) => x > 0 && y > 0);

function saved(tool: SavedResult['tool'], inputsSummary: string, result: object, plot: SavedPlot): SavedResult {
  return SavedResultSchema.parse({ tool, toolVersion: ANALYSIS_TOOL_VERSION, inputsSummary, result, plot });
}

/** Saved form of a vibration result: the statistics and bands, and the PSD per axis on log-log axes. */
export function vibrationSavedResult(r: VibrationResult): SavedResult {
  const { psd, ...rest } = r;
  const { frequencyHz, x, y, z: zz, sum: _sum, ...psdInfo } = psd;
  return saved(
    'vibration',
    `3 axes, ${+r.sampleRateHz.toPrecision(4)} Hz, ${+r.durationS.toPrecision(4)} s, input in ${r.units.input}`,
    { ...rest, psd: psdInfo },
    {
      kind: 'loglog',
      title: 'Acceleration PSD (Welch, Hann)',
      xLabel: 'Frequency (Hz)',
      yLabel: 'PSD (g²/Hz)',
      series: [
        series('x', positive(zip(frequencyHz, x))),
        series('y', positive(zip(frequencyHz, y))),
        series('z', positive(zip(frequencyHz, zz))),
      ],
    },
  );
}

/** Saved form of a PSD profile: breakpoints and Grms, plotted on log-log axes. */
export function psdProfileSavedResult(r: PsdProfileResult): SavedResult {
  return saved(
    'psd-profile',
    `${r.breakpoints.length} breakpoints, ${r.breakpoints[0]?.frequencyHz}–${r.breakpoints.at(-1)?.frequencyHz} Hz`,
    r,
    {
      kind: 'loglog',
      title: `PSD profile, ${r.grms.toFixed(2)} Grms`,
      xLabel: 'Frequency (Hz)',
      yLabel: 'PSD (g²/Hz)',
      series: [
        series(
          'profile',
          r.breakpoints.map((b) => [b.frequencyHz, b.psdG2PerHz]),
        ),
      ],
    },
  );
}

/** Saved form of thermal runs: each run's readings and, where it was fitted, its Newton's-law curve. */
export function thermalSavedResult(input: ThermalInput, r: ThermalResult): SavedResult {
  const plotted = input.runs.slice(0, SAVED_RESULT_MAX_SERIES / 2).flatMap((run, i) => {
    const fit = r.runs[i]?.fit;
    const t0 = run.timeS[0] ?? 0;
    const readings = series(
      run.label,
      zip(
        run.timeS.map((t) => t / 60),
        run.temperatureC,
      ),
    );
    if (!fit) return [readings];
    const curve = run.timeS.map((t): [number, number] => [
      t / 60,
      fit.finalTemperature + (fit.initialTemperature - fit.finalTemperature) * Math.exp(-(t - t0) / fit.timeConstantS),
    ]);
    return [readings, series(`${run.label} (fit)`, curve)];
  });
  return saved(
    'thermal',
    `${input.runs.length} run(s): ${input.runs.map((x) => x.label).join(', ')}`.slice(0, 300),
    r,
    {
      kind: 'line',
      title: 'Temperature against time',
      xLabel: 'Time (min)',
      yLabel: 'Temperature (°C)',
      series: plotted,
    },
  );
}

/** Saved form of a clean-room result: the worst location's concentration per size against the class limits. */
export function cleanroomSavedResult(r: CleanroomResult): SavedResult {
  const measured = series(
    'worst location',
    r.perSize.map((s) => [s.sizeUm, s.maxLocationMeanPerM3]),
  );
  const limits = r.classLimitsPerM3
    ? [
        series(
          `ISO Class ${r.isoClass} limit`,
          r.sizesUm.flatMap((s, i) =>
            r.classLimitsPerM3![i] == null ? [] : [[s, r.classLimitsPerM3![i]!] as [number, number]],
          ),
        ),
      ]
    : [];
  return saved('cleanroom', `${r.locationsSampled} location(s), sizes ${r.sizesUm.join(', ')} µm`, r, {
    kind: 'bar',
    title: r.isoClass ? `Meets ISO Class ${r.isoClass}` : 'Above ISO Class 9',
    xLabel: 'Particle size (µm)',
    yLabel: 'Particles per m³',
    series: [measured, ...limits],
  });
}

/** Saved form of a magnetic result: readings and the fitted power law on log-log axes (cm, µT). */
export function magneticSavedResult(
  readings: { distanceCm: number; fieldUT: number }[],
  r: MagneticResult,
): SavedResult {
  const pts = positive(readings.map((x, i) => [x.distanceCm, r.netFieldUT[i] ?? NaN] as [number, number]));
  const xs = pts.map((p) => p[0]);
  const lo = Math.min(...xs);
  const hi = Math.max(...xs, r.thresholdDistanceCm ?? 0);
  const fit = Array.from({ length: 50 }, (_, i): [number, number] => {
    const d = lo * (hi / lo) ** (i / 49);
    return [d, r.fieldAt1CmUT * d ** r.exponent];
  });
  return saved('magnetic', `${readings.length} readings, ${lo}–${Math.max(...xs)} cm`, r, {
    kind: 'loglog',
    title: `Field against distance, exponent ${r.exponent.toFixed(2)}`,
    xLabel: 'Distance (cm)',
    yLabel: 'Field (µT)',
    series: [series('readings', pts), series('fit', fit)],
  });
}

/** Saved form of an eclipse calculation: minutes in sunlight and in shadow per orbit, as bars. */
export function orbitEclipseSavedResult(input: OrbitEclipseInput, r: OrbitEclipseResult): SavedResult {
  return saved('orbit-eclipse', `circular orbit at ${input.altitudeKm} km, beta angle 0`, r, {
    kind: 'bar',
    title: `One orbit: ${r.periodMin.toFixed(1)} min`,
    xLabel: 'Sunlight (1) and eclipse (2)',
    yLabel: 'Minutes',
    series: [series('sunlight', [[1, r.sunlitMin]]), series('eclipse', [[2, r.eclipseMin]])],
  });
}

/** Saved form of an equilibrium-temperature calculation: the temperature in °C as one bar. */
export function equilibriumTemperatureSavedResult(
  input: EquilibriumTemperatureInput,
  r: EquilibriumTemperatureResult,
): SavedResult {
  return saved(
    'equilibrium-temperature',
    `α ${input.absorptivity}, ε ${input.emissivity}, area ratio ${input.areaRatio}, ${input.distanceAu} AU`,
    { ...r },
    {
      kind: 'bar',
      title: `Equilibrium ${r.temperatureC.toFixed(1)} °C`,
      xLabel: 'Distance from the Sun (AU)',
      yLabel: 'Temperature (°C)',
      series: [series('equilibrium', [[input.distanceAu, r.temperatureC]])],
    },
  );
}
