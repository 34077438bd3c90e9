/**
 * Queries on imported_models: meshes uploaded as OBJ or STL (migration 20261205180000). Who may see or change
 * one is decided here: its owner, every account when a coordinator shared it, coordinators and admins always.
 * Lists leave the mesh bytes out; a missing or hidden model is null and the route answers 404.
 */
import type { Knex } from 'knex';
import type { Actor } from '../actor';
import { isUuid } from './accounts';
import { db } from './knex';

export interface ImportedModelRow {
  id: string;
  owner_id: string | null;
  title: string;
  file_name: string;
  file_kind: 'stl' | 'obj';
  file_bytes: number;
  storage_key: string;
  unit: 'mm' | 'cm' | 'm' | 'in';
  unit_guess: 'mm' | 'cm' | 'm' | 'in';
  shared: boolean;
  triangle_count: number;
  face_count: number;
  extents: [number, number, number];
  findings: Record<string, number>;
  repairs: string[];
  reduced_triangle_count: number | null;
  mesh_digest: string;
  created_at: Date;
  updated_at: Date;
  /** The owner's display name (joined), null once the account is gone. */
  owner_name: string | null;
  /** Saved kits built from it (importedModelKitId). */
  kit_count: number;
}

/** The mesh bytes of a row: the repaired mesh and, when asked for, the reduced one. */
export interface ImportedModelMeshRow {
  mesh: Buffer;
  reduced_mesh: Buffer | null;
  mesh_digest: string;
  unit: ImportedModelRow['unit'];
  title: string;
}

export type ImportedModelInsert = Omit<
  ImportedModelRow,
  'created_at' | 'updated_at' | 'owner_name' | 'kit_count' | 'reduced_triangle_count' | 'shared'
> & { mesh: Buffer };

const LIST_COLUMNS = [
  'm.id',
  'm.owner_id',
  'm.title',
  'm.file_name',
  'm.file_kind',
  'm.file_bytes',
  'm.storage_key',
  'm.unit',
  'm.unit_guess',
  'm.shared',
  'm.triangle_count',
  'm.face_count',
  'm.extents',
  'm.findings',
  'm.repairs',
  'm.reduced_triangle_count',
  'm.mesh_digest',
  'm.created_at',
  'm.updated_at',
  'u.display_name as owner_name',
];

/** Rows the actor may see: accounts see their own and the shared ones; coordinators and admins see all. */
function visibleTo(actor: Actor, trx: Knex) {
  const q = trx('imported_models as m')
    .leftJoin('users as u', 'u.id', 'm.owner_id')
    .select(LIST_COLUMNS)
    .select(trx.raw("(SELECT count(*) FROM kits k WHERE k.model_id = 'import:' || m.id::text)::int AS kit_count"));
  if (actor.kind === 'user' && (actor.role === 'coordinator' || actor.role === 'admin')) return q;
  if (actor.kind === 'user') return q.where((w) => w.where('m.owner_id', actor.userId).orWhere('m.shared', true));
  if (actor.kind === 'class') return q.where('m.shared', true);
  return q.whereRaw('false');
}

/** The imported models the actor may see, newest first (at most `limit`). */
export async function importedModelsVisible(
  actor: Actor,
  limit: number,
  trx: Knex = db(),
): Promise<ImportedModelRow[]> {
  return visibleTo(actor, trx).orderBy('m.created_at', 'desc').orderBy('m.id').limit(limit);
}

/** The imported model if the actor may see it, else null (also for a malformed id). */
export async function importedModelVisible(
  actor: Actor,
  id: string,
  trx: Knex = db(),
): Promise<ImportedModelRow | null> {
  if (!isUuid(id)) return null;
  return (await visibleTo(actor, trx).where('m.id', id).first()) ?? null;
}

/** The mesh bytes of a model, whoever asks (callers check access first), or null. */
export async function importedModelMesh(id: string, trx: Knex = db()): Promise<ImportedModelMeshRow | null> {
  if (!isUuid(id)) return null;
  return (
    (await trx('imported_models')
      .where({ id })
      .first<ImportedModelMeshRow | undefined>('mesh', 'reduced_mesh', 'mesh_digest', 'unit', 'title')) ?? null
  );
}

/** Inserts a checked upload; returns its id. */
export async function importedModelInsert(row: ImportedModelInsert, trx: Knex = db()): Promise<string> {
  const [inserted] = await trx('imported_models')
    .insert({
      ...row,
      extents: JSON.stringify(row.extents),
      findings: JSON.stringify(row.findings),
      repairs: JSON.stringify(row.repairs),
    })
    .returning<{ id: string }[]>('id');
  return inserted!.id;
}

export interface ImportedModelPatch {
  title?: string;
  unit?: ImportedModelRow['unit'];
  shared?: boolean;
  /** A reduced mesh and its triangle count and digest, or null to go back to the full mesh. */
  reduced?: { mesh: Buffer; triangleCount: number; digest: string } | { mesh: null; digest: string };
}

/** Applies a change; returns false when the row is gone. */
export async function importedModelUpdate(id: string, patch: ImportedModelPatch, trx: Knex = db()): Promise<boolean> {
  const set: Record<string, unknown> = { updated_at: trx.fn.now() };
  if (patch.title !== undefined) set.title = patch.title;
  if (patch.unit !== undefined) set.unit = patch.unit;
  if (patch.shared !== undefined) set.shared = patch.shared;
  if (patch.reduced) {
    set.reduced_mesh = patch.reduced.mesh;
    set.reduced_triangle_count = patch.reduced.mesh ? patch.reduced.triangleCount : null;
    set.mesh_digest = patch.reduced.digest;
  }
  return (await trx('imported_models').where({ id }).update(set)) > 0;
}

/** Deletes the row; returns its storage key, or null when it was gone. */
export async function importedModelDelete(id: string, trx: Knex = db()): Promise<string | null> {
  const [row] = await trx('imported_models').where({ id }).delete().returning<{ storage_key: string }[]>('storage_key');
  return row?.storage_key ?? null;
}

/** The model_id a kit built from an imported model stores. */
export function importedModelKitId(id: string): string {
  return `import:${id}`;
}
