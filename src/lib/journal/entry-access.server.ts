/**
 * Who may see or change which class journal entry — the one place that decides it (pages, the entries and review
 * API, photos and thumbnails, the booklet all ask here).
 *
 * See: a published entry, anyone. An unpublished one: its class session, its class's teacher, coordinators and
 * admins; to anyone else it does not exist (404, the same answer as for a missing id).
 * Change (fields, photos, delete): its class's teacher, or its class session for a team entry, while the entry is
 * a draft or returned; a submitted or decided entry is a 409. Coordinators review and never edit.
 */
import type { Knex } from 'knex';
import type { Actor } from '../auth/actor';
import { entryById, type EntryJoined } from '../db/entries';
import { db } from '../db/knex';
import { ConflictError, NotFoundError } from '../errors';
import { ENTRY_STATE_LABELS, entryStateEditable } from './entry-rules';

const NOT_FOUND = 'There is no journal entry with that id among the entries you can open.';

/** True when the actor is the entry's class session or its class's teacher. */
export function entryIsOwnClass(actor: Actor, entry: Pick<EntryJoined, 'class_id' | 'teacher_id'>): boolean {
  if (actor.kind === 'class') return actor.classId === entry.class_id;
  return actor.kind === 'user' && actor.role === 'teacher' && actor.userId === entry.teacher_id;
}

/** True when the actor reviews entries (coordinators and admins). */
export function actorReviews(actor: Actor): boolean {
  return actor.kind === 'user' && (actor.role === 'coordinator' || actor.role === 'admin');
}

/** True when the actor may see the entry. */
export function entryVisible(actor: Actor, entry: Pick<EntryJoined, 'class_id' | 'teacher_id' | 'state'>): boolean {
  return entry.state === 'published' || entryIsOwnClass(actor, entry) || actorReviews(actor);
}

/** True when the actor is on the entry's author side: its teacher, or its class session for a team entry. */
export function entryAuthorSide(actor: Actor, entry: Pick<EntryJoined, 'class_id' | 'teacher_id' | 'author_kind'>) {
  if (actor.kind === 'class') return actor.classId === entry.class_id && entry.author_kind === 'team';
  return entryIsOwnClass(actor, entry);
}

/**
 * The entry if the actor may see it; NotFoundError otherwise. Inside a transaction (`trx` given) its row is locked
 * until the transaction ends.
 */
export async function entryForActor(actor: Actor, entryId: string, trx?: Knex): Promise<EntryJoined> {
  const entry = await entryById(entryId, trx ?? db(), { forUpdate: trx !== undefined });
  if (!entry || !entryVisible(actor, entry)) throw new NotFoundError(NOT_FOUND);
  return entry;
}

/**
 * The entry if the actor may change it now: NotFoundError when they may not see it or are not on its author side,
 * ConflictError when it is submitted or decided. Inside a transaction (`trx` given) its row is locked.
 */
export async function entryEditableByActor(actor: Actor, entryId: string, trx?: Knex): Promise<EntryJoined> {
  const entry = await entryForActor(actor, entryId, trx);
  if (!entryAuthorSide(actor, entry)) throw new NotFoundError(NOT_FOUND);
  if (!entryStateEditable(entry.state))
    throw new ConflictError(
      `This entry is ${ENTRY_STATE_LABELS[entry.state].toLowerCase()}; only drafts and returned entries can change.` +
        (entry.state === 'submitted' ? ' Withdraw it first to change it.' : ''),
    );
  return entry;
}
