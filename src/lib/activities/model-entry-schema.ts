/**
 * A demo model file (content/models/<id>.json) as the library lists it: id, title and summary are checked;
 * `model` is the geometry engine's business (src/lib/geometry/model-schema.ts) and passes through untouched.
 */
import { z } from 'zod';
import { LibraryEntryBaseSchema } from './activity-schema';

export const ModelEntrySchema = LibraryEntryBaseSchema.extend({
  /** File name without .json; the kit builder's ?model= value. */
  id: z.string().regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, 'a model id is lower-case words joined by hyphens'),
  model: z.unknown(),
}).passthrough();
export type ModelEntry = z.infer<typeof ModelEntrySchema>;
