/**
 * The overall Grms of a random-vibration PSD profile given as breakpoints joined by straight lines on
 * log-log axes (the way test specifications such as GSFC-STD-7000A, Table 2.4-3 state them), or as a
 * start level with slopes in dB/octave.
 */
import { z } from 'zod';
import { readingBetween } from './reading-range';
import { InputError } from '../errors';

/** Largest JSON PSD-profile request, bytes. */
export const PSD_PROFILE_JSON_MAX_BYTES = 50_000;
/** Most breakpoints a profile may have. */
export const PSD_PROFILE_MAX_BREAKPOINTS = 100;
/** Frequency bounds for a breakpoint, Hz. */
export const PSD_PROFILE_MIN_FREQUENCY_HZ = 0.01;
export const PSD_PROFILE_MAX_FREQUENCY_HZ = 100_000;
/** Level bounds for a breakpoint, g²/Hz: far outside any test specification, inside what the integral can hold. */
export const PSD_PROFILE_MIN_LEVEL_G2_PER_HZ = 1e-12;
export const PSD_PROFILE_MAX_LEVEL_G2_PER_HZ = 1e6;

const frequencyHz = z.number().finite().min(PSD_PROFILE_MIN_FREQUENCY_HZ).max(PSD_PROFILE_MAX_FREQUENCY_HZ);

/**
 * One profile point. A level, a slope from the previous point, or both; a missing level is derived from a
 * neighbour's level through the slope between them, forwards or backwards. Where both levels of a segment
 * are given, they win over a stated slope.
 */
export const PsdProfilePointSchema = z
  .object({
    /** Breakpoint frequency, Hz. */
    frequencyHz,
    /** Level at the breakpoint, g²/Hz. */
    psdG2PerHz: readingBetween(PSD_PROFILE_MIN_LEVEL_G2_PER_HZ, PSD_PROFILE_MAX_LEVEL_G2_PER_HZ, 'g²/Hz').optional(),
    /** Slope from the previous point to this one, dB/octave (+6 rising, −6 falling). */
    slopeDbPerOctave: z.number().finite().min(-100).max(100).optional(),
  })
  .strict();

/** A PSD profile: breakpoints in increasing frequency; the first must give a level. */
export const PsdProfileInputSchema = z
  .object({
    points: z
      .array(PsdProfilePointSchema)
      .min(2, 'A profile needs at least two breakpoints.')
      .max(PSD_PROFILE_MAX_BREAKPOINTS, `A profile may have at most ${PSD_PROFILE_MAX_BREAKPOINTS} breakpoints.`),
  })
  .strict();
export type PsdProfileInput = z.infer<typeof PsdProfileInputSchema>;

export interface PsdProfileSegment {
  lowHz: number;
  highHz: number;
  lowPsd: number;
  highPsd: number;
  /** Log-log exponent n: PSD ∝ fⁿ on the segment. */
  exponent: number;
  slopeDbPerOctave: number;
  /** Mean-square acceleration in the segment, g². */
  areaG2: number;
}

export interface PsdProfileResult {
  /** Breakpoints with every level resolved, g²/Hz. */
  breakpoints: { frequencyHz: number; psdG2PerHz: number }[];
  segments: PsdProfileSegment[];
  /** Overall root-mean-square acceleration √(Σ areas), g. */
  grms: number;
}

const DB_PER_OCTAVE_PER_EXPONENT = 10 * Math.log10(2);

/**
 * Area under one log-log segment from (f1, P1) to (f2, P2), g²: (P2·f2 − P1·f1)/(n + 1) with
 * n = ln(P2/P1)/ln(f2/f1), or P1·f1·ln(f2/f1) when n = −1 (the closed-form integral of P1·(f/f1)ⁿ from
 * f1 to f2). Zero for f2 ≤ f1.
 */
export function psdSegmentArea(f1: number, p1: number, f2: number, p2: number): number {
  if (!(f2 > f1)) return 0;
  const n = Math.log(p2 / p1) / Math.log(f2 / f1);
  if (Math.abs(n + 1) < 1e-9) return p1 * f1 * Math.log(f2 / f1);
  return (p2 * f2 - p1 * f1) / (n + 1);
}

/** dB/octave → log-log exponent: n = m/(10·log10 2), so +6 dB/oct ≈ 1.993. */
export function psdSlopeExponent(slopeDbPerOctave: number): number {
  return slopeDbPerOctave / DB_PER_OCTAVE_PER_EXPONENT;
}

function resolveLevels(points: PsdProfileInput['points']): number[] {
  const levels = points.map((p) => p.psdG2PerHz ?? NaN);
  for (let changed = true; changed;) {
    changed = false;
    for (let i = 1; i < points.length; i++) {
      const slope = points[i]!.slopeDbPerOctave;
      if (slope === undefined) continue;
      const ratio = (points[i]!.frequencyHz / points[i - 1]!.frequencyHz) ** psdSlopeExponent(slope);
      if (Number.isNaN(levels[i]!) && !Number.isNaN(levels[i - 1]!)) levels[i] = levels[i - 1]! * ratio;
      else if (Number.isNaN(levels[i - 1]!) && !Number.isNaN(levels[i]!)) levels[i - 1] = levels[i]! / ratio;
      else continue;
      changed = true;
    }
  }
  const missing = levels.findIndex((v) => Number.isNaN(v));
  if (missing >= 0) {
    throw new InputError(
      `Breakpoint ${missing + 1} (${points[missing]!.frequencyHz} Hz) has no level, and no slope links it to a point that has one; give its g²/Hz or a slope.`,
      { [`points.${missing}`]: ['needs psdG2PerHz or a slope to a known level'] },
    );
  }
  return levels;
}

/**
 * Grms (g) of a PSD profile, integrating each segment exactly as a straight line on log-log axes. Throws
 * InputError when frequencies do not increase, the first point states a slope, or a level cannot be
 * derived.
 */
export function psdProfileGrms(input: PsdProfileInput): PsdProfileResult {
  const { points } = input;
  points.forEach((point, i) => {
    const prev = points[i - 1];
    if (prev && !(point.frequencyHz > prev.frequencyHz)) {
      throw new InputError(
        `Breakpoint ${i + 1} is at ${point.frequencyHz} Hz, not above the previous ${prev.frequencyHz} Hz; list breakpoints in increasing frequency.`,
        { [`points.${i}.frequencyHz`]: ['must be above the previous breakpoint'] },
      );
    }
  });
  if (points[0]?.slopeDbPerOctave !== undefined) {
    throw new InputError(
      'The first breakpoint has no previous point for its slope to start from; give it a level, or nothing.',
      {
        'points.0.slopeDbPerOctave': ['not allowed on the first point'],
      },
    );
  }
  const levels = resolveLevels(points);
  const breakpoints = points.map((p, i) => ({ frequencyHz: p.frequencyHz, psdG2PerHz: levels[i]! }));
  const segments: PsdProfileSegment[] = [];
  for (let i = 1; i < breakpoints.length; i++) {
    const a = breakpoints[i - 1]!;
    const b = breakpoints[i]!;
    const exponent = Math.log(b.psdG2PerHz / a.psdG2PerHz) / Math.log(b.frequencyHz / a.frequencyHz);
    segments.push({
      lowHz: a.frequencyHz,
      highHz: b.frequencyHz,
      lowPsd: a.psdG2PerHz,
      highPsd: b.psdG2PerHz,
      exponent,
      slopeDbPerOctave: exponent * DB_PER_OCTAVE_PER_EXPONENT,
      areaG2: psdSegmentArea(a.frequencyHz, a.psdG2PerHz, b.frequencyHz, b.psdG2PerHz),
    });
  }
  const total = segments.reduce((s, seg) => s + seg.areaG2, 0);
  return { breakpoints, segments, grms: Math.sqrt(total) };
}
