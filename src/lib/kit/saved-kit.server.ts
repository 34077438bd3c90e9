/**
 * Server adapter: saving, listing, renaming and duplicating kits for the API and the pages. A kit's id and its
 * live link's code are drawn before it is built, so its QR code prints its own /go/CODE address, which sends a
 * scan to the kit's page (`/kits/${id}`) until a coordinator re-targets it.
 */
import { randomUUID } from 'node:crypto';
import type { Actor } from '../auth/actor';
import { classOwned } from '../auth/class-access.server';
import { kitForActor, kitInsertWithLink, kitOwned, kitRename, type KitRow, type KitStoredInputs } from '../db/kits';
import { liveLinkCodeForKit } from '../db/live-links';
import { ConflictError, NotFoundError } from '../errors';
import { linkAddress } from '../links/link-code';
import { contentHash } from './content-hash';
import { demoModelById } from './demo-models.server';
import { modelResolve } from '../models/model-source.server';
import { ENGINE_VERSION } from './engine-version';
import { kitRequestOf, type KitInputs } from './kit-inputs';
import type { KitRequest } from './kit-request';
import { KIT_TITLE_MAX_LENGTH } from './kit-settings';
import { kitOutputBuild } from './kit-build.server';
import { kitLinks, type KitView } from './kit-view';

const NOT_FOUND = 'There is no kit with that id among the kits you can open.';

/** The URL of a kit's page. */
export function kitPageUrl(siteUrl: string, id: string): string {
  return `${siteUrl.replace(/\/+$/, '')}/kits/${id}`;
}

/**
 * The address a kit's QR code prints now: its live link's /go/ address, or its page when the link was retired
 * (or the kit was saved before kits had links).
 */
export async function kitQrUrl(row: KitRow, siteUrl: string): Promise<string> {
  const code = await liveLinkCodeForKit(row.id);
  return code ? linkAddress(siteUrl, code) : kitPageUrl(siteUrl, row.id);
}

/** A kit row as the API answers it. */
export function kitView(row: KitRow): KitView {
  const { modelId: _m, model, qrUrl: _q, ...settings } = row.inputs;
  return {
    id: row.id,
    title: row.title,
    classId: row.class_id,
    className: row.class_name,
    modelId: row.model_id,
    modelTitle: model?.name ?? row.imported_model_title ?? demoModelById(row.model_id)?.title ?? row.model_id,
    activitySlug: row.activity_slug,
    settings,
    scaleDenominator: row.inputs.scaleDenominator,
    sheetSizeId: row.inputs.sheetSizeId,
    copies: row.inputs.copies,
    sheetCount: row.sheet_count,
    engineVersion: row.engine_version,
    engineCurrent: row.engine_version === ENGINE_VERSION,
    contentHash: row.content_hash,
    createdAt: new Date(row.created_at).toISOString(),
    updatedAt: new Date(row.updated_at).toISOString(),
    links: kitLinks(row.id, row.sheet_count),
  };
}

/** The engine request a saved kit's files are rebuilt from (409 when its demo or imported model is gone). */
export async function kitRequestForRow(row: KitRow): Promise<KitRequest> {
  const { modelId, importId, model, qrUrl, venue: _v, ...settings } = row.inputs;
  if (!model && !importId && !demoModelById(modelId ?? '')) {
    throw new ConflictError(`The demo model "${modelId}" of this kit is no longer in the library; build a new kit.`);
  }
  return kitRequestOf(settings, await modelResolve(null, { modelId, importId, model }), qrUrl);
}

/** The kit if the actor may see it; NotFoundError otherwise. */
export async function kitVisible(actor: Actor, id: string): Promise<KitRow> {
  const row = await kitForActor(actor, id);
  if (!row) throw new NotFoundError(NOT_FOUND);
  return row;
}

/** The kit if the actor is the teacher of its class; NotFoundError otherwise. */
export async function kitOwnedOrThrow(actor: Actor, id: string): Promise<KitRow> {
  const row = await kitOwned(actor, id);
  if (!row) throw new NotFoundError(NOT_FOUND);
  return row;
}

/** Builds and saves a kit to one of the teacher's own classes (404 for anyone else's); returns its id. */
export async function kitSave(actor: Actor, classId: string, inputs: KitInputs, siteUrl: string): Promise<string> {
  const owned = await classOwned(actor, classId);
  if (actor.kind !== 'user') throw new NotFoundError(NOT_FOUND);
  const resolved = await modelResolve(actor, inputs);
  const id = randomUUID();
  await kitInsertWithLink(
    {
      id,
      classId: owned.id,
      teacherId: actor.userId,
      title: inputs.title ?? resolved.title,
      modelId: resolved.id,
      activitySlug: inputs.activitySlug ?? null,
      inputs,
    },
    {
      requestFor: (qrUrl) => kitRequestOf(inputs, resolved, qrUrl),
      // Building once proves the kit can be made (sheet limit, piece sizes) and counts its sheets.
      build: async (request) => (await kitOutputBuild(request, 'svg')).build,
      siteUrl,
    },
  );
  return id;
}

/** A copy of an owned kit, in the same class or another of the teacher's classes, with its own live link. */
export async function kitDuplicate(actor: Actor, row: KitRow, siteUrl: string, classId?: string, title?: string) {
  const { qrUrl: _q, ...inputs } = row.inputs;
  return kitSave(
    actor,
    classId ?? row.class_id,
    { ...inputs, title: title ?? `${row.title} (copy)`.slice(0, KIT_TITLE_MAX_LENGTH) },
    siteUrl,
  );
}

/** Renames an owned kit; the new title is printed on its sheets, so the content hash changes too. */
export async function kitRenameOwned(row: KitRow, title: string): Promise<void> {
  const inputs: KitStoredInputs = { ...row.inputs, title };
  const request = await kitRequestForRow({ ...row, inputs });
  await kitRename(row.id, title, inputs, await contentHash(request));
}
