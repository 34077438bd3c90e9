/**
 * What a teacher asks for when generating a kit: a model, a scale, a sheet, paper weight, copies, units and
 * the kit page the QR code points at (none before the kit is saved). Validated once at the boundary (API route
 * or island).
 */
import { z } from 'zod';
import { KitTitleSchema } from './kit-settings';
import { ModelSchema } from '../geometry/model-schema';
import { PAPER_GSM_DEFAULT } from '../geometry/paper';
import { PaperGsmSchema, ScaleDenominatorSchema } from '../geometry/pattern-option-schemas';
import { PRINT_CHOICE_DEFAULT, PRINT_CHOICE_LIMITS, type PrintChoice } from '../layout/print-plate';
import { SHEET_SIZE_IDS } from '../layout/sheet-sizes';
import { INSTRUCTIONS_PLACE_DEFAULT, INSTRUCTIONS_PLACES, printChoiceSchema } from './kit-settings';
import { BUILD_GRADE_BAND_DEFAULT, BUILD_GRADE_BANDS } from '../geometry/buildability';

/** Kits per class: one per team; 40 teams is more than any class has (common practice, no source). */
export const KIT_COPIES_MAX = 40;

export const KitRequestSchema = z.object({
  /** The spacecraft, in real metres. */
  model: ModelSchema,
  /** Title printed on every sheet; the model's name when left out. */
  title: KitTitleSchema.optional(),
  /** The kit is 1:N of the real spacecraft; N ≥ 1. */
  scaleDenominator: ScaleDenominatorSchema,
  /** Paper or stock: a5, a4, a3, letter, legal, tabloid or panel-1220x2440. */
  sheetSizeId: z.enum(SHEET_SIZE_IDS),
  /** Paper weight in g/m², which sets tab widths and fold allowances. */
  paperGsm: PaperGsmSchema.default(PAPER_GSM_DEFAULT),
  /** Kits per class (one per team). */
  copies: z
    .number()
    .int('copies must be a whole number')
    .min(1, 'copies must be at least 1')
    .max(KIT_COPIES_MAX, `copies must be at most ${KIT_COPIES_MAX}`)
    .default(1),
  /** Where the PDF's instructions pages go: before the sheets or after them. */
  instructionsAt: z.enum(INSTRUCTIONS_PLACES).default(INSTRUCTIONS_PLACE_DEFAULT),
  /** Units for printed sizes and the check square. */
  units: z.enum(['metric', 'us']).default('metric'),
  /** The class the kit is for: anchor sizes, substitutes for parts too fine for paper, and label sizes follow it. */
  gradeBand: z.enum(BUILD_GRADE_BANDS).default(BUILD_GRADE_BAND_DEFAULT),
  /** The kit page the first sheet's QR code links to; null for an unsaved kit, whose sheets print a note instead. */
  qrUrl: z.string().url('qrUrl must be an absolute URL').max(300).nullable(),
  /** The STL's print bed and nozzle. */
  print: printChoiceSchema(PRINT_CHOICE_LIMITS)
    .transform((v) => v as PrintChoice)
    .default(PRINT_CHOICE_DEFAULT),
});
export type KitRequest = z.infer<typeof KitRequestSchema>;
export type KitRequestInput = z.input<typeof KitRequestSchema>;
