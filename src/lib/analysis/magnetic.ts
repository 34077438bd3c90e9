/**
 * The keep-it-non-magnetic tool: field readings against distance → the power law B = k·rⁿ by least
 * squares on log B = log k + n·log r, with standard uncertainties, and the distance at which the field
 * falls below a threshold. Plus the dipole formulas for a worked example (Griffiths, Introduction to
 * Electrodynamics, 4th ed., §5.4.3): on the axis B = (μ0/4π)·2m/r³, in the equatorial plane (μ0/4π)·m/r³.
 */
import { z } from 'zod';
import { readingBetween } from './reading-range';
import { InputError } from '../errors';
import { linearFit } from './least-squares';

/** Largest JSON magnetic request, bytes. */
export const MAGNETIC_JSON_MAX_BYTES = 200_000;
/** Vacuum permeability μ0, N/A² (CODATA 2018). */
export const MU0_N_PER_A2 = 1.25663706212e-6;
/** Typical magnitude of Earth's surface field, µT (from memory: World Magnetic Model, about 25–65 µT). */
export const EARTH_FIELD_TYPICAL_UT = 50;
/** Default threshold: 1 % of the typical Earth field, µT. */
export const MAGNETIC_DEFAULT_THRESHOLD_UT = EARTH_FIELD_TYPICAL_UT / 100;
export const MAGNETIC_MAX_READINGS = 1_000;
export const MAGNETIC_MIN_READINGS = 3;
/** Distances a ruler can read, cm: 1 mm to 1 km (a power law fitted to 1e-300 cm overflows). */
export const MAGNETIC_MIN_DISTANCE_CM = 0.1;
export const MAGNETIC_MAX_DISTANCE_CM = 100_000;
/** Strongest field accepted, µT: 10 T, above any classroom magnet or magnetometer (from memory: lab NdFeB ≈ 1 T). */
export const MAGNETIC_MAX_FIELD_UT = 1e7;
/** Lowest threshold, µT (1 nT, about a fluxgate's resolution; from memory). */
export const MAGNETIC_MIN_THRESHOLD_UT = 0.001;

/** One field reading at a distance from the source. */
export const MagneticReadingSchema = z
  .object({
    /** Distance from the magnet's centre, cm. */
    distanceCm: readingBetween(MAGNETIC_MIN_DISTANCE_CM, MAGNETIC_MAX_DISTANCE_CM, 'cm'),
    /** Field magnitude read there, µT. */
    fieldUT: readingBetween(-MAGNETIC_MAX_FIELD_UT, MAGNETIC_MAX_FIELD_UT, 'µT'),
  })
  .strict();
export type MagneticReading = z.infer<typeof MagneticReadingSchema>;

export const MagneticInputSchema = z
  .object({
    readings: z.array(MagneticReadingSchema).max(MAGNETIC_MAX_READINGS),
    /** Field read with the magnet far away (Earth and room), µT, subtracted from every reading. */
    backgroundUT: readingBetween(0, MAGNETIC_MAX_FIELD_UT, 'µT').default(0),
    /** Field level to stay below, µT; default 1 % of a typical Earth field. */
    thresholdUT: readingBetween(MAGNETIC_MIN_THRESHOLD_UT, MAGNETIC_MAX_FIELD_UT, 'µT').default(
      MAGNETIC_DEFAULT_THRESHOLD_UT,
    ),
  })
  .strict();
export type MagneticInput = z.infer<typeof MagneticInputSchema>;

export interface MagneticResult {
  /** Power-law exponent n and its standard uncertainty (−3 for a dipole far away). */
  exponent: number;
  exponentStdError: number | null;
  /** k in B = k·(r / 1 cm)ⁿ, µT. */
  fieldAt1CmUT: number;
  rSquared: number;
  /** Distance where the fitted field equals thresholdUT, cm, with a 1σ range; null unless the field falls (n < 0). */
  thresholdDistanceCm: number | null;
  thresholdDistanceRangeCm: [number, number] | null;
  usedReadings: number;
  /** Readings with the background taken off, µT (≤ 0 ones are left out of the fit). */
  netFieldUT: number[];
  warnings: string[];
}

/**
 * Fits B = k·rⁿ to field readings (cm, µT) and finds where B falls to the threshold. Throws InputError
 * with fewer than MAGNETIC_MIN_READINGS usable readings (field above the background) or a single distance.
 */
export function magneticFieldFit(input: MagneticInput): MagneticResult {
  const warnings: string[] = [];
  const net = input.readings.map((r) => r.fieldUT - input.backgroundUT);
  const used = input.readings.filter((_, i) => net[i]! > 0);
  if (used.length < input.readings.length) {
    warnings.push(
      `${input.readings.length - used.length} reading(s) at or below the background were left out: a log needs a field above it.`,
    );
  }
  if (used.length < MAGNETIC_MIN_READINGS) {
    throw new InputError(
      `The fit needs at least ${MAGNETIC_MIN_READINGS} readings with a field above the background (${input.backgroundUT} µT); got ${used.length}. Read the field at more distances, closer to the magnet.`,
      { readings: [`at least ${MAGNETIC_MIN_READINGS} readings above the background`] },
    );
  }
  const x = used.map((r) => Math.log(r.distanceCm));
  const y = used.map((r) => Math.log(r.fieldUT - input.backgroundUT));
  const fit = linearFit(x, y);
  if (!fit) {
    throw new InputError('All readings are at the same distance; read the field at several distances.', {
      readings: ['needs different distances'],
    });
  }
  const n = fit.slope;
  const lnK = fit.intercept;
  let thresholdDistanceCm: number | null = null;
  let thresholdDistanceRangeCm: [number, number] | null = null;
  if (n < 0) {
    const lnR = (Math.log(input.thresholdUT) - lnK) / n;
    thresholdDistanceCm = Math.exp(lnR);
    // First-order propagation of the slope/intercept covariance into ln r* = (ln B* − ln k)/n.
    const varLnR =
      (fit.interceptStdError ** 2 + lnR ** 2 * fit.slopeStdError ** 2 + 2 * lnR * fit.slopeInterceptCovariance) /
      (n * n);
    if (Number.isFinite(varLnR)) {
      const s = Math.sqrt(Math.max(0, varLnR));
      thresholdDistanceRangeCm = [Math.exp(lnR - s), Math.exp(lnR + s)];
    }
    const farthest = Math.max(...used.map((r) => r.distanceCm));
    if (thresholdDistanceCm > 2 * farthest) {
      warnings.push(
        `The threshold distance lies beyond twice the farthest reading (${farthest} cm); it extrapolates the fit.`,
      );
    }
  } else {
    warnings.push('The field does not fall with distance in these readings; check the distances and the background.');
  }
  return {
    exponent: n,
    exponentStdError: Number.isFinite(fit.slopeStdError) ? fit.slopeStdError : null,
    fieldAt1CmUT: Math.exp(lnK),
    rSquared: fit.rSquared,
    thresholdDistanceCm,
    thresholdDistanceRangeCm,
    usedReadings: used.length,
    netFieldUT: net,
    warnings,
  };
}

/** Field of a magnetic dipole of moment `momentAm2` (A·m²) on its axis at `distanceM` (m), tesla. */
export function dipoleFieldAxialT(momentAm2: number, distanceM: number): number {
  return ((MU0_N_PER_A2 / (4 * Math.PI)) * 2 * momentAm2) / distanceM ** 3;
}

/** Field of a magnetic dipole (A·m²) in its equatorial plane at `distanceM` (m), tesla: half the axial field. */
export function dipoleFieldEquatorialT(momentAm2: number, distanceM: number): number {
  return ((MU0_N_PER_A2 / (4 * Math.PI)) * momentAm2) / distanceM ** 3;
}

/** Dipole moment (A·m²) that gives `fieldT` (tesla) on the axis at `distanceM` (m). */
export function dipoleMomentFromAxialField(fieldT: number, distanceM: number): number {
  return (fieldT * distanceM ** 3 * 4 * Math.PI) / (2 * MU0_N_PER_A2);
}
