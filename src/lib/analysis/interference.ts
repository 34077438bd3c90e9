/**
 * The interference-hunt tool: which classroom devices disturb a sensitive receiver, and how far away each
 * must be. With a magnetometer, each device's field-against-distance readings go through the
 * keep-it-non-magnetic fit (magnetic.ts: B = k·rⁿ and the distance where B falls to the threshold); with
 * an AM radio tuned between stations, students note the distance at which the device's noise can no longer
 * be heard. Either way each device gets a keep-out distance, and the devices are ranked by it.
 */
import { z } from 'zod';
import { InputError } from '../errors';
import {
  MAGNETIC_DEFAULT_THRESHOLD_UT,
  MAGNETIC_MIN_READINGS,
  MagneticReadingSchema,
  magneticFieldFit,
  type MagneticResult,
} from './magnetic';

/** Largest JSON interference request, bytes. */
export const INTERFERENCE_JSON_MAX_BYTES = 200_000;
/** Most devices ranked at once (one bar each in the saved plot). */
export const INTERFERENCE_MAX_DEVICES = 12;
/** Most field readings per device. */
export const INTERFERENCE_MAX_READINGS_PER_DEVICE = 100;
/** Most repeated listening distances per device. */
export const INTERFERENCE_MAX_LISTENS = 10;
/** The two receivers the activity uses. */
export const INTERFERENCE_RECEIVERS = ['magnetometer', 'am-radio'] as const;
export type InterferenceReceiver = (typeof INTERFERENCE_RECEIVERS)[number];

export const InterferenceDeviceSchema = z
  .object({
    /** What the device is, e.g. "Phone charger". */
    label: z.string().trim().min(1, 'name the device').max(60, 'keep the name under 60 characters'),
    /** Magnetometer: field readings at distances from the device. */
    readings: z
      .array(MagneticReadingSchema)
      .max(INTERFERENCE_MAX_READINGS_PER_DEVICE, `at most ${INTERFERENCE_MAX_READINGS_PER_DEVICE} readings a device`)
      .optional(),
    /** AM radio: distance(s), cm, at which the device's noise could no longer be heard, one per try. */
    noiseGoneCm: z
      .array(z.number().finite().positive().max(10_000))
      .min(1, 'give at least one distance')
      .max(INTERFERENCE_MAX_LISTENS, `at most ${INTERFERENCE_MAX_LISTENS} tries a device`)
      .optional(),
  })
  .strict();

export const InterferenceInputSchema = z
  .object({
    receiver: z.enum(INTERFERENCE_RECEIVERS, {
      errorMap: () => ({ message: 'the receiver is "magnetometer" or "am-radio"' }),
    }),
    /** Magnetometer only: field with every device off, µT, taken off each reading. */
    backgroundUT: z.number().finite().min(0).default(0),
    /** Magnetometer only: the field the receiver tolerates, µT; default 1 % of a typical Earth field. */
    thresholdUT: z.number().finite().positive().default(MAGNETIC_DEFAULT_THRESHOLD_UT),
    devices: z
      .array(InterferenceDeviceSchema)
      .min(1, 'list at least one device')
      .max(INTERFERENCE_MAX_DEVICES, `rank at most ${INTERFERENCE_MAX_DEVICES} devices at once`),
  })
  .strict()
  .superRefine((v, ctx) => {
    const seen = new Set<string>();
    v.devices.forEach((d, i) => {
      if (seen.has(d.label)) {
        ctx.addIssue({ code: 'custom', path: ['devices', i, 'label'], message: `"${d.label}" is listed twice` });
      }
      seen.add(d.label);
      if (v.receiver === 'magnetometer' && !d.readings) {
        ctx.addIssue({
          code: 'custom',
          path: ['devices', i, 'readings'],
          message: 'with a magnetometer, give field readings at several distances',
        });
      }
      if (v.receiver === 'am-radio' && !d.noiseGoneCm) {
        ctx.addIssue({
          code: 'custom',
          path: ['devices', i, 'noiseGoneCm'],
          message: 'with an AM radio, give the distance where the noise could no longer be heard',
        });
      }
    });
  });
export type InterferenceInput = z.infer<typeof InterferenceInputSchema>;
/** What a client sends: background and threshold may be left out for their defaults. */
export type InterferenceRequest = z.input<typeof InterferenceInputSchema>;

export interface InterferenceDeviceResult {
  label: string;
  /** 1 for the device that needs the most room. */
  rank: number;
  /**
   * How far the receiver must stay from the device, cm: the larger of the farthest reading still above the
   * threshold and the fit's threshold distance (its upper 1σ end where known); for a radio, the farthest
   * distance at which the noise was still heard. 0 when no reading rose above the threshold; null when the
   * field did not fall with distance, so no distance can be given.
   */
  keepOutCm: number | null;
  /** The magnetic fit (magnetometer only, when enough readings rose above the background). */
  fit: Pick<
    MagneticResult,
    'exponent' | 'exponentStdError' | 'thresholdDistanceCm' | 'thresholdDistanceRangeCm' | 'rSquared'
  > | null;
  warnings: string[];
}

export interface InterferenceResult {
  receiver: InterferenceReceiver;
  thresholdUT: number | null;
  /** Devices, most room needed first; null keep-outs after the rest. */
  ranking: InterferenceDeviceResult[];
  /** One sentence for the class. */
  summary: string;
}

function magnetometerDevice(input: InterferenceInput, index: number): Omit<InterferenceDeviceResult, 'rank'> {
  const d = input.devices[index]!;
  const readings = d.readings ?? [];
  const above = readings.filter((r) => r.fieldUT - input.backgroundUT > input.thresholdUT);
  const farthestAbove = above.length ? Math.max(...above.map((r) => r.distanceCm)) : 0;
  const usable = readings.filter((r) => r.fieldUT - input.backgroundUT > 0).length;
  if (above.length === 0) {
    return {
      label: d.label,
      keepOutCm: 0,
      fit: null,
      warnings: [
        `${d.label}: no reading rose above ${input.thresholdUT} µT over the background; it did not disturb the receiver.`,
      ],
    };
  }
  if (usable < MAGNETIC_MIN_READINGS) {
    throw new InputError(
      `${d.label}: the falloff fit needs at least ${MAGNETIC_MIN_READINGS} readings above the background; got ${usable}. Read the field at more distances.`,
      { [`devices.${index}.readings`]: [`at least ${MAGNETIC_MIN_READINGS} readings above the background`] },
    );
  }
  let fit: MagneticResult;
  try {
    fit = magneticFieldFit({ readings, backgroundUT: input.backgroundUT, thresholdUT: input.thresholdUT });
  } catch (err) {
    if (err instanceof InputError) {
      throw new InputError(`${d.label}: ${err.message}`, { [`devices.${index}.readings`]: [err.message] });
    }
    throw err;
  }
  const fitted = fit.thresholdDistanceRangeCm?.[1] ?? fit.thresholdDistanceCm;
  return {
    label: d.label,
    keepOutCm: fitted === null ? null : Math.max(fitted, farthestAbove),
    fit: {
      exponent: fit.exponent,
      exponentStdError: fit.exponentStdError,
      thresholdDistanceCm: fit.thresholdDistanceCm,
      thresholdDistanceRangeCm: fit.thresholdDistanceRangeCm,
      rSquared: fit.rSquared,
    },
    warnings: fit.warnings.map((w) => `${d.label}: ${w}`),
  };
}

/** Ranks the devices by keep-out distance (see InterferenceInputSchema); throws InputError when a fit cannot run. */
export function interferenceRank(input: InterferenceInput): InterferenceResult {
  const devices = input.devices.map((d, i) =>
    input.receiver === 'magnetometer'
      ? magnetometerDevice(input, i)
      : { label: d.label, keepOutCm: Math.max(...(d.noiseGoneCm ?? [0])), fit: null, warnings: [] },
  );
  const order = devices
    .map((d, i) => ({ d, i }))
    .sort((a, b) => (b.d.keepOutCm ?? -1) - (a.d.keepOutCm ?? -1) || a.i - b.i);
  const ranking = order.map(({ d }, k) => ({ ...d, rank: k + 1 }));
  const top = ranking[0]!;
  const summary =
    top.keepOutCm === null || top.keepOutCm === 0
      ? 'No device gave a keep-out distance: none disturbed the receiver measurably, or the readings did not fall with distance.'
      : `${top.label} needs the most room: keep it at least ${Math.ceil(top.keepOutCm)} cm from the receiver.`;
  return {
    receiver: input.receiver,
    thresholdUT: input.receiver === 'magnetometer' ? input.thresholdUT : null,
    ranking,
    summary,
  };
}
