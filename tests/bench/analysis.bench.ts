/**
 * Benchmark (a script, not a test): Welch PSD of a one-hour, 100 Hz, three-axis record (360 000 samples per
 * axis) with the vibration tool's default segment length, and the whole vibration analysis of the same
 * record. Prints min/median/max ms over the runs after warm-up and the peak resident set size.
 * Target: PSD median ≤ 300 ms on the 2-core reference machine. Then the deploy-test, interference,
 * four-point and launch-stack tools at their largest accepted inputs (four-point: FOUR_POINT_MAX_POINTS
 * points; launch stack: STACK_PROBES_MAX probes of a 256-facet body), parse and saved result included
 * (target: median ≤ 20 ms each).
 */
import { performance } from 'node:perf_hooks';
import { DEPLOYMENT_MAX_TRIALS, DeploymentInputSchema, deploymentAnalyse } from '../../src/lib/analysis/deployment';
import {
  INTERFERENCE_MAX_DEVICES,
  INTERFERENCE_MAX_READINGS_PER_DEVICE,
  InterferenceInputSchema,
  interferenceRank,
} from '../../src/lib/analysis/interference';
import {
  deploymentSavedResult,
  fourPointSavedResult,
  interferenceSavedResult,
  launchStackSavedResult,
} from '../../src/lib/analysis/saved-result-tools';
import { VibrationInputSchema, vibrationAnalyse } from '../../src/lib/analysis/vibration';
import { vibrationInputFromCsv } from '../../src/lib/analysis/vibration-csv';
import { welchDefaultSegmentLength, welchPsd } from '../../src/lib/analysis/welch-psd';
import { FOUR_POINT_MAX_POINTS, FourPointInputSchema, fourPointGradient } from '../../src/lib/analysis/four-point';
import { LaunchStackInputSchema, launchStackAnalyse } from '../../src/lib/analysis/launch-stack';
import { CYLINDER_FACETS_MAX, STACK_PROBES_MAX } from '../../src/lib/geometry/model-schema';

const FS = 100;
const N = 3600 * FS;
const WARMUP = 3;
const RUNS = 15;

let seed = 12345;
const noise = () => {
  seed = (seed * 1103515245 + 12345) % 2147483648;
  return seed / 2147483648 - 0.5;
};
const timeS = Array.from({ length: N }, (_, i) => i / FS);
const axes = [7, 13, 29].map((f) =>
  Float64Array.from({ length: N }, (_, i) => 0.3 * Math.sin((2 * Math.PI * f * i) / FS) + 0.1 * noise()),
);
const segment = welchDefaultSegmentLength(N)!;
let peakRss = process.memoryUsage().rss;

function measure(label: string, run: () => void, runs = RUNS): void {
  for (let i = 0; i < WARMUP; i++) run();
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    run();
    times.push(performance.now() - t0);
    peakRss = Math.max(peakRss, process.memoryUsage().rss);
  }
  times.sort((a, b) => a - b);
  const f = (v: number) => v.toFixed(1);
  console.log(
    `${label}: min ${f(times[0]!)} ms, median ${f(times[runs >> 1]!)} ms, max ${f(times[runs - 1]!)} ms (${runs} runs after ${WARMUP} warm-up)`,
  );
}

console.log(
  `record: ${N.toLocaleString('en-US')} samples per axis × 3 axes at ${FS} Hz, segment ${segment}, 50 % overlap`,
);
measure('Welch PSD, 3 axes', () => {
  for (const a of axes) welchPsd(a, FS, segment);
});
measure('Welch PSD, 3 axes, segment 256 (many short segments)', () => {
  for (const a of axes) welchPsd(a, FS, 256);
});
console.log(`peak RSS after the PSD runs: ${(peakRss / 1_048_576).toFixed(0)} MiB`);
const input = VibrationInputSchema.parse({
  timeS,
  x: Array.from(axes[0]!),
  y: Array.from(axes[1]!),
  z: Array.from(axes[2]!),
  units: 'g',
});
measure('vibrationAnalyse (checks, stats, PSD, bands)', () => {
  vibrationAnalyse(input);
});
const csv = [
  'time_s,x_g,y_g,z_g',
  ...timeS.map(
    (t, i) => `${t.toFixed(2)},${axes[0]![i]!.toFixed(5)},${axes[1]![i]!.toFixed(5)},${axes[2]![i]!.toFixed(5)}`,
  ),
].join('\n');
measure(
  `CSV (${(csv.length / 1e6).toFixed(1)} MB) parsed and analysed`,
  () => {
    const { input: parsed, unitSource } = vibrationInputFromCsv(csv);
    vibrationAnalyse(parsed, unitSource);
  },
  5,
);
const peak = Math.max(peakRss, process.resourceUsage().maxRSS * 1024);
console.log(`peak RSS overall (CSV text and parsed rows included): ${(peak / 1_048_576).toFixed(0)} MiB`);

// Deploy test, its largest accepted input: two designs of DEPLOYMENT_MAX_TRIALS trials each, every trial
// with a time and a length. Target: median ≤ 20 ms for parse + analysis + saved result.
const deploymentBody = {
  designs: ['Spring boom', 'Rubber-band boom'].map((label, k) => ({
    label,
    trials: Array.from({ length: DEPLOYMENT_MAX_TRIALS }, (_, i) => ({
      outcome: (i * 7 + k) % 10 < 8 ? 'full' : (i + k) % 2 ? 'partial' : 'none',
      timeS: 0.5 + ((i * 13) % 40) / 10,
      finalLengthCm: 20 + ((i * 17) % 150) / 10,
    })),
  })),
};
console.log(`deployment: ${JSON.stringify(deploymentBody).length.toLocaleString('en-US')} bytes of JSON`);
measure('deployment: parse, analyse, saved result (2 × 1000 trials)', () => {
  deploymentSavedResult(deploymentAnalyse(DeploymentInputSchema.parse(deploymentBody)));
});

// Interference hunt, its largest accepted input: 12 devices × 100 field readings, each fitted.
const interferenceBody = {
  receiver: 'magnetometer',
  backgroundUT: 48,
  devices: Array.from({ length: INTERFERENCE_MAX_DEVICES }, (_, i) => ({
    label: `Device ${i + 1}`,
    readings: Array.from({ length: INTERFERENCE_MAX_READINGS_PER_DEVICE }, (_, k) => ({
      distanceCm: 3 + k,
      fieldUT: 48 + (500 * (i + 1)) / (3 + k) ** 3 + 0.05 * noise(),
    })),
  })),
};
console.log(`interference: ${JSON.stringify(interferenceBody).length.toLocaleString('en-US')} bytes of JSON`);
measure('interference: parse, rank, saved result (12 devices × 100 readings)', () => {
  interferenceSavedResult(interferenceRank(InterferenceInputSchema.parse(interferenceBody)));
});

// Four-point and launch stack, their largest accepted inputs.
const fourPointBody = {
  unit: '°C',
  points: Array.from({ length: FOUR_POINT_MAX_POINTS }, () => {
    const p = [noise() * 100, noise() * 100, noise() * 100];
    return { positionCm: p, value: 20 + 0.1 * p[0]! - 0.05 * p[2]! + noise() };
  }),
};
measure(
  `four-point gradient, ${FOUR_POINT_MAX_POINTS} points (least squares): parse, gradient, saved result`,
  () => {
    const input = FourPointInputSchema.parse(fourPointBody);
    fourPointSavedResult(input, fourPointGradient(input));
  },
  200,
);
const launchStackBody = {
  body: { kind: 'cylinder', diameterM: 2, heightM: 1, facets: CYLINDER_FACETS_MAX },
  stack: { count: STACK_PROBES_MAX, ring: { heightM: 0.2, diameterM: 1.6 }, adapter: { heightM: 0.8, diameterM: 2 } },
  probeMassKg: 450,
  ringMassKg: 20,
  adapterMassKg: 120,
  // Too short on purpose: the calculator also searches how many probes fit and what cylinder would do.
  fairing: { diameterM: 3, cylinderHeightM: 5, coneHeightM: 3, clearanceM: 0.05 },
};
measure(
  `launch stack, ${STACK_PROBES_MAX} probes of a ${CYLINDER_FACETS_MAX}-facet body: parse, analyse, saved result`,
  () => {
    const input = LaunchStackInputSchema.parse(launchStackBody);
    launchStackSavedResult(input, launchStackAnalyse(input));
  },
  200,
);
