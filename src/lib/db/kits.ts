/**
 * Queries on kits: a model at a scale on a sheet size for one class, kept as the validated inputs, the
 * engine version and a content hash (files are rebuilt from the inputs). Who may see which kit is decided
 * here too: a teacher sees only the kits of their own classes, a class session only its class's kits,
 * coordinators and admins every kit. A missing or hidden kit is null; the route answers 404.
 */
import type { Knex } from 'knex';
import type { Actor } from '../auth/actor';
import type { KitInputs } from '../kit/kit-inputs';
import { isUuid } from './accounts';
import { db } from './knex';

/** What a saved kit keeps to rebuild its files exactly: the inputs as validated and the QR code's URL. */
export type KitStoredInputs = KitInputs & { qrUrl: string };

export interface KitRow {
  id: string;
  class_id: string;
  teacher_id: string;
  title: string;
  model_id: string;
  activity_slug: string | null;
  inputs: KitStoredInputs;
  engine_version: string;
  content_hash: string;
  sheet_count: number;
  created_at: Date;
  updated_at: Date;
  class_name: string;
}

export interface KitInsert {
  id: string;
  classId: string;
  teacherId: string;
  title: string;
  modelId: string;
  activitySlug: string | null;
  inputs: KitStoredInputs;
  engineVersion: string;
  contentHash: string;
  sheetCount: number;
}

function kitSelect(trx: Knex) {
  return trx('kits')
    .join('classes', 'classes.id', 'kits.class_id')
    .whereNull('classes.archived_at')
    .select('kits.*', 'classes.name as class_name');
}

/** Narrows a kit query to what the actor may see (nothing for anonymous visitors). */
function visibleTo(query: Knex.QueryBuilder, actor: Actor): Knex.QueryBuilder {
  if (actor.kind === 'class') return query.where('kits.class_id', actor.classId);
  if (actor.kind === 'user' && actor.role === 'teacher') return query.where('classes.teacher_id', actor.userId);
  if (actor.kind === 'user') return query;
  return query.whereRaw('false');
}

/** The kit with this id if the actor may see it, else null. */
export async function kitForActor(actor: Actor, id: string, trx: Knex = db()): Promise<KitRow | null> {
  if (!isUuid(id)) return null;
  return ((await visibleTo(kitSelect(trx), actor).where('kits.id', id).first()) as KitRow | undefined) ?? null;
}

/** The kit with this id if the actor is the teacher of its class (only owners change kits), else null. */
export async function kitOwned(actor: Actor, id: string, trx: Knex = db()): Promise<KitRow | null> {
  if (actor.kind !== 'user' || actor.role !== 'teacher') return null;
  return kitForActor(actor, id, trx);
}

/** The kits the actor may see, newest first (a class filter narrows them further). */
export async function kitListForActor(actor: Actor, classId?: string, trx: Knex = db()): Promise<KitRow[]> {
  const query = visibleTo(kitSelect(trx), actor).orderBy('kits.created_at', 'desc').limit(500);
  if (classId !== undefined) {
    if (!isUuid(classId)) return [];
    query.where('kits.class_id', classId);
  }
  return (await query) as KitRow[];
}

/** Inserts a kit with a chosen id (the QR code's URL names the id before the row exists). */
export async function kitInsert(kit: KitInsert, trx: Knex = db()): Promise<void> {
  await trx('kits').insert({
    id: kit.id,
    class_id: kit.classId,
    teacher_id: kit.teacherId,
    title: kit.title,
    model_id: kit.modelId,
    activity_slug: kit.activitySlug,
    inputs: JSON.stringify(kit.inputs),
    engine_version: kit.engineVersion,
    content_hash: kit.contentHash,
    sheet_count: kit.sheetCount,
  });
}

/** Renames a kit: the title shown in lists and (as inputs.title) printed on its sheets. */
export async function kitRename(
  id: string,
  title: string,
  inputs: KitStoredInputs,
  contentHash: string,
  trx: Knex = db(),
) {
  await trx('kits')
    .where({ id })
    .update({ title, inputs: JSON.stringify(inputs), content_hash: contentHash, updated_at: trx.fn.now() });
}

/** Deletes a kit; true when a row went. */
export async function kitDelete(id: string, trx: Knex = db()): Promise<boolean> {
  return (await trx('kits').where({ id }).delete()) > 0;
}

/** The kit with this id whoever asks (for an event's plan, whose access the event decides), else null. */
export async function kitById(id: string, trx: Knex = db()): Promise<KitRow | null> {
  if (!isUuid(id)) return null;
  return ((await kitSelect(trx).where('kits.id', id).first()) as KitRow | undefined) ?? null;
}
