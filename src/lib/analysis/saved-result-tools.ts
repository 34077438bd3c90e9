/**
 * Per-tool builders of the saved result (saved-result.ts) a class journal entry stores: each picks the
 * plot that tells the tool's story and downsamples it to the saved bounds.
 */
import type { CleanroomResult } from './cleanroom';
import type { DeploymentResult } from './deployment';
import type { InterferenceResult } from './interference';
import type { EquilibriumTemperatureInput, EquilibriumTemperatureResult } from './equilibrium-temperature';
import type { FourPointInput, FourPointResult } from './four-point';
import type { LaunchStackInput, LaunchStackResult } from './launch-stack';
import type { MagneticResult } from './magnetic';
import type { OrbitEclipseInput, OrbitEclipseResult } from './orbit-eclipse';
import type { PsdProfileResult } from './psd-profile';
import {
  SAVED_RESULT_MAX_SERIES,
  savedResultBuild,
  seriesDownsample,
  seriesLabel,
  type SavedResult,
} from './saved-result';
import type { ThermalInput, ThermalResult } from './thermal';
import type { VibrationResult } from './vibration';

const zip = (x: ArrayLike<number>, y: ArrayLike<number>): [number, number][] =>
  Array.from({ length: Math.min(x.length, y.length) }, (_, i) => [x[i]!, y[i]!]);
const series = (label: string, pts: [number, number][], suffix = '') => ({
  label: seriesLabel(label, suffix),
  points: seriesDownsample(pts),
});
const positive = (pts: [number, number][]) => pts.filter(([x, y]) => x > 0 && y > 0);

/** Saved form of a vibration result: the statistics and bands, and the PSD per axis on log-log axes. */
export function vibrationSavedResult(r: VibrationResult): SavedResult {
  const { psd, ...rest } = r;
  const { frequencyHz, x, y, z: zz, sum: _sum, ...psdInfo } = psd;
  return savedResultBuild(
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
  return savedResultBuild(
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
    return [readings, series(run.label, curve, ' (fit)')];
  });
  return savedResultBuild(
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
  return savedResultBuild('cleanroom', `${r.locationsSampled} location(s), sizes ${r.sizesUm.join(', ')} µm`, r, {
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
  return savedResultBuild('magnetic', `${readings.length} readings, ${lo}–${Math.max(...xs)} cm`, r, {
    kind: 'loglog',
    title: `Field against distance, exponent ${r.exponent.toFixed(2)}`,
    xLabel: 'Distance (cm)',
    yLabel: 'Field (µT)',
    series: [series('readings', pts), series('fit', fit)],
  });
}

/** Saved form of an eclipse calculation: minutes in sunlight and in shadow per orbit, as bars. */
export function orbitEclipseSavedResult(input: OrbitEclipseInput, r: OrbitEclipseResult): SavedResult {
  return savedResultBuild('orbit-eclipse', `circular orbit at ${input.altitudeKm} km, beta angle 0`, r, {
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
  return savedResultBuild(
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

/** Most points per series of the deployment plot: a running rate needs no more to be drawn. */
export const DEPLOYMENT_PLOT_MAX_POINTS = 200;

/** Every k-th point of a running series, the last one always kept, at most DEPLOYMENT_PLOT_MAX_POINTS. */
function seriesThin<T>(points: T[]): T[] {
  const step = Math.ceil(points.length / DEPLOYMENT_PLOT_MAX_POINTS);
  return points.filter((_, i) => i % step === 0 || i === points.length - 1).slice(-DEPLOYMENT_PLOT_MAX_POINTS);
}

/**
 * Saved form of deployment trials: each design's running success rate (%) trial by trial with its Wilson
 * interval as two bounding lines (thinned to DEPLOYMENT_PLOT_MAX_POINTS); a design given as counts only is
 * one point at its last trial. The running series live in the plot only, not again in the result.
 */
export function deploymentSavedResult(r: DeploymentResult): SavedResult {
  const lines = r.designs.flatMap((d) => {
    if (d.runningRatePct.length === 0) return [series(d.label, [[d.trials, 100 * d.successRate]])];
    const band = seriesThin(d.runningWilsonPct);
    return [
      series(d.label, seriesThin(d.runningRatePct)),
      series(
        d.label,
        band.map(([t, lo]) => [t, lo]),
        ': 95 % low',
      ),
      series(
        d.label,
        band.map(([t, , hi]) => [t, hi]),
        ': 95 % high',
      ),
    ];
  });
  const designs = r.designs.map(({ runningRatePct: _rate, runningWilsonPct: _band, ...rest }) => rest);
  return savedResultBuild(
    'deployment',
    r.designs
      .map((d) => `${d.label}: ${d.fullyDeployed} of ${d.trials} fully`)
      .join('; ')
      .slice(0, 300),
    { ...r, designs },
    {
      kind: 'line',
      title: 'Success rate over the trials',
      xLabel: 'Trial',
      yLabel: 'Deployed fully so far (%)',
      series: lines,
    },
  );
}

/** Saved form of an interference hunt: each device's keep-out distance as one bar, most room first. */
export function interferenceSavedResult(r: InterferenceResult): SavedResult {
  const bars = r.ranking.flatMap((d) => (d.keepOutCm === null ? [] : [series(d.label, [[d.rank, d.keepOutCm]])]));
  return savedResultBuild(
    'interference',
    `${r.ranking.length} device(s), ${r.receiver === 'am-radio' ? 'AM radio' : `magnetometer, below ${r.thresholdUT} µT`}`,
    r,
    {
      kind: 'bar',
      title: 'Keep-out distance per device',
      xLabel: 'Rank (1 needs the most room)',
      yLabel: 'Keep-out distance (cm)',
      series: bars,
    },
  );
}

/**
 * Saved form of a four-point result: each reading against its sensor's distance along the gradient from the
 * centre (cm), and the fitted even change through them, a straight line of slope |∇f|.
 */
export function fourPointSavedResult(input: FourPointInput, r: FourPointResult): SavedResult {
  const unit = input.unit ? `${input.unit}/cm` : 'per cm';
  const dir = r.gradientDirection ?? [1, 0, 0];
  const along = (p: readonly number[]) => dir.reduce((sum, d, k) => sum + d * (p[k]! - r.centreCm[k]!), 0);
  const readings = input.points
    .map((p): [number, number] => [along(p.positionCm), p.value])
    .sort((a, b) => a[0] - b[0]);
  const ends = [readings[0]![0], readings.at(-1)![0]];
  return savedResultBuild(
    'four-point',
    `${input.points.length} points, elongation ${r.quality.elongation.toFixed(2)}, planarity ${r.quality.planarity.toFixed(2)}`,
    r,
    {
      kind: 'line',
      title: `Readings along the gradient: ${+r.gradientMagnitudePerCm.toPrecision(3)} ${unit}`,
      xLabel: 'Distance along the gradient from the centre (cm)',
      yLabel: input.unit ? `Reading (${input.unit})` : 'Reading',
      series: [
        series('readings', readings),
        series(
          'even change',
          ends.map((x): [number, number] => [x, r.valueAtCentre + r.gradientMagnitudePerCm * x]),
        ),
      ],
    },
  );
}

/** Saved form of a launch stack: the stack's radius against height beside the fairing's usable radius (m). */
export function launchStackSavedResult(input: LaunchStackInput, r: LaunchStackResult): SavedResult {
  const f = input.fairing;
  // Each part as a flat step; the ends are pulled in by a hair so no two points share a height (a plot
  // keeps one value per x) and the step between parts draws nearly upright.
  const hair = r.heightM * 1e-4;
  const outline = r.parts.flatMap((p): [number, number][] => [
    [p.bottomM + hair, p.radiusM],
    [p.topM - hair, p.radiusM],
  ]);
  const top = f.cylinderHeightM + f.coneHeightM;
  return savedResultBuild(
    'launch-stack',
    `${r.probes} probe(s), stack ${r.heightM.toFixed(2)} m, fairing ${f.diameterM} m × ${f.cylinderHeightM} m + ${f.coneHeightM} m cone`,
    r,
    {
      kind: 'line',
      title: r.fits ? 'The stack fits the fairing' : 'The stack does not fit the fairing',
      xLabel: 'Height above the adapter base (m)',
      yLabel: 'Radius (m)',
      series: [
        series('stack', outline),
        series('fairing', [
          [0, f.diameterM / 2],
          [f.cylinderHeightM, f.diameterM / 2],
          [top, 0],
        ]),
      ],
    },
  );
}
