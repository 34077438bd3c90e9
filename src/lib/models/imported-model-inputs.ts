/**
 * What the imported-model API takes and answers, shared by the routes and the import page's island: the change
 * a teacher or coordinator makes, the kit settings a summary is asked for, and the model as listed.
 */
import { z } from 'zod';
import { TextSchema } from '../text-schema';
import { MESH_UNITS, type MeshUnit } from '../mesh/mesh-units';
import { PaperGsmSchema, ScaleDenominatorSchema } from '../geometry/pattern-option-schemas';
import { SHEET_SIZE_IDS } from '../layout/sheet-sizes';
import { PAPER_GSM_DEFAULT } from '../geometry/paper';
import type { MeshFindings } from '../mesh/mesh-repair';
import type { MeshKitSummary } from '../kit/mesh-kit-summary';

/** Body cap of a change or summary request, bytes. */
export const IMPORTED_MODEL_REQUEST_BYTES_MAX = 4_000;
/** Longest title: a model's name (ModelSchema) is at most 80 characters. */
export const IMPORTED_MODEL_TITLE_MAX = 80;
/** The most imported models a list answers (newest first). */
export const IMPORTED_MODELS_LISTED_MAX = 200;

export const ImportedModelTitleSchema = TextSchema.trim()
  .min(1, 'the title is missing')
  .max(IMPORTED_MODEL_TITLE_MAX, `the title must be at most ${IMPORTED_MODEL_TITLE_MAX} characters`);

export const MeshUnitSchema = z.enum(MESH_UNITS, {
  errorMap: () => ({ message: `unit must be one of ${MESH_UNITS.join(', ')}` }),
});

/** PATCH /api/models/imports/[id]: any of title, unit, shared (coordinators and admins), reduction. */
export const ImportedModelChangeSchema = z
  .object({
    title: ImportedModelTitleSchema.optional(),
    unit: MeshUnitSchema.optional(),
    shared: z.boolean().optional(),
    /** Reduce the mesh to at most this many triangles, or null for the full mesh again. */
    reduceToTriangles: z.number().int('reduceToTriangles must be a whole number').positive().nullable().optional(),
  })
  .strict()
  .refine((v) => Object.keys(v).length > 0, 'send at least one of title, unit, shared, reduceToTriangles');
export type ImportedModelChange = z.infer<typeof ImportedModelChangeSchema>;

/** POST /api/models/imports/[id]/summary: the kit settings the summary is for. */
export const MeshKitSummaryRequestSchema = z.object({
  scaleDenominator: ScaleDenominatorSchema,
  sheetSizeId: z.enum(SHEET_SIZE_IDS).default('letter'),
  paperGsm: PaperGsmSchema.default(PAPER_GSM_DEFAULT),
});

/** An imported model as the API answers it. */
export interface ImportedModelView {
  id: string;
  title: string;
  fileName: string;
  fileKind: 'stl' | 'obj';
  fileBytes: number;
  unit: MeshUnit;
  unitGuess: MeshUnit;
  /** Bounding box in file numbers, and in metres for every unit (the teacher picks the one that looks right). */
  extents: [number, number, number];
  sizeByUnitM: Record<MeshUnit, [number, number, number]>;
  shared: boolean;
  ownerName: string | null;
  /** Whether the asker may change it (owner, coordinator, admin). */
  canChange: boolean;
  triangleCount: number;
  faceCount: number;
  reducedTriangleCount: number | null;
  findings: MeshFindings;
  repairs: string[];
  /** Saved kits built from it: while there are any, unit and reduction stay as they are. */
  kitCount: number;
  createdAt: string;
}

export type { MeshKitSummary };
