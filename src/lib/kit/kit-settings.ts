/**
 * The kit builder's settings as a zod schema built from the engine's limits. Imports zod and the shared scale
 * and paper schemas alone, so the builder island can validate with the very rules the API applies without
 * shipping the engine: the page passes KIT_SETTINGS_LIMITS (src/lib/kit/kit-inputs.ts) to the island as plain
 * props (the inputs' min and max attributes, the id lists).
 */
import { z } from 'zod';
import { TextSchema } from '../text-schema';
import { PaperGsmSchema, ScaleDenominatorSchema } from '../geometry/pattern-option-schemas';

/** The engine limits the settings schema is built from (numbers and id lists only, so they serialise). */
export interface KitSettingsLimits<S extends string = string, V extends string = string, G extends string = string> {
  scaleDenominatorMax: number;
  paperGsmMin: number;
  paperGsmMax: number;
  copiesMax: number;
  sheetSizeIds: readonly [S, ...S[]];
  venueIds: readonly [V, ...V[]];
  printBedIds: readonly [string, ...string[]];
  printNozzlesMm: readonly number[];
  printBedMinMm: number;
  printBedMaxMm: number;
  /** Grade bands a kit can be built for, the default first-class choice, and each band in words. */
  gradeBands: readonly [G, ...G[]];
  gradeBandDefault: G;
  gradeBandWords: Readonly<Record<G, string>>;
}

const SLUG = /^[a-z0-9]+(-[a-z0-9]+)*$/;
export const KIT_TITLE_MAX_LENGTH = 80;

/** Where the PDF's instructions pages go: before the sheets or after them (the default). */
export const INSTRUCTIONS_PLACES = ['first', 'last'] as const;
export type InstructionsPlace = (typeof INSTRUCTIONS_PLACES)[number];
export const INSTRUCTIONS_PLACE_DEFAULT: InstructionsPlace = 'last';

/** A kit's title, as sent on build, rename and duplicate. */
export const KitTitleSchema = TextSchema.trim()
  .min(1, 'the title must not be empty')
  .max(KIT_TITLE_MAX_LENGTH, `keep the title under ${KIT_TITLE_MAX_LENGTH} characters`);

/** Where the booms are laid out: a preset venue by id, or a custom floor in metres. */
function venueChoiceSchema<V extends string>(venueIds: readonly [V, ...V[]]) {
  return z.discriminatedUnion('kind', [
    z.object({ kind: z.literal('preset'), id: z.enum(venueIds as [V, ...V[]]) }),
    z.object({
      kind: z.literal('custom'),
      lengthM: z
        .number()
        .finite('the venue length must be a number of metres')
        .positive('the venue length must be more than 0 m'),
      widthM: z
        .number()
        .finite('the venue width must be a number of metres')
        .positive('the venue width must be more than 0 m'),
    }),
  ]);
}

/** The STL's print target: a preset bed by id or a custom one in mm, and the nozzle from the offered sizes. */
export function printChoiceSchema(
  limits: Pick<KitSettingsLimits, 'printBedIds' | 'printNozzlesMm' | 'printBedMinMm' | 'printBedMaxMm'>,
) {
  const side = (what: string) =>
    z
      .number({ invalid_type_error: `the bed ${what} must be a number of mm` })
      .finite(`the bed ${what} must be a number of mm`)
      .min(limits.printBedMinMm, `the bed ${what} must be at least ${limits.printBedMinMm} mm`)
      .max(limits.printBedMaxMm, `the bed ${what} must be at most ${limits.printBedMaxMm} mm`);
  return z.object({
    bed: z.discriminatedUnion('kind', [
      z.object({ kind: z.literal('preset'), id: z.enum(limits.printBedIds as [string, ...string[]]) }),
      z.object({
        kind: z.literal('custom'),
        widthMm: side('width'),
        depthMm: side('depth'),
        heightMm: side('height'),
      }),
    ]),
    nozzleMm: z
      .number({ invalid_type_error: 'the nozzle must be a number of mm' })
      .refine((v) => limits.printNozzlesMm.includes(v), {
        message: `the nozzle must be one of ${limits.printNozzlesMm.join(', ')} mm`,
      }),
  });
}

/** Scale, sheet, paper, copies, units, venue, title and activity of a kit (no model: callers add it). */
export function kitSettingsSchema<S extends string, V extends string, G extends string>(
  limits: KitSettingsLimits<S, V, G>,
) {
  return z.object({
    /** Title printed on every sheet; the model's name when left out. */
    title: KitTitleSchema.optional(),
    /** The activity the kit is for (its slug), if any. */
    activitySlug: z.string().regex(SLUG, 'an activity is named by its slug, like "shake-test"').max(80).optional(),
    /** The kit is 1:N of the real spacecraft. */
    scaleDenominator: ScaleDenominatorSchema,
    sheetSizeId: z.enum(limits.sheetSizeIds as [S, ...S[]], {
      errorMap: () => ({ message: `the sheet must be one of ${limits.sheetSizeIds.join(', ')}` }),
    }),
    /** Paper weight, g/m². */
    paperGsm: PaperGsmSchema,
    /** Kits for the class: one per team. */
    copies: z
      .number({ invalid_type_error: 'copies must be a number' })
      .int('copies must be a whole number')
      .min(1, 'copies must be at least 1')
      .max(limits.copiesMax, `copies must be at most ${limits.copiesMax}`),
    units: z.enum(['metric', 'us']),
    venue: venueChoiceSchema(limits.venueIds),
    /** Bed and nozzle of the STL; the standard bed and a 0.4 mm nozzle when left out. */
    print: printChoiceSchema(limits).optional(),
    /** Where the PDF's instructions pages go. */
    instructionsAt: z.enum(INSTRUCTIONS_PLACES, {
      errorMap: () => ({ message: `the instructions go ${INSTRUCTIONS_PLACES.join(' or ')}` }),
    }),
    /** The class the kit is for: the solver's minimums and the substitutes follow it. */
    gradeBand: z.enum(limits.gradeBands as [G, ...G[]], {
      errorMap: () => ({ message: `the grade band must be one of ${limits.gradeBands.join(', ')}` }),
    }),
  });
}

/** The builder form: the settings plus its model, a demo model's id or an imported model's (exactly one). */
export function kitFormSchema<S extends string, V extends string, G extends string>(
  limits: KitSettingsLimits<S, V, G>,
) {
  return kitSettingsSchema(limits)
    .extend({
      /** A demo model, by its id. */
      modelId: z.string().regex(SLUG, 'choose a model').optional(),
      /** An imported model, by its id. */
      importId: z.string().uuid('choose a model').optional(),
    })
    .refine((form) => (form.modelId === undefined) !== (form.importId === undefined), {
      message: 'choose a model',
      path: ['modelId'],
    });
}
export type KitForm = z.infer<ReturnType<typeof kitFormSchema<string, string, string>>>;
export type KitVenueChoice = KitForm['venue'];
