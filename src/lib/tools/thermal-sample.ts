/**
 * Sample data for thermal cycling: two invented cooling curves of a model moved from "sunlight" (a lamp) to
 * "eclipse" (a cooler), one bare and one wrapped in a blanket, following Newton's law of cooling
 * T(t) = T∞ + (T0 − T∞)·e^(−t/τ) with a thermometer's reading noise.
 */
import { sampleNoise } from './sample-noise';

/** The sample runs' parameters: start and final temperature, °C, and time constant, s. */
export const THERMAL_SAMPLE_RUNS = [
  { label: 'no blanket', startC: 48, finalC: 6, timeConstantS: 300 },
  { label: 'with blanket', startC: 48, finalC: 6, timeConstantS: 720 },
] as const;
/** Reading interval and count: every 30 s for 20 minutes. */
export const THERMAL_SAMPLE_INTERVAL_S = 30;
export const THERMAL_SAMPLE_READINGS = 41;
/** Peak reading noise, °C (a classroom probe thermometer's resolution; common practice, no source). */
export const THERMAL_SAMPLE_NOISE_C = 0.2;

/** Sample times (s) and one temperature column (°C, one decimal) per run. */
export function thermalSample(): { timeS: number[]; runs: { label: string; temperatureC: number[] }[] } {
  const timeS = Array.from({ length: THERMAL_SAMPLE_READINGS }, (_, i) => i * THERMAL_SAMPLE_INTERVAL_S);
  const runs = THERMAL_SAMPLE_RUNS.map((run, r) => ({
    label: run.label,
    temperatureC: timeS.map((t, i) => {
      const ideal = run.finalC + (run.startC - run.finalC) * Math.exp(-t / run.timeConstantS);
      return Math.round((ideal + THERMAL_SAMPLE_NOISE_C * sampleNoise(i, r + 10)) * 10) / 10;
    }),
  }));
  return { timeS, runs };
}
