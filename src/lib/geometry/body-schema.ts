/**
 * The body of a model (prism, box or cylinder) in real metres: its own module so body-shape.ts can read the
 * Body type while model-schema.ts checks faces with body-shape.ts, without the two importing each other.
 */
import { z } from 'zod';
import { refineValid } from '../validation';

export const PRISM_SIDES_MIN = 3;
export const PRISM_SIDES_MAX = 24;
export const CYLINDER_FACETS_MIN = 6;
export const CYLINDER_FACETS_MAX = 256;
/** Longest length accepted anywhere in a model, m (generous: the longest real wire booms are ~50 m). */
export const MODEL_LENGTH_MAX_M = 1000;
/** Small-satellite sizes with their 10 cm unit; see SMALLSAT_SIZES_M in body-shape.ts. */
export const SMALLSAT_SIZES = ['1U', '2U', '3U', '6U', '12U'] as const;

/** A real length in metres: finite, above zero, below MODEL_LENGTH_MAX_M. */
export const lengthM = (what: string) =>
  z
    .number({ required_error: `${what} is missing`, invalid_type_error: `${what} must be a number of metres` })
    .finite(`${what} must be a finite number of metres`)
    .positive(`${what} must be more than 0 m`)
    .max(MODEL_LENGTH_MAX_M, `${what} must be at most ${MODEL_LENGTH_MAX_M} m`);

const PrismBodySchema = z.object({
  kind: z.literal('prism'),
  /** Number of side walls of the regular polygon. */
  sides: z
    .number()
    .int('sides must be a whole number')
    .min(PRISM_SIDES_MIN, `a prism needs at least ${PRISM_SIDES_MIN} sides`)
    .max(PRISM_SIDES_MAX, `a prism has at most ${PRISM_SIDES_MAX} sides; use a cylinder for more`),
  /** Whether sizeM is measured between opposite flats or opposite corners. */
  across: z.enum(['flats', 'corners']),
  sizeM: lengthM('the prism size'),
  heightM: lengthM('the body height'),
});

const BoxBodySchema = z.object({
  kind: z.literal('box'),
  /** A small-satellite size instead of widthM/depthM/heightM. */
  smallsat: z
    .enum(SMALLSAT_SIZES, { errorMap: () => ({ message: `smallsat must be one of ${SMALLSAT_SIZES.join(', ')}` }) })
    .optional(),
  widthM: lengthM('the box width (x)').optional(),
  depthM: lengthM('the box depth (y)').optional(),
  heightM: lengthM('the box height (z)').optional(),
});

const CylinderBodySchema = z.object({
  kind: z.literal('cylinder'),
  diameterM: lengthM('the cylinder diameter'),
  heightM: lengthM('the body height'),
  /** Flat wall facets standing in for the round wall (corners on the true circle). */
  facets: z
    .number()
    .int('facets must be a whole number')
    .min(CYLINDER_FACETS_MIN, `a cylinder needs at least ${CYLINDER_FACETS_MIN} facets`)
    .max(CYLINDER_FACETS_MAX, `a cylinder has at most ${CYLINDER_FACETS_MAX} facets`),
});

export const BodySchema = refineValid(
  z.discriminatedUnion('kind', [PrismBodySchema, BoxBodySchema, CylinderBodySchema]),
  (b, ctx) => {
    if (b.kind !== 'box') return;
    const dims = [b.widthM, b.depthM, b.heightM].filter((d) => d !== undefined).length;
    if ((b.smallsat !== undefined) === dims > 0 || (b.smallsat === undefined && dims < 3)) {
      ctx.addIssue({
        code: 'custom',
        message: 'a box needs either a smallsat size (e.g. "3U") or all of widthM, depthM and heightM, not both',
      });
    }
  },
);

export type Body = z.infer<typeof BodySchema>;
