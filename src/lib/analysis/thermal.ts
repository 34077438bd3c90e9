/**
 * The thermal-cycling tool: one or more temperature logs (time in s, temperature in °C) → for each run,
 * whether it heats or cools, its average and initial rates, and Newton's-law fit (newton-cooling.ts) of
 * the time constant τ and final temperature T∞ with standard uncertainties.
 */
import { z } from 'zod';
import { ReadingTimeSchema, readingBetween } from './reading-range';
import { TextSchema } from '../text-schema';
import { InputError } from '../errors';
import { linearFit } from './least-squares';
import { newtonCoolingFit, type NewtonCoolingFit } from './newton-cooling';
import { timeSeriesAssertIncreasing } from './time-series';

/** Largest JSON thermal request, bytes. */
export const THERMAL_JSON_MAX_BYTES = 4_000_000;
/** Most runs in one request. */
export const THERMAL_MAX_RUNS = 8;
/** Most readings in one run. */
export const THERMAL_MAX_POINTS_PER_RUN = 20_000;
/** Share of a run (at least 3 readings) the initial rate is fitted over. */
export const THERMAL_INITIAL_SHARE = 0.2;

/** Hottest reading accepted, °C (well above any classroom heat lamp or oven). */
export const THERMAL_MAX_TEMPERATURE_C = 10_000;
/** Absolute zero, °C (BIPM SI Brochure: 0 K = −273.15 °C). */
export const ABSOLUTE_ZERO_C = -273.15;

/** One temperature log: readings at increasing times. */
export const ThermalRunSchema = z
  .object({
    /** Name shown in the legend, e.g. "with blanket". */
    label: TextSchema.trim().min(1).max(60),
    /** Reading times, s. */
    timeS: z.array(ReadingTimeSchema).max(THERMAL_MAX_POINTS_PER_RUN),
    /** Temperatures, °C. */
    temperatureC: z
      .array(readingBetween(ABSOLUTE_ZERO_C, THERMAL_MAX_TEMPERATURE_C, '°C'))
      .max(THERMAL_MAX_POINTS_PER_RUN),
  })
  .strict()
  .refine((r) => r.timeS.length === r.temperatureC.length, {
    message: 'timeS and temperatureC must have the same number of readings',
    path: ['temperatureC'],
  });

export const ThermalInputSchema = z
  .object({
    runs: z
      .array(ThermalRunSchema)
      .min(1, 'send at least one run')
      .max(THERMAL_MAX_RUNS, `at most ${THERMAL_MAX_RUNS} runs`),
  })
  .strict();
export type ThermalInput = z.infer<typeof ThermalInputSchema>;
export type ThermalRun = z.infer<typeof ThermalRunSchema>;

export interface ThermalRunResult {
  label: string;
  pointCount: number;
  durationS: number;
  direction: 'heating' | 'cooling' | 'steady';
  startC: number;
  endC: number;
  /** (T_end − T_start)/duration, °C/min. */
  averageRateCPerMin: number;
  /** Least-squares slope over the first THERMAL_INITIAL_SHARE of the run, °C/min, with its uncertainty. */
  initialRateCPerMin: number;
  initialRateStdErrorCPerMin: number | null;
  /** Newton's-law fit, or null with the reason in fitMessage. */
  fit: (NewtonCoolingFit & { timeConstantMin: number }) | null;
  fitMessage: string | null;
}

export interface ThermalResult {
  runs: ThermalRunResult[];
}

/**
 * Analyses one temperature log (s, °C; rates in °C/min). Throws InputError when it has fewer than two
 * readings or time does not increase; a run the Newton fit cannot describe gets fit = null and a message.
 */
export function thermalRunAnalyse(run: ThermalRun, index = 0): ThermalRunResult {
  const { timeS, temperatureC: temp, label } = run;
  const n = timeS.length;
  if (n < 2) {
    throw new InputError(
      `Run "${label}" has ${n} reading(s); a rate needs at least 2, and the time-constant fit at least 5.`,
      {
        [`runs.${index}.timeS`]: ['at least 2 readings'],
      },
    );
  }
  timeSeriesAssertIncreasing(timeS, `run "${label}"`);
  const durationS = timeS[n - 1]! - timeS[0]!;
  const startC = temp[0]!;
  const endC = temp[n - 1]!;
  const k = Math.min(n, Math.max(3, Math.ceil(n * THERMAL_INITIAL_SHARE)));
  const initial = linearFit(timeS.slice(0, k), temp.slice(0, k));
  const outcome = newtonCoolingFit(timeS, temp);
  const change = endC - startC;
  return {
    label,
    pointCount: n,
    durationS,
    // common practice, no source: a change under 0.1 °C is within a classroom thermometer's resolution.
    direction: Math.abs(change) < 0.1 ? 'steady' : change > 0 ? 'heating' : 'cooling',
    startC,
    endC,
    averageRateCPerMin: (change / durationS) * 60,
    initialRateCPerMin: (initial?.slope ?? 0) * 60,
    initialRateStdErrorCPerMin: initial && Number.isFinite(initial.slopeStdError) ? initial.slopeStdError * 60 : null,
    fit: outcome.ok ? { ...outcome.fit, timeConstantMin: outcome.fit.timeConstantS / 60 } : null,
    fitMessage: outcome.ok ? null : outcome.message,
  };
}

/** Analyses every run of a thermal request; see thermalRunAnalyse. */
export function thermalAnalyse(input: ThermalInput): ThermalResult {
  return { runs: input.runs.map((run, i) => thermalRunAnalyse(run, i)) };
}
