/**
 * Sample data for keep-it-non-magnetic: a phone magnetometer's readings along the axis of an invented small
 * magnet (a dipole of DIPOLE_SAMPLE_MOMENT_AM2), with Earth's field as the background and reading noise.
 */
import { dipoleFieldAxialT } from '../analysis/magnetic';
import { sampleNoise } from './sample-noise';

/** Dipole moment of the sample magnet, A·m² (about a fridge-magnet disc; from memory: 0.1–1 A·m²). */
export const MAGNETIC_SAMPLE_MOMENT_AM2 = 0.5;
/** Background read with the magnet far away, µT (inside the 25–65 µT range of Earth's field; invented). */
export const MAGNETIC_SAMPLE_BACKGROUND_UT = 48;
/** Distances of the sample readings, cm. */
export const MAGNETIC_SAMPLE_DISTANCES_CM = [4, 5, 6, 7, 8, 10, 12, 15, 20] as const;
/** Peak reading noise, µT. */
export const MAGNETIC_SAMPLE_NOISE_UT = 0.5;

/** The sample readings (cm, µT to one decimal), background included. */
export function magneticSample(): { distanceCm: number; fieldUT: number }[] {
  return MAGNETIC_SAMPLE_DISTANCES_CM.map((distanceCm, i) => {
    const dipoleUT = dipoleFieldAxialT(MAGNETIC_SAMPLE_MOMENT_AM2, distanceCm / 100) * 1e6;
    const reading = dipoleUT + MAGNETIC_SAMPLE_BACKGROUND_UT + MAGNETIC_SAMPLE_NOISE_UT * sampleNoise(i, 20);
    return { distanceCm, fieldUT: Math.round(reading * 10) / 10 };
  });
}
