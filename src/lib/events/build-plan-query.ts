/** The query of a big-build plan: another venue (a preset or a typed size), a scale and the paper. */
import { z } from 'zod';
import { VENUES, type VenueId } from '../layout/venues';

/** Largest 1:N a plan is drawn at (a venue layout smaller than 1:1000 is a classroom kit, not a big build). */
export const BUILD_PLAN_SCALE_MAX = 1000;
const VENUE_IDS = Object.keys(VENUES) as [VenueId, ...VenueId[]];

const metres = (what: string) =>
  z.coerce
    .number({ invalid_type_error: `${what} must be a number of metres, e.g. 50` })
    .finite()
    .positive(`${what} must be more than 0 m`)
    .max(10_000, `${what} must be at most 10 km`);

export const BuildPlanQuerySchema = z
  .object({
    /** A venue preset instead of the event's venue; empty (a form's "the event's venue") is none. */
    venue: z.preprocess(
      (v) => (v === '' ? undefined : v),
      z.enum(VENUE_IDS, { errorMap: () => ({ message: `venue must be one of ${VENUE_IDS.join(', ')}` }) }).optional(),
    ),
    /** A typed venue size instead, m (both or neither). */
    lengthM: metres('lengthM').optional(),
    widthM: metres('widthM').optional(),
    /** The scale 1:N to lay out at; the event's build scale, else the largest that fits. */
    scale: z.coerce
      .number({ invalid_type_error: 'scale must be a whole number N for 1:N' })
      .int('scale must be a whole number N for 1:N')
      .min(1, 'scale must be at least 1 (life size)')
      .max(BUILD_PLAN_SCALE_MAX, `scale must be at most ${BUILD_PLAN_SCALE_MAX}`)
      .optional(),
    paper: z.enum(['letter', 'a4']).default('letter'),
  })
  .strict()
  .refine((q) => (q.lengthM === undefined) === (q.widthM === undefined), {
    message: 'give both lengthM and widthM, or neither',
    path: ['widthM'],
  })
  .refine((q) => !(q.venue && q.lengthM !== undefined), {
    message: 'give a venue preset or a typed size, not both',
    path: ['venue'],
  });
export type BuildPlanQuery = z.infer<typeof BuildPlanQuerySchema>;
