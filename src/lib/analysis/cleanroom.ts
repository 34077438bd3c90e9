/**
 * The clean-room tool: particle counts per sampling location → concentrations per m³ for each size, the
 * ISO 14644-1:2015 class the room meets, and whether enough locations were sampled for its floor area.
 * Comparison rule (2015 edition): the mean of the samples at each location must not exceed the class limit
 * at every size considered — every location on its own; the 1999 edition's 95 % upper confidence limit
 * over locations was dropped in 2015 (from memory: ISO 14644-1:2015, A.5–A.6).
 */
import { z } from 'zod';
import { readingBetween } from './reading-range';
import { TextSchema } from '../text-schema';
import { refineValid } from '../validation';
import {
  ISO_14644_CLASSES,
  ISO_14644_SIZES_UM,
  iso14644Defined,
  iso14644Limit,
  iso14644LimitExact,
  iso14644MinSampleVolumeL,
  iso14644SamplingLocations,
} from './iso-14644';

/** Largest JSON clean-room request, bytes. */
export const CLEANROOM_JSON_MAX_BYTES = 1_000_000;
export const CLEANROOM_MAX_LOCATIONS = 200;
export const CLEANROOM_MAX_SAMPLES_PER_LOCATION = 20;
export const CLEANROOM_MAX_AREA_M2 = 100_000;
/** Sample volume bounds, in the sample's own unit (L or m³): a millilitre to a million. */
export const CLEANROOM_MIN_VOLUME = 1e-6;
export const CLEANROOM_MAX_VOLUME = 1e6;
/** Most particles one sample may count (far above ISO class 9's 3.52e7 per m³ at 0.5 µm). */
export const CLEANROOM_MAX_COUNT = 1e12;

const size = z
  .number()
  .refine(
    (s) => (ISO_14644_SIZES_UM as readonly number[]).includes(s),
    `use one of the ISO 14644-1 sizes ${ISO_14644_SIZES_UM.join(', ')} µm`,
  );

export const CleanroomSampleSchema = z
  .object({
    /** Air volume the counter drew for this sample. */
    volume: readingBetween(CLEANROOM_MIN_VOLUME, CLEANROOM_MAX_VOLUME, 'L or m³'),
    volumeUnit: z.enum(['L', 'm3']),
    /** Particle counts, one per size in `sizesUm`, in the same order. */
    counts: z
      .array(readingBetween(0, CLEANROOM_MAX_COUNT, 'particles').int('counts are whole particles'))
      .min(1)
      .max(ISO_14644_SIZES_UM.length),
  })
  .strict();

export const CleanroomInputSchema = refineValid(
  z
    .object({
      /** Floor area of the room or clean box, m². */
      floorAreaM2: z.number().finite().positive().max(CLEANROOM_MAX_AREA_M2),
      /** Particle sizes the counter reports, µm, from the ISO 14644-1 list, increasing. */
      sizesUm: z.array(size).min(1).max(ISO_14644_SIZES_UM.length),
      /** 'cumulative': each count is of particles ≥ that size (ISO's way); 'differential': between this size and the next. */
      countsAre: z.enum(['cumulative', 'differential']).default('cumulative'),
      locations: z
        .array(
          z
            .object({
              label: TextSchema.trim().min(1).max(60),
              samples: z.array(CleanroomSampleSchema).min(1).max(CLEANROOM_MAX_SAMPLES_PER_LOCATION),
            })
            .strict(),
        )
        .min(1)
        .max(CLEANROOM_MAX_LOCATIONS),
    })
    .strict(),
  (v, ctx) => {
    if (v.sizesUm.some((s, i) => i > 0 && !(s > v.sizesUm[i - 1]!))) {
      ctx.addIssue({ code: 'custom', path: ['sizesUm'], message: 'list each size once, smallest first' });
    }
    v.locations.forEach((loc, i) =>
      loc.samples.forEach((s, j) => {
        if (s.counts.length !== v.sizesUm.length) {
          ctx.addIssue({
            code: 'custom',
            path: ['locations', i, 'samples', j, 'counts'],
            message: `give ${v.sizesUm.length} counts, one per size`,
          });
        }
      }),
    );
  },
);
export type CleanroomInput = z.infer<typeof CleanroomInputSchema>;

export interface CleanroomResult {
  sizesUm: number[];
  /** Mean concentration per location, particles/m³ of size ≥ D, one value per size. */
  locations: { label: string; sampleCount: number; concentrationPerM3: number[] }[];
  perSize: { sizeUm: number; maxLocationMeanPerM3: number; lowestClassMet: number | null; exactClass: number }[];
  /** Lowest integer ISO class met at every size considered; null when not even Class 9 is. */
  isoClass: number | null;
  /** Class limits (particles/m³) at each size for the class found, null where blank. */
  classLimitsPerM3: (number | null)[] | null;
  locationsRequired: number;
  locationsSampled: number;
  warnings: string[];
}

function cumulative(counts: number[], countsAre: CleanroomInput['countsAre']): number[] {
  if (countsAre === 'cumulative') return counts;
  const out = [...counts];
  for (let i = out.length - 2; i >= 0; i--) out[i] = out[i]! + out[i + 1]!;
  return out;
}

/**
 * Classifies a room from its counts (concentrations in particles/m³); never throws on schema-valid
 * input. A class that Table 1 leaves undefined at a considered size is not offered.
 */
export function cleanroomClassify(input: CleanroomInput): CleanroomResult {
  const { sizesUm, countsAre } = input;
  const warnings: string[] = [];
  const locations = input.locations.map((loc) => {
    const sums = sizesUm.map(() => 0);
    for (const s of loc.samples) {
      const m3 = s.volumeUnit === 'L' ? s.volume / 1000 : s.volume;
      cumulative(s.counts, countsAre).forEach((c, i) => (sums[i] = sums[i]! + c / m3));
    }
    return {
      label: loc.label,
      sampleCount: loc.samples.length,
      concentrationPerM3: sums.map((v) => v / loc.samples.length),
    };
  });
  const maxMean = sizesUm.map((_, i) => Math.max(...locations.map((l) => l.concentrationPerM3[i]!)));
  const meets = (n: number, i: number) => {
    const limit = iso14644Limit(n, sizesUm[i]!);
    return limit !== null && maxMean[i]! <= limit;
  };
  const perSize = sizesUm.map((sizeUm, i) => ({
    sizeUm,
    maxLocationMeanPerM3: maxMean[i]!,
    lowestClassMet: ISO_14644_CLASSES.find((n) => meets(n, i)) ?? null,
    exactClass: Math.log10(Math.max(maxMean[i]!, 1e-9) / iso14644LimitExact(0, sizeUm)),
  }));
  const isoClass = ISO_14644_CLASSES.find((n) => sizesUm.every((_, i) => meets(n, i))) ?? null;
  if (isoClass !== null && isoClass > 1) {
    const countsAllow = ISO_14644_CLASSES.find(
      (n) =>
        n < isoClass &&
        sizesUm.some((s) => iso14644Defined(n, s)) &&
        sizesUm.every((s, i) => !iso14644Defined(n, s) || meets(n, i)),
    );
    const blank = countsAllow === undefined ? [] : sizesUm.filter((s) => !iso14644Defined(countsAllow, s));
    if (countsAllow !== undefined && blank.length > 0) {
      warnings.push(
        `The counts would meet ISO Class ${countsAllow}, but that class is not defined at ${blank.join(', ')} µm (ISO 14644-1:2015, Table 1); leave those sizes out to classify at Class ${countsAllow}.`,
      );
    }
  }
  const locationsRequired = iso14644SamplingLocations(input.floorAreaM2);
  if (input.locations.length < locationsRequired) {
    warnings.push(
      `A floor of ${input.floorAreaM2} m² needs at least ${locationsRequired} sampling locations (ISO 14644-1:2015, Table A.1); ${input.locations.length} were sampled, so the class is indicative only.`,
    );
  }
  if (isoClass !== null) {
    const minL = iso14644MinSampleVolumeL(isoClass, sizesUm[sizesUm.length - 1]!);
    const smallest = Math.min(
      ...input.locations.flatMap((l) => l.samples.map((s) => (s.volumeUnit === 'L' ? s.volume : s.volume * 1000))),
    );
    if (minL !== null && smallest < minL) {
      warnings.push(
        `Samples of ${+smallest.toPrecision(3)} L are below the ${+minL.toPrecision(3)} L that Class ${isoClass} needs at ${sizesUm[sizesUm.length - 1]} µm; sample longer.`,
      );
    }
  }
  return {
    sizesUm,
    locations,
    perSize,
    isoClass,
    classLimitsPerM3: isoClass === null ? null : sizesUm.map((s) => iso14644Limit(isoClass, s)),
    locationsRequired,
    locationsSampled: input.locations.length,
    warnings,
  };
}
