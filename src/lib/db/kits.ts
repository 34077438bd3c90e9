/**
 * Queries on kits: a model at a scale on a sheet size for one class, kept as the validated inputs, the
 * engine version and a content hash (files are rebuilt from the inputs). Who may see which kit is decided
 * here too: a teacher sees only the kits of their own classes, a class session only its class's kits,
 * coordinators and admins every kit. A missing or hidden kit is null; the route answers 404.
 */
import type { Knex } from 'knex';
import type { Actor } from '../actor';
import type { KitBuild } from '../kit/build-kit';
import { contentHash } from '../kit/content-hash';
import { ENGINE_VERSION } from '../kit/engine-version';
import type { KitInputs } from '../kit/kit-inputs';
import type { KitRequest } from '../kit/kit-request';
import { linkAddress, linkCodeNew } from '../links/link-code';
import { isUuid } from './accounts';
import { db } from './knex';
import { liveLinkInsert } from './live-links';

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
  /** The title of the imported model the kit is built from (model_id "import:<id>"), else null. */
  imported_model_title: string | null;
}

export interface KitInsert {
  id: string;
  classId: string;
  teacherId: string;
  title: string;
  modelId: string;
  activitySlug: string | null;
  /** The validated inputs; the QR code's URL is added on saving. */
  inputs: KitInputs;
}

/** How a kit is built before it is saved: its engine request for a QR URL, and a build of that request. */
export interface KitSaveBuild {
  requestFor: (qrUrl: string) => KitRequest;
  build: (request: KitRequest) => Promise<KitBuild>;
  /** The public base URL of the /go/ address. */
  siteUrl: string;
}

function kitSelect(trx: Knex) {
  return trx('kits')
    .join('classes', 'classes.id', 'kits.class_id')
    .leftJoin('imported_models', trx.raw("kits.model_id = 'import:' || imported_models.id::text"))
    .whereNull('classes.archived_at')
    .select('kits.*', 'classes.name as class_name', 'imported_models.title as imported_model_title');
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

/**
 * Builds a kit and saves it with its own live link: a code is drawn first so the build prints its /go/CODE
 * address, then one transaction stores the link (titled after the kit, sending /go/CODE to the kit's page as a
 * path, so it follows the site to a new host) and the kit with the hash and sheet count of that build. Should
 * another link hold the drawn code by then, the link takes a fresh one and the hash is taken again for that
 * address, so the stored hash is always the hash of what the kit's files print. Returns the code.
 */
export async function kitInsertWithLink(kit: KitInsert, how: KitSaveBuild, knex: Knex = db()): Promise<string> {
  const drawn = linkCodeNew();
  const request = how.requestFor(linkAddress(how.siteUrl, drawn));
  const build = await how.build(request);
  return knex.transaction(async (trx) => {
    const link = await liveLinkInsert(
      { title: kit.title, target: `/kits/${kit.id}`, createdBy: kit.teacherId, code: drawn },
      trx,
    );
    const qrUrl = linkAddress(how.siteUrl, link.code);
    const hash = link.code === drawn ? build.contentHash : await contentHash({ ...request, qrUrl });
    await trx('kits').insert({
      id: kit.id,
      class_id: kit.classId,
      teacher_id: kit.teacherId,
      title: kit.title,
      model_id: kit.modelId,
      activity_slug: kit.activitySlug,
      inputs: JSON.stringify({ ...kit.inputs, qrUrl }),
      engine_version: ENGINE_VERSION,
      content_hash: hash,
      sheet_count: build.layout.sheets.length,
    });
    // The link row comes first for its code, so it learns its kit once the kit row exists (a foreign key).
    await trx('live_links').where({ id: link.id }).update({ kit_id: kit.id });
    return link.code;
  });
}

/** Renames a kit: the title shown in lists and (as inputs.title) printed on its sheets; its live link follows. */
export async function kitRename(
  id: string,
  title: string,
  inputs: KitStoredInputs,
  contentHash: string,
  knex: Knex = db(),
) {
  await knex.transaction(async (trx) => {
    await trx('kits')
      .where({ id })
      .update({ title, inputs: JSON.stringify(inputs), content_hash: contentHash, updated_at: trx.fn.now() });
    await trx('live_links').where({ kit_id: id }).update({ title, updated_at: trx.fn.now() });
  });
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
