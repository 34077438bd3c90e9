/**
 * The model description: a spacecraft in real metres, a body and its appendages, versioned so stored kits
 * keep working when the schema grows. Types come from the schema (z.infer) so they cannot drift.
 */
import { z } from 'zod';
import { TextSchema } from '../text-schema';
import { refineValid } from '../validation';
import { BodySchema, lengthM } from './body-schema';
import { bodyFaceSizesM } from './body-shape';
import { isMeshShape, type MeshShape } from '../mesh/mesh-types';

export {
  BodySchema,
  CYLINDER_FACETS_MAX,
  CYLINDER_FACETS_MIN,
  MODEL_LENGTH_MAX_M,
  PRISM_SIDES_MAX,
  PRISM_SIDES_MIN,
  SMALLSAT_SIZES,
  type Body,
} from './body-schema';

export const MODEL_SCHEMA_VERSION = 1;
export const APPENDAGES_MAX = 64;
/** Tilt of a boom, dish or nozzle away from its face's outward normal, degrees (below 90 so it leaves the face). */
export const APPENDAGE_TILT_MAX_DEG = 80;
/** Most probes on one launch adapter in a stack model. */
export const STACK_PROBES_MAX = 8;
/** Wall facets of a stack's separation rings and adapter: few enough for a one-piece paper net. */
export const STACK_DRUM_FACETS = 8;
const degrees = (what: string, min: number, max: number) =>
  z
    .number({ invalid_type_error: `${what} must be a number of degrees` })
    .finite(`${what} must be finite`)
    .min(min, `${what} must be at least ${min}°`)
    .max(max, `${what} must be at most ${max}°`);

/** A body face: the top, the bottom, or side wall i (0-based, side 0 faces +x). */
export const FaceRefSchema = z
  .string()
  .regex(/^(top|bottom|side:\d{1,3})$/, 'face must be "top", "bottom" or "side:<number>"');

const AppendageBase = {
  id: z.string().regex(/^[a-z0-9][a-z0-9-]{0,39}$/, 'id must be 1–40 lower-case letters, digits or dashes'),
  label: TextSchema.trim().min(1, 'label is missing').max(60, 'label must be at most 60 characters'),
  face: FaceRefSchema,
  /** Offset from the face centre in the face's own axes (u along the face, v up or across), metres. */
  position: z.object({ uM: z.number().finite(), vM: z.number().finite() }).default({ uM: 0, vM: 0 }),
};
/** Direction away from the face: tilt from the outward normal, azimuth about it from the face's u axis. */
const OrientationSchema = z
  .object({
    tiltDeg: degrees('tilt', 0, APPENDAGE_TILT_MAX_DEG),
    azimuthDeg: degrees('azimuth', -360, 360),
  })
  .default({ tiltDeg: 0, azimuthDeg: 0 });

const AppendageSchema = z.discriminatedUnion('kind', [
  z.object({
    ...AppendageBase,
    kind: z.literal('rigid-boom'),
    orientation: OrientationSchema,
    lengthM: lengthM('the boom length'),
    diameterM: lengthM('the boom diameter'),
  }),
  z.object({
    ...AppendageBase,
    kind: z.literal('wire-boom'),
    orientation: OrientationSchema,
    lengthM: lengthM('the wire boom length'),
  }),
  z.object({
    ...AppendageBase,
    kind: z.literal('dish'),
    orientation: OrientationSchema,
    diameterM: lengthM('the dish diameter'),
    depthM: lengthM('the dish depth'),
    innerDiameterM: lengthM('the dish inner diameter').optional(),
  }),
  z.object({
    ...AppendageBase,
    kind: z.literal('nozzle'),
    orientation: OrientationSchema,
    throatDiameterM: lengthM('the nozzle throat diameter'),
    exitDiameterM: lengthM('the nozzle exit diameter'),
    lengthM: lengthM('the nozzle length'),
  }),
  z.object({
    ...AppendageBase,
    kind: z.literal('solar-panel'),
    widthM: lengthM('the panel width'),
    heightM: lengthM('the panel height'),
  }),
  z.object({
    ...AppendageBase,
    kind: z.literal('deployable-panel'),
    widthM: lengthM('the panel width (along the hinge)'),
    heightM: lengthM('the panel height (away from the hinge)'),
    hingeEdge: z.enum(['top', 'bottom', 'left', 'right']),
    /** 0 = folded flat against the face, 90 = standing straight out, 180 = in line with the face. */
    deployAngleDeg: degrees('the deploy angle', 0, 180).default(90),
  }),
]);

/** A short round part of a launch stack (separation ring, adapter), drawn as a STACK_DRUM_FACETS-sided drum. */
const StackDrumSchema = (what: string) =>
  z.object({ heightM: lengthM(`the ${what} height`), diameterM: lengthM(`the ${what} diameter`) });

/**
 * A launch stack: `count` copies of the model's body stacked on one launch adapter, a separation ring under
 * each; the probes ride stowed, so a stack model has no appendages. See launch-stack.ts.
 */
export const LaunchStackSchema = z.object({
  count: z
    .number()
    .int('the number of probes must be a whole number')
    .min(1, 'a stack needs at least 1 probe')
    .max(STACK_PROBES_MAX, `a stack holds at most ${STACK_PROBES_MAX} probes`),
  ring: StackDrumSchema('separation ring'),
  adapter: StackDrumSchema('adapter'),
});
export type LaunchStack = z.infer<typeof LaunchStackSchema>;

/** The cross-field checks walk every face (a count bounded above) and appendage: they run only on a bounded model. */
export const ModelSchema = refineValid(
  z.object({
    schemaVersion: z.literal(MODEL_SCHEMA_VERSION, {
      errorMap: () => ({ message: `schemaVersion must be ${MODEL_SCHEMA_VERSION}` }),
    }),
    name: TextSchema.trim().min(1, 'name is missing').max(80, 'name must be at most 80 characters'),
    body: BodySchema,
    appendages: z
      .array(AppendageSchema)
      .max(APPENDAGES_MAX, `a model has at most ${APPENDAGES_MAX} appendages`)
      .default([]),
    /** Present for a launch stack of identical probes (their body) on an adapter. */
    stack: LaunchStackSchema.optional(),
    /**
     * Present for an imported mesh (src/lib/mesh/mesh-model.ts): the body is then the mesh's bounding box and the
     * pieces and solid come from the mesh. Only the server puts one here, from an upload; JSON cannot hold one.
     */
    mesh: z
      .custom<MeshShape>(isMeshShape, 'a model cannot carry a mesh: upload the file and send its importId')
      .optional(),
  }),
  (model, ctx) => {
    if (model.stack && model.appendages.length > 0) {
      ctx.addIssue({
        code: 'custom',
        path: ['appendages'],
        message: 'a launch stack carries its probes stowed: leave the appendages out of a stack model',
      });
    }
    const faces = bodyFaceSizesM(model.body);
    const seen = new Set<string>();
    model.appendages.forEach((a, i) => {
      if (seen.has(a.id))
        ctx.addIssue({ code: 'custom', path: ['appendages', i, 'id'], message: `id "${a.id}" is used twice` });
      seen.add(a.id);
      if (a.kind === 'dish' && a.innerDiameterM !== undefined && a.innerDiameterM >= a.diameterM) {
        ctx.addIssue({
          code: 'custom',
          path: ['appendages', i, 'innerDiameterM'],
          message: `the dish inner diameter (${a.innerDiameterM} m) must be smaller than its diameter (${a.diameterM} m)`,
        });
      }
      if (a.kind === 'nozzle' && a.throatDiameterM >= a.exitDiameterM) {
        ctx.addIssue({
          code: 'custom',
          path: ['appendages', i, 'exitDiameterM'],
          message: `the nozzle exit (${a.exitDiameterM} m) must be wider than its throat (${a.throatDiameterM} m)`,
        });
      }
      const face = faces.get(a.face);
      if (!face) {
        ctx.addIssue({
          code: 'custom',
          path: ['appendages', i, 'face'],
          message: `face "${a.face}" does not exist: this body has top, bottom and side:0 to side:${faces.size - 3}`,
        });
        return;
      }
      if (a.kind === 'deployable-panel' && !a.face.startsWith('side:')) {
        ctx.addIssue({
          code: 'custom',
          path: ['appendages', i, 'face'],
          message: 'a deployable panel hinges on a side wall (side:<number>)',
        });
      }
      if (
        face.kind === 'side' &&
        (Math.abs(a.position.uM) > face.widthM / 2 || Math.abs(a.position.vM) > face.heightM / 2)
      ) {
        ctx.addIssue({
          code: 'custom',
          path: ['appendages', i, 'position'],
          message: `position must lie on ${a.face}, within ±${round(face.widthM / 2)} m along and ±${round(face.heightM / 2)} m up from its centre`,
        });
      }
      if (face.kind === 'cap' && Math.hypot(a.position.uM, a.position.vM) > face.inRadiusM) {
        ctx.addIssue({
          code: 'custom',
          path: ['appendages', i, 'position'],
          message: `position must lie on ${a.face}, within ${round(face.inRadiusM)} m of its centre`,
        });
      }
    });
  },
);

export type Model = z.infer<typeof ModelSchema>;
export type ModelInput = z.input<typeof ModelSchema>;
export type Appendage = Model['appendages'][number];
export type AppendageKind = Appendage['kind'];

/** A model content file: the model with the words shown in the library. */
export const ModelContentSchema = z.object({
  id: z.string().regex(/^[a-z0-9-]+$/, 'id must be lower-case letters, digits or dashes'),
  title: z.string().min(1),
  summary: z.string().min(1),
  model: ModelSchema,
});
export type ModelContent = z.infer<typeof ModelContentSchema>;

function round(valueM: number): number {
  return Math.round(valueM * 1000) / 1000;
}
