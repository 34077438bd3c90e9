/**
 * Server adapter for imported models: an OBJ or STL upload is streamed in (one file, 20 MB), checked and
 * repaired in the worker pool, its original kept in upload storage and its repaired mesh in imported_models;
 * then listed, changed (title, unit, sharing, reduction), summarised as a kit and deleted. Who may see a model
 * is decided by src/lib/db/imported-models.ts; who may change one here: its owner, coordinators and admins.
 */
import { randomUUID } from 'node:crypto';
import type { Actor } from '../actor';
import { auditRecord, type AuditAction } from '../db/audit';
import {
  importedModelDelete,
  importedModelInsert,
  importedModelMesh,
  importedModelsVisible,
  importedModelUpdate,
  importedModelVisible,
  type ImportedModelPatch,
  type ImportedModelRow,
} from '../db/imported-models';
import { ConflictError, ForbiddenError, InputError, NotFoundError } from '../errors';
import type { MeshKitSummary } from '../kit/mesh-kit-summary';
import { meshDecode, meshEncode } from '../mesh/mesh-binary';
import { MESH_FILE_BYTES_MAX } from '../mesh/mesh-limits';
import { meshFileKind } from '../mesh/mesh-parse';
import type { MeshImported } from '../mesh/mesh-prepare';
import type { MeshSimplified } from '../mesh/mesh-simplify';
import { MESH_UNITS, meshRealSizeM } from '../mesh/mesh-units';
import { appStorage } from '../storage/storage.server';
import { multipartRead } from '../upload/multipart-read.server';
import { parseInput } from '../validation';
import { workRun } from '../work/work-pool.server';
import {
  IMPORTED_MODELS_LISTED_MAX,
  IMPORTED_MODEL_TITLE_MAX,
  ImportedModelTitleSchema,
  type ImportedModelChange,
  type ImportedModelView,
} from './imported-model-inputs';
import { meshDigest, modelResolve } from './model-source.server';
import type { z } from 'zod';
import type { MeshKitSummaryRequestSchema } from './imported-model-inputs';

/** The form field of the mesh file, and of its optional title. */
export const MESH_FILE_FIELD = 'file';
export const MESH_TITLE_FIELD = 'title';
/** Room for the form's framing and title beside the file, bytes. */
const UPLOAD_FRAMING_BYTES = 64_000;

const NOT_FOUND = 'There is no imported model with that id among the models you can see.';

function canChange(actor: Actor, row: ImportedModelRow): boolean {
  if (actor.kind !== 'user') return false;
  return actor.role === 'coordinator' || actor.role === 'admin' || row.owner_id === actor.userId;
}

/** A row as the API answers it. */
export function importedModelView(actor: Actor, row: ImportedModelRow): ImportedModelView {
  return {
    id: row.id,
    title: row.title,
    fileName: row.file_name,
    fileKind: row.file_kind,
    fileBytes: row.file_bytes,
    unit: row.unit,
    unitGuess: row.unit_guess,
    extents: row.extents,
    sizeByUnitM: Object.fromEntries(
      MESH_UNITS.map((u) => [u, meshRealSizeM(row.extents, u)]),
    ) as ImportedModelView['sizeByUnitM'],
    shared: row.shared,
    ownerName: row.owner_name,
    canChange: canChange(actor, row),
    triangleCount: row.triangle_count,
    faceCount: row.face_count,
    reducedTriangleCount: row.reduced_triangle_count,
    findings: row.findings as unknown as ImportedModelView['findings'],
    repairs: row.repairs,
    kitCount: row.kit_count,
    createdAt: new Date(row.created_at).toISOString(),
  };
}

/** The models the actor may see, newest first. */
export async function importedModelList(actor: Actor): Promise<ImportedModelView[]> {
  return (await importedModelsVisible(actor, IMPORTED_MODELS_LISTED_MAX)).map((row) => importedModelView(actor, row));
}

/** The model if the actor may see it; 404 otherwise. */
export async function importedModelFind(actor: Actor, id: string): Promise<ImportedModelRow> {
  const row = await importedModelVisible(actor, id);
  if (!row) throw new NotFoundError(NOT_FOUND);
  return row;
}

/** The model and the account changing it, when the actor may change it; 404 or 403 otherwise. */
async function changeable(actor: Actor, id: string): Promise<{ row: ImportedModelRow; userId: string }> {
  const row = await importedModelFind(actor, id);
  if (actor.kind !== 'user' || !canChange(actor, row))
    throw new ForbiddenError('Only its owner, a coordinator or an admin may change this model.');
  return { row, userId: actor.userId };
}

/** "2 saved kits are built from this model": why a model in use keeps its shape. */
function kitsUsing(row: ImportedModelRow): string {
  return `${row.kit_count} saved kit${row.kit_count === 1 ? ' is' : 's are'} built from this model`;
}

function modelAudit(userId: string, action: AuditAction, id: string, details?: Record<string, unknown>) {
  return auditRecord({ actorId: userId, action, targetType: 'imported_model', targetId: id, details });
}

/**
 * Reads an upload (multipart: the file in "file", an optional "title"), checks it in the worker pool and keeps
 * it; 400 naming the first problem of a file paper cannot fold, 413 past 20 MB. Answers the new model.
 */
export async function importedModelUpload(actor: Actor, request: Request): Promise<ImportedModelView> {
  if (actor.kind !== 'user') throw new ForbiddenError('Sign in with an account to import a model.');
  const { fields, files } = await multipartRead(
    request,
    {
      fileBytesMax: MESH_FILE_BYTES_MAX,
      filesMax: 1,
      requestBytesMax: MESH_FILE_BYTES_MAX + UPLOAD_FRAMING_BYTES,
      fieldBytesMax: 4 * IMPORTED_MODEL_TITLE_MAX, // UTF-8: at most four bytes a character
      fieldsMax: 4,
      fileNoun: 'mesh file',
    },
    async (part) => {
      if (part.field !== MESH_FILE_FIELD) {
        throw new InputError(`Send the mesh file in the form field "${MESH_FILE_FIELD}", not "${part.field}".`);
      }
      const kind = meshFileKind(part.filename);
      const chunks: Buffer[] = [];
      for await (const chunk of part.stream) chunks.push(chunk as Buffer);
      return { fileName: part.filename, kind, bytes: Buffer.concat(chunks) };
    },
  );
  const file = files[0];
  if (!file) throw new InputError(`Attach a .stl or .obj file in the form field "${MESH_FILE_FIELD}".`);
  if (file.bytes.length === 0) throw new InputError(`"${file.fileName}" is empty (0 bytes).`);
  const titleSent = fields[MESH_TITLE_FIELD]?.[0]?.trim();
  const title = parseInput(
    ImportedModelTitleSchema,
    titleSent || file.fileName.replace(/\.[^.]*$/, '').slice(0, IMPORTED_MODEL_TITLE_MAX) || 'Imported model',
    'title',
  );
  const imported = (await workRun({ kind: 'mesh-import', bytes: file.bytes, fileName: file.fileName })) as MeshImported;
  const id = randomUUID();
  const storageKey = `models/${id}/original.${file.kind}`;
  const mesh = Buffer.from(meshEncode(imported.mesh));
  await appStorage().put(storageKey, file.bytes, { contentType: 'application/octet-stream' });
  try {
    await importedModelInsert({
      id,
      owner_id: actor.userId,
      title,
      file_name: file.fileName.slice(0, 200),
      file_kind: file.kind,
      file_bytes: file.bytes.length,
      storage_key: storageKey,
      unit: imported.unitGuess,
      unit_guess: imported.unitGuess,
      triangle_count: imported.mesh.triangles.length / 3,
      face_count: imported.faceCount,
      extents: imported.extents,
      findings: imported.findings as unknown as Record<string, number>,
      repairs: imported.repairs,
      mesh,
      mesh_digest: meshDigest(mesh),
    });
  } catch (err) {
    await appStorage().delete(storageKey);
    throw err;
  }
  return importedModelView(actor, await importedModelFind(actor, id));
}

/** Applies a change the actor may make; unit and reduction stay fixed while saved kits are built from the model. */
export async function importedModelChange(
  actor: Actor,
  id: string,
  change: ImportedModelChange,
): Promise<ImportedModelView> {
  const { row, userId } = await changeable(actor, id);
  const patch: ImportedModelPatch = { title: change.title, unit: change.unit };
  if (change.shared !== undefined && change.shared !== row.shared) {
    if (actor.kind !== 'user' || (actor.role !== 'coordinator' && actor.role !== 'admin'))
      throw new ForbiddenError('Only a coordinator or an admin may share a model with every account.');
    patch.shared = change.shared;
  }
  const reshapes = (change.unit !== undefined && change.unit !== row.unit) || change.reduceToTriangles !== undefined;
  if (reshapes && row.kit_count > 0) {
    throw new ConflictError(
      `${kitsUsing(row)}, so its unit and triangle count stay as they are; import the file again to change them.`,
    );
  }
  if (change.reduceToTriangles !== undefined) {
    const stored = (await importedModelMesh(id))!;
    if (change.reduceToTriangles === null) {
      patch.reduced = { mesh: null, digest: meshDigest(stored.mesh) };
    } else {
      const reduced = (await workRun({
        kind: 'mesh-reduce',
        mesh: meshDecode(stored.mesh),
        targetTriangles: change.reduceToTriangles,
      })) as MeshSimplified;
      const bytes = Buffer.from(meshEncode(reduced.mesh));
      patch.reduced = { mesh: bytes, triangleCount: reduced.trianglesAfter, digest: meshDigest(bytes) };
    }
  }
  await importedModelUpdate(id, patch);
  if (patch.shared !== undefined) await modelAudit(userId, patch.shared ? 'model.shared' : 'model.unshared', id);
  return importedModelView(actor, await importedModelFind(actor, id));
}

/** Deletes a model the actor may change, with its stored file; 409 while saved kits are built from it. */
export async function importedModelRemove(actor: Actor, id: string): Promise<void> {
  const { row, userId } = await changeable(actor, id);
  if (row.kit_count > 0) {
    throw new ConflictError(`${kitsUsing(row)}; delete ${row.kit_count === 1 ? 'it' : 'them'} first.`);
  }
  const key = await importedModelDelete(id);
  if (key) await appStorage().delete(key);
  await modelAudit(userId, 'model.deleted', id, { title: row.title });
}

/** What the model makes as a kit with these settings (the unfold runs in the worker pool). */
export async function importedModelKitSummary(
  actor: Actor,
  id: string,
  settings: z.infer<typeof MeshKitSummaryRequestSchema>,
): Promise<MeshKitSummary> {
  const { model } = await modelResolve(actor, { importId: id }).catch((err: unknown) => {
    if (err instanceof InputError) throw new NotFoundError(NOT_FOUND);
    throw err;
  });
  return (await workRun({ kind: 'mesh-kit-summary', shape: model.mesh!, settings })) as MeshKitSummary;
}
