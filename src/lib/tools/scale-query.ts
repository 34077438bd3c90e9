/**
 * The scale tool's GET form (/tools/scale?model=…&sheet=…): the query parameters read with one zod schema
 * into a solver request, or field errors keyed by parameter name. Blank parameters take the defaults, so
 * the page without a query shows a worked example.
 */
import { z } from 'zod';
import { TextSchema } from '../text-schema';
import { PAPER_GSM_DEFAULT } from '../geometry/paper';
import { PaperGsmSchema } from '../geometry/pattern-option-schemas';
import { SHEET_SIZE_IDS } from '../layout/sheet-sizes';
import { CustomVenueSchema, VENUES, venueCustom, type Venue, type VenueId } from '../layout/venues';
import { zodFieldErrors } from '../validation';

const VENUE_IDS = Object.keys(VENUES) as [VenueId, ...VenueId[]];
const blankToUndefined = (v: unknown) => (v === '' || v === null ? undefined : v);
const num = (schema: z.ZodNumber) =>
  z.preprocess((v) => (blankToUndefined(v) === undefined ? undefined : Number(v)), schema.optional());

/** The form's fields; defaults give the Skein probe on Letter in a classroom. */
export const ScaleQuerySchema = z
  .object({
    model: z.preprocess(blankToUndefined, TextSchema.max(60).default('skein-probe')),
    sheet: z.preprocess(blankToUndefined, z.enum(SHEET_SIZE_IDS).default('letter')),
    gsm: z.preprocess(
      (v) => (blankToUndefined(v) === undefined ? undefined : Number(v)),
      PaperGsmSchema.default(PAPER_GSM_DEFAULT),
    ),
    venue: z.preprocess(blankToUndefined, z.enum([...VENUE_IDS, 'custom']).default('classroom')),
    lengthM: num(CustomVenueSchema.shape.lengthM),
    widthM: num(CustomVenueSchema.shape.widthM),
    units: z.preprocess(blankToUndefined, z.enum(['metric', 'us']).default('metric')),
  })
  .superRefine((q, ctx) => {
    if (q.venue !== 'custom') return;
    if (q.lengthM === undefined)
      ctx.addIssue({ code: 'custom', path: ['lengthM'], message: 'give the length in metres' });
    if (q.widthM === undefined) ctx.addIssue({ code: 'custom', path: ['widthM'], message: 'give the width in metres' });
  });
export type ScaleQuery = z.infer<typeof ScaleQuerySchema>;

/** Reads the query string; field errors (by parameter name) instead of a request when a value cannot be used. */
export function scaleQueryParse(params: URLSearchParams): {
  query: ScaleQuery | null;
  fields: Record<string, string[]>;
} {
  const raw = Object.fromEntries(Object.keys(ScaleQuerySchema._def.schema.shape).map((k) => [k, params.get(k)]));
  const parsed = ScaleQuerySchema.safeParse(raw);
  if (parsed.success) return { query: parsed.data, fields: {} };
  return { query: null, fields: zodFieldErrors(parsed.error) };
}

/** The venue a parsed query names: a preset, or the custom floor of its length and width. */
export function scaleQueryVenue(query: ScaleQuery): Venue {
  return query.venue === 'custom'
    ? venueCustom({ lengthM: query.lengthM!, widthM: query.widthM! })
    : VENUES[query.venue as VenueId];
}
