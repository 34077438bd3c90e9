/**
 * The shake-test tool: an accelerometer record (time, x, y, z) → RMS, peak and crest factor per axis and
 * combined, a Welch PSD in g²/Hz (welch-psd.ts: periodic Hann, 50 % overlap, one-sided), the dominant
 * frequencies and the Grms in frequency bands. Statistics use the signal with its mean (gravity, sensor
 * offset) removed, because a shake test asks how hard the model is shaken, not which way is down.
 */
import { z } from 'zod';
import { ReadingTimeSchema, readingBetween } from './reading-range';
import { InputError } from '../errors';
import {
  STANDARD_GRAVITY_M_PER_S2,
  accelerationUnitFromGravity,
  type AccelerationUnit,
  type AccelerationUnitSource,
} from './acceleration-units';
import { timeSeriesSampleRateHz } from './time-series';
import {
  WELCH_MAX_SEGMENT_LENGTH,
  WELCH_MIN_SEGMENT_LENGTH,
  WELCH_MIN_SEGMENTS,
  psdBandPower,
  welchDefaultSegmentLength,
  welchPsd,
  welchSegmentCount,
} from './welch-psd';

/** Most samples per axis the tool accepts (just over one hour at 100 Hz). */
export const VIBRATION_MAX_SAMPLES = 400_000;
/** Fewest samples: WELCH_MIN_SEGMENTS half-overlapping segments of WELCH_MIN_SEGMENT_LENGTH. */
export const VIBRATION_MIN_SAMPLES = ((WELCH_MIN_SEGMENTS + 1) * WELCH_MIN_SEGMENT_LENGTH) / 2;
/** Largest JSON vibration request, bytes (send longer records as CSV text). */
export const VIBRATION_JSON_MAX_BYTES = 16_000_000;
/** Most frequency bands a request may ask for. */
export const VIBRATION_MAX_BANDS = 20;
/** How many dominant frequencies are reported. */
export const VIBRATION_DOMINANT_COUNT = 5;

/** Largest |acceleration| accepted, in g or m/s²: shock accelerometers top out near 1e5 g (from memory). */
export const VIBRATION_MAX_READING = 1e5;
const samples = z
  .array(readingBetween(-VIBRATION_MAX_READING, VIBRATION_MAX_READING, 'g or m/s²'))
  .max(VIBRATION_MAX_SAMPLES);

/** Options shared by the JSON and CSV forms of a vibration request. */
export const VibrationOptionsSchema = z.object({
  /** Unit of x, y, z; 'auto' reads it from the header or the size of the readings. */
  units: z.enum(['auto', 'g', 'm/s2']).default('auto'),
  /** Welch segment length in samples, a power of two; default: the longest ≤ 4096 giving ≥ 7 segments. */
  segmentLength: z
    .number()
    .int()
    .min(WELCH_MIN_SEGMENT_LENGTH)
    .max(WELCH_MAX_SEGMENT_LENGTH)
    .refine((n) => Number.isInteger(Math.log2(n)), 'must be a power of two (64, 128, … 16384)')
    .optional(),
  /** Frequency bands [lowHz, highHz) for band Grms; default octave-like bands up to the Nyquist frequency. */
  bands: z
    .array(z.object({ lowHz: z.number().finite().min(0), highHz: z.number().finite().positive() }).strict())
    .max(VIBRATION_MAX_BANDS)
    .optional(),
});

/** A vibration record as columns: time in seconds and x, y, z in the stated (or detected) unit. */
export const VibrationInputSchema = VibrationOptionsSchema.extend({
  timeS: z.array(ReadingTimeSchema).max(VIBRATION_MAX_SAMPLES),
  x: samples,
  y: samples,
  z: samples,
})
  .strict()
  .refine((v) => v.x.length === v.timeS.length && v.y.length === v.timeS.length && v.z.length === v.timeS.length, {
    message: 'timeS, x, y and z must have the same number of readings',
    path: ['timeS'],
  });
export type VibrationInput = z.infer<typeof VibrationInputSchema>;
export type VibrationOptions = z.input<typeof VibrationOptionsSchema>;

export interface AxisStats {
  /** Mean of the raw readings (mostly gravity), g. */
  meanG: number;
  /** RMS about the mean, g. */
  rmsG: number;
  /** Largest |reading − mean|, g. */
  peakG: number;
  /** peak/RMS; null when RMS is 0. */
  crestFactor: number | null;
}

export interface VibrationResult {
  sampleCount: number;
  sampleRateHz: number;
  durationS: number;
  units: { input: AccelerationUnit; source: AccelerationUnitSource };
  axes: { x: AxisStats; y: AxisStats; z: AxisStats };
  /** Vector of the three mean-removed axes: RMS √(Σ rms²), peak max |a|. */
  combined: Omit<AxisStats, 'meanG'>;
  psd: {
    window: 'hann-periodic';
    overlap: 0.5;
    /** Equivalent noise bandwidth of the window, bins. */
    enbwBins: 1.5;
    segmentLength: number;
    segmentCount: number;
    resolutionHz: number;
    frequencyHz: number[];
    /** g²/Hz per axis, and their sum (the combined PSD). */
    x: number[];
    y: number[];
    z: number[];
    sum: number[];
  };
  /** Highest local maxima of the summed PSD, strongest first. */
  dominant: { frequencyHz: number; psdG2PerHz: number }[];
  bands: { lowHz: number; highHz: number; grmsX: number; grmsY: number; grmsZ: number; grmsCombined: number }[];
  warnings: string[];
}

// A plain loop: Float64Array.from with a map function is several times slower on long records.
function scaled(values: readonly number[], factor: number): Float64Array {
  const out = new Float64Array(values.length);
  for (let i = 0; i < values.length; i++) out[i] = values[i]! * factor;
  return out;
}

function axisStats(values: Float64Array): AxisStats {
  let mean = 0;
  for (const v of values) mean += v;
  mean /= values.length;
  let ss = 0;
  let peak = 0;
  for (let i = 0; i < values.length; i++) {
    const d = values[i]! - mean;
    values[i] = d;
    ss += d * d;
    if (Math.abs(d) > peak) peak = Math.abs(d);
  }
  const rmsG = Math.sqrt(ss / values.length);
  return { meanG: mean, rmsG, peakG: peak, crestFactor: rmsG > 0 ? peak / rmsG : null };
}

function defaultBands(nyquistHz: number): { lowHz: number; highHz: number }[] {
  const edges = [1, 5, 10, 20, 50, 100, 200, 500, 1000, 2000, 5000].filter((f) => f < nyquistHz);
  return [...edges.map((lowHz, i) => ({ lowHz, highHz: Math.min(edges[i + 1] ?? nyquistHz, nyquistHz) }))];
}

function dominantPeaks(freq: Float64Array, psd: Float64Array): VibrationResult['dominant'] {
  const peaks: VibrationResult['dominant'] = [];
  for (let k = 1; k < psd.length; k++) {
    const left = psd[k - 1]!;
    const right = k + 1 < psd.length ? psd[k + 1]! : -Infinity;
    if (psd[k]! > left && psd[k]! >= right) peaks.push({ frequencyHz: freq[k]!, psdG2PerHz: psd[k]! });
  }
  return peaks.sort((a, b) => b.psdG2PerHz - a.psdG2PerHz).slice(0, VIBRATION_DOMINANT_COUNT);
}

/**
 * Analyses a vibration record (time in s, acceleration in g or m/s²; results in g and g²/Hz). Throws
 * InputError for a record too short for the PSD, time that does not increase, uneven sampling, or a
 * segment length longer than the record allows.
 */
export function vibrationAnalyse(
  input: VibrationInput,
  unitSource: AccelerationUnitSource = 'stated',
): VibrationResult {
  const n = input.timeS.length;
  const warnings: string[] = [];
  if (n < VIBRATION_MIN_SAMPLES) {
    throw new InputError(
      `The record has ${n} reading(s); the PSD needs at least ${VIBRATION_MIN_SAMPLES} evenly spaced readings ` +
        `(${WELCH_MIN_SEGMENTS} half-overlapping segments of ${WELCH_MIN_SEGMENT_LENGTH}). At 100 Hz that is ${VIBRATION_MIN_SAMPLES / 100} s of shaking; record longer.`,
      { timeS: [`at least ${VIBRATION_MIN_SAMPLES} readings`] },
    );
  }
  const sampleRateHz = timeSeriesSampleRateHz(input.timeS, 'accelerometer record');
  let unit: AccelerationUnit;
  let source = unitSource;
  if (input.units !== 'auto') unit = input.units;
  else {
    const guess = accelerationUnitFromGravity(input.x, input.y, input.z);
    source = guess ? 'gravity' : 'assumed';
    unit = guess ?? 'm/s2';
    if (!guess)
      warnings.push(
        'Could not tell g from m/s² (the readings do not include gravity); assumed m/s². Choose the unit if that is wrong.',
      );
  }
  const toG = unit === 'g' ? 1 : 1 / STANDARD_GRAVITY_M_PER_S2;
  const ax = scaled(input.x, toG);
  const ay = scaled(input.y, toG);
  const az = scaled(input.z, toG);
  const axes = { x: axisStats(ax), y: axisStats(ay), z: axisStats(az) };
  let peak = 0;
  for (let i = 0; i < n; i++) peak = Math.max(peak, Math.sqrt(ax[i]! ** 2 + ay[i]! ** 2 + az[i]! ** 2));
  const rms = Math.hypot(axes.x.rmsG, axes.y.rmsG, axes.z.rmsG);

  const segmentLength = input.segmentLength ?? welchDefaultSegmentLength(n)!;
  if (welchSegmentCount(n, segmentLength) < 1) {
    throw new InputError(
      `A segment of ${segmentLength} samples is longer than the ${n}-reading record; choose ${welchDefaultSegmentLength(n)} or shorter.`,
      { segmentLength: [`at most ${n}`] },
    );
  }
  const px = welchPsd(ax, sampleRateHz, segmentLength);
  const py = welchPsd(ay, sampleRateHz, segmentLength);
  const pz = welchPsd(az, sampleRateHz, segmentLength);
  const sum = px.psd.map((v, k) => v + py.psd[k]! + pz.psd[k]!);
  if (px.segmentCount < WELCH_MIN_SEGMENTS) {
    warnings.push(
      `Only ${px.segmentCount} segment(s) averaged: the PSD is noisy. A shorter segment length or a longer record smooths it.`,
    );
  }
  const nyquistHz = sampleRateHz / 2;
  const bands = (input.bands ?? defaultBands(nyquistHz)).map(({ lowHz, highHz }) => {
    const gx = Math.sqrt(psdBandPower(px, lowHz, highHz));
    const gy = Math.sqrt(psdBandPower(py, lowHz, highHz));
    const gz = Math.sqrt(psdBandPower(pz, lowHz, highHz));
    return { lowHz, highHz, grmsX: gx, grmsY: gy, grmsZ: gz, grmsCombined: Math.hypot(gx, gy, gz) };
  });
  return {
    sampleCount: n,
    sampleRateHz,
    durationS: input.timeS[n - 1]! - input.timeS[0]!,
    units: { input: unit, source },
    axes,
    combined: { rmsG: rms, peakG: peak, crestFactor: rms > 0 ? peak / rms : null },
    psd: {
      window: 'hann-periodic',
      overlap: 0.5,
      enbwBins: 1.5,
      segmentLength,
      segmentCount: px.segmentCount,
      resolutionHz: px.resolutionHz,
      frequencyHz: Array.from(px.frequencyHz),
      x: Array.from(px.psd),
      y: Array.from(py.psd),
      z: Array.from(pz.psd),
      sum: Array.from(sum),
    },
    dominant: dominantPeaks(px.frequencyHz, sum),
    bands,
    warnings,
  };
}
