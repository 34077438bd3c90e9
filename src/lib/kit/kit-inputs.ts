/**
 * What the kit API accepts: the builder's settings (kit-settings.ts, built from the engine limits here) with
 * a demo model id or a whole model, and how those inputs become the engine's KitRequest and Venue.
 */
import { z } from 'zod';
import { ModelSchema, type Model } from '../geometry/model-schema';
import { SCALE_DENOMINATOR_MAX } from '../geometry/pattern-option-schemas';
import { PAPER_GSM_MAX, PAPER_GSM_MIN } from '../geometry/paper';
import { PRINT_CHOICE_LIMITS } from '../layout/print-plate';
import {
  BUILD_GRADE_BAND_DEFAULT,
  BUILD_GRADE_BAND_WORDS,
  BUILD_GRADE_BANDS,
  type BuildGradeBand,
} from '../geometry/buildability';
import { SHEET_SIZE_IDS } from '../layout/sheet-sizes';
import { CustomVenueSchema, VENUES, venueCustom, type Venue, type VenueId } from '../layout/venues';
import { parseInput } from '../validation';
import { KIT_COPIES_MAX, KitRequestSchema, type KitRequest } from './kit-request';
import { INSTRUCTIONS_PLACE_DEFAULT, kitSettingsSchema, type KitSettingsLimits } from './kit-settings';

const VENUE_IDS = Object.keys(VENUES) as [VenueId, ...VenueId[]];

/** Body cap of a request carrying kit inputs, bytes: room for a whole model (ModelSchema's limits) and the settings. */
export const KIT_REQUEST_BYTES_MAX = 200_000;

/** The engine's limits, in the serialisable shape the builder island receives as props. */
export const KIT_SETTINGS_LIMITS: KitSettingsLimits<(typeof SHEET_SIZE_IDS)[number], VenueId, BuildGradeBand> = {
  scaleDenominatorMax: SCALE_DENOMINATOR_MAX,
  paperGsmMin: PAPER_GSM_MIN,
  paperGsmMax: PAPER_GSM_MAX,
  copiesMax: KIT_COPIES_MAX,
  sheetSizeIds: SHEET_SIZE_IDS,
  venueIds: VENUE_IDS,
  ...PRINT_CHOICE_LIMITS,
  gradeBands: BUILD_GRADE_BANDS,
  gradeBandDefault: BUILD_GRADE_BAND_DEFAULT,
  gradeBandWords: BUILD_GRADE_BAND_WORDS,
};

const KitSettingsBaseSchema = kitSettingsSchema(KIT_SETTINGS_LIMITS);
/**
 * The settings as the API takes them: a request without a grade band is for the default band, one without
 * a place for the instructions (and every kit saved before there was a choice) has them last.
 */
export const KitSettingsSchema = KitSettingsBaseSchema.extend({
  gradeBand: KitSettingsBaseSchema.shape.gradeBand.default(BUILD_GRADE_BAND_DEFAULT),
  instructionsAt: KitSettingsBaseSchema.shape.instructionsAt.default(INSTRUCTIONS_PLACE_DEFAULT),
});

const DemoModelIdSchema = z
  .string()
  .regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, 'modelId must be a demo model id like "skein-probe"');

/** A demo model by id, an imported model by id, or a whole model in real metres: exactly one of the three. */
export const ModelSourceSchema = z.object({
  modelId: DemoModelIdSchema.optional(),
  importId: z.string().uuid('importId must be the id of an imported model').optional(),
  model: ModelSchema.optional(),
});
export type ModelSource = z.infer<typeof ModelSourceSchema>;

function oneModel(value: ModelSource, ctx: z.RefinementCtx): void {
  const sent = [value.modelId, value.importId, value.model].filter((v) => v !== undefined).length;
  if (sent !== 1) {
    ctx.addIssue({
      code: 'custom',
      path: ['modelId'],
      message: 'send exactly one of modelId (a demo model), importId (an imported model) or model',
    });
  }
}

/** Kit inputs: settings plus the model source. */
export const KitInputsSchema = KitSettingsSchema.merge(ModelSourceSchema).superRefine(oneModel);
export type KitInputs = z.infer<typeof KitInputsSchema>;

/** Inputs of POST /api/models/patterns: a model, a scale and a paper weight (sheet optional, for messages). */
export const PatternsRequestSchema = ModelSourceSchema.merge(
  KitSettingsSchema.pick({ scaleDenominator: true, paperGsm: true, gradeBand: true }),
)
  .extend({ sheetSizeId: KitSettingsSchema.shape.sheetSizeId.default('letter') })
  .superRefine(oneModel);

/** Inputs of POST /api/scale/solve: a model, sheet, paper, venue and units; a scale to check is optional. */
export const ScaleSolveRequestSchema = ModelSourceSchema.merge(
  KitSettingsSchema.pick({ sheetSizeId: true, paperGsm: true, units: true, venue: true, gradeBand: true }),
)
  .extend({
    scaleDenominator: KitSettingsSchema.shape.scaleDenominator.optional(),
    ratios: z.enum(['usual', 'any']).default('usual'),
  })
  .superRefine(oneModel);

/** The engine's venue for a parsed venue choice (a custom floor is checked against CustomVenueSchema). */
export function kitVenue(choice: KitInputs['venue']): Venue {
  if (choice.kind === 'preset') return VENUES[choice.id];
  return venueCustom(parseInput(CustomVenueSchema, { lengthM: choice.lengthM, widthM: choice.widthM }, 'venue'));
}

/**
 * The engine request for parsed inputs, the resolved model (with the title it is listed under, printed when
 * the kit has no title of its own) and the URL the QR code points at (null: no page yet).
 */
export function kitRequestOf(
  inputs: Omit<KitInputs, 'modelId' | 'importId' | 'model' | 'venue' | 'instructionsAt'> &
    Partial<Pick<KitInputs, 'instructionsAt'>>,
  resolved: { model: Model; title: string },
  qrUrl: string | null,
): KitRequest {
  return parseInput(
    KitRequestSchema,
    {
      model: resolved.model,
      title: inputs.title ?? resolved.title,
      scaleDenominator: inputs.scaleDenominator,
      sheetSizeId: inputs.sheetSizeId,
      paperGsm: inputs.paperGsm,
      copies: inputs.copies,
      units: inputs.units,
      ...(inputs.print ? { print: inputs.print } : {}),
      gradeBand: inputs.gradeBand,
      ...(inputs.instructionsAt ? { instructionsAt: inputs.instructionsAt } : {}),
      qrUrl,
    },
    'kit',
  );
}
