/**
 * Sample data for the shake test: a synthetic accelerometer record, as CSV text, of a model on a shaker at
 * 20 Hz and 80 Hz — what a phone taped to the model would log. Invented, and labelled so in the tool.
 */
import { sampleNoise } from './sample-noise';

/** Sample rate of the sample record, Hz (a phone accelerometer app's usual setting; common practice, no source). */
export const VIBRATION_SAMPLE_RATE_HZ = 200;
/** Readings in the sample record: 10.24 s at 200 Hz. */
export const VIBRATION_SAMPLE_COUNT = 2048;

/** Amplitudes of the sample's two tones per axis, g: 20 Hz mostly along x, 80 Hz mostly along y. */
export const VIBRATION_SAMPLE_TONES = [
  { frequencyHz: 20, amplitudeG: { x: 0.5, y: 0.1, z: 0.2 } },
  { frequencyHz: 80, amplitudeG: { x: 0.05, y: 0.3, z: 0.1 } },
] as const;

/** Peak of the sample's flat noise on each axis, g. */
export const VIBRATION_SAMPLE_NOISE_G = 0.02;

/**
 * The sample record as CSV (header "time_s,x_g,y_g,z_g"; time in s, acceleration in g with gravity, 1 g,
 * on z), VIBRATION_SAMPLE_COUNT rows at VIBRATION_SAMPLE_RATE_HZ.
 */
export function vibrationSampleCsv(): string {
  const lines = ['time_s,x_g,y_g,z_g'];
  for (let i = 0; i < VIBRATION_SAMPLE_COUNT; i++) {
    const t = i / VIBRATION_SAMPLE_RATE_HZ;
    const axis = (a: 'x' | 'y' | 'z', seed: number, offset: number) =>
      offset +
      VIBRATION_SAMPLE_TONES.reduce(
        (s, tone) => s + tone.amplitudeG[a] * Math.sin(2 * Math.PI * tone.frequencyHz * t),
        0,
      ) +
      VIBRATION_SAMPLE_NOISE_G * sampleNoise(i, seed);
    lines.push(
      [t.toFixed(3), axis('x', 1, 0).toFixed(5), axis('y', 2, 0).toFixed(5), axis('z', 3, 1).toFixed(5)].join(','),
    );
  }
  return lines.join('\n') + '\n';
}
