/**
 * What teachers, teams and coordinators do to journal entries: write, change, delete, submit, approve a team's
 * entry, withdraw, and decide (publish, return, decline; one at a time or publish in bulk). Each state change runs
 * in a transaction on the locked entry row, is written to the audit log with the state it left and the state it
 * reached, and a decision mails the teacher after the commit. A decision on an entry someone already decided is a
 * 409 naming who decided.
 */
import type { Knex } from 'knex';
import type { Actor } from '../auth/actor';
import type { UserActor } from '../auth/actor-require';
import type { SavedResult } from '../analysis/saved-result';
import { activityBySlug } from '../activities/activity-store.server';
import { auditRecord } from '../db/audit';
import {
  entriesStateChange,
  entryById,
  entryDelete,
  entryFieldsUpdate,
  entryInsert,
  entryPhotoCount,
  type EntryJoined,
} from '../db/entries';
import { kitForActor } from '../db/kits';
import { db } from '../db/knex';
import { ConflictError, ForbiddenError, InputError, NotFoundError } from '../errors';
import { classForActor } from '../auth/class-access.server';
import { entryDecisionMessage } from '../mail/journal-messages';
import { mailSendLater } from '../mail/transport.server';
import { entryPhotoStorageKeys, photoStorageDelete } from '../photos/entry-photos.server';
import { photoReleaseRequired, PHOTO_RELEASE_STATEMENT } from '../photos/photo-rules';
import { entryEditableByActor, entryForActor, entryIsOwnClass } from './entry-access.server';
import {
  ENTRY_SAVED_RESULTS_MAX,
  ENTRY_STATE_LABELS,
  ENTRY_TRANSITIONS,
  reviewDecisionState,
  type EntryAction,
  type EntryCreate,
  type EntryState,
  type EntryUpdate,
  type ReviewDecisionInput,
} from './entry-rules';

/** Where a decision's mail links to and which request sent it. */
export interface FlowContext {
  siteUrl: string;
  requestId: string;
}

const EDITABLE: EntryState[] = ['draft', 'returned'];

async function activityChecked(slug: string | null | undefined): Promise<void> {
  if (slug && !(await activityBySlug(slug)))
    throw new InputError(`There is no activity "${slug}".`, { activitySlug: ['no activity has this slug'] });
}

async function kitChecked(actor: Actor, kitId: string | null | undefined, classId: string, trx: Knex) {
  if (!kitId) return;
  const kit = await kitForActor(actor, kitId, trx);
  if (!kit || kit.class_id !== classId)
    throw new InputError('That kit is not one of this class’s saved kits.', { kitId: ['not a kit of this class'] });
}

function auditEntry(
  actor: Actor,
  entryId: string,
  action: `entry.${'created' | 'deleted' | EntryAction | 'team_submitted'}`,
  from: EntryState | null,
  to: EntryState | null,
  trx: Knex,
  details: Record<string, unknown> = {},
) {
  return auditRecord(
    {
      actorId: actor.kind === 'user' ? actor.userId : null,
      action,
      targetType: 'entry',
      targetId: entryId,
      details: { from, to, ...(actor.kind === 'class' ? { classSession: true } : {}), ...details },
    },
    trx,
  );
}

/** Writes a new draft: a teacher's entry for one of their classes, or a team's through its class session. */
export async function entryCreate(actor: Actor, input: EntryCreate): Promise<string> {
  let classId: string;
  if (actor.kind === 'class') {
    if (!input.teamName)
      throw new InputError('A team entry needs a team name (no student names).', { teamName: ['required'] });
    classId = actor.classId;
  } else if (actor.kind === 'user' && actor.role === 'teacher') {
    if (!input.classId) throw new InputError('Choose the class this entry belongs to.', { classId: ['required'] });
    classId = (await classForActor(actor, input.classId)).id;
  } else {
    throw new ForbiddenError('Entries are written by teachers and by teams through their class session.');
  }
  await activityChecked(input.activitySlug);
  return db().transaction(async (trx) => {
    await kitChecked(actor, input.kitId, classId, trx);
    const id = await entryInsert(
      {
        classId,
        authorKind: actor.kind === 'class' ? 'team' : 'teacher',
        authorId: actor.kind === 'user' ? actor.userId : null,
        teamName: input.teamName ?? null,
        title: input.title,
        body: input.body,
        activitySlug: input.activitySlug,
        kitId: input.kitId,
        savedResults: input.savedResults,
      },
      trx,
    );
    await auditEntry(actor, id, 'entry.created', null, 'draft', trx);
    return id;
  });
}

/** Changes a draft or returned entry (its authors only). */
export async function entryUpdate(actor: Actor, id: string, patch: EntryUpdate): Promise<void> {
  await activityChecked(patch.activitySlug);
  await db().transaction(async (trx) => {
    const entry = await entryEditableByActor(actor, id, trx);
    if (patch.teamName !== undefined && entry.author_kind !== 'team')
      throw new InputError('Only a team entry has a team name.', { teamName: ['only for team entries'] });
    await kitChecked(actor, patch.kitId, entry.class_id, trx);
    await entryFieldsUpdate(entry.id, patch, EDITABLE, trx);
  });
}

/** Adds a data tool's saved result to a draft or returned entry (at most three). */
export async function entryResultAdd(actor: Actor, id: string, result: SavedResult): Promise<void> {
  await db().transaction(async (trx) => {
    const entry = await entryEditableByActor(actor, id, trx);
    if (entry.saved_results.length >= ENTRY_SAVED_RESULTS_MAX)
      throw new ConflictError(
        `“${entry.title}” already shows ${ENTRY_SAVED_RESULTS_MAX} results; remove one in the entry before adding another.`,
      );
    await entryFieldsUpdate(entry.id, { savedResults: [...entry.saved_results, result] }, EDITABLE, trx);
  });
}

/**
 * Deletes a draft or returned entry (its authors only), then its photos' stored copies. The keys are read in the
 * transaction that deletes the rows; the files go after the commit, so a failed delete leaves an orphan file,
 * never a row pointing at nothing.
 */
export async function entryRemove(actor: Actor, id: string): Promise<void> {
  const keys = await db().transaction(async (trx) => {
    const entry = await entryEditableByActor(actor, id, trx);
    const photoKeys = await entryPhotoStorageKeys(entry.id, trx);
    await auditEntry(actor, entry.id, 'entry.deleted', entry.state, null, trx, { title: entry.title });
    await entryDelete(entry.id, EDITABLE, trx);
    return photoKeys;
  });
  await photoStorageDelete(keys);
}

async function photosConfirmationChecked(entry: EntryJoined, photosConfirmed: boolean, trx: Knex) {
  const count = await entryPhotoCount(entry.id, trx);
  if (photoReleaseRequired(count) && !photosConfirmed)
    throw new InputError(
      `This entry has ${count} photo${count === 1 ? '' : 's'}: confirm first. ${PHOTO_RELEASE_STATEMENT}`,
      {
        photosConfirmed: ['required when the entry has photos'],
      },
    );
  return count > 0;
}

/**
 * Submits a draft or returned entry. A teacher's entry goes to the review queue (with the photo confirmation when
 * it has photos); a team's waits for its teacher's approval.
 */
export async function entrySubmit(actor: Actor, id: string, photosConfirmed: boolean): Promise<void> {
  await db().transaction(async (trx) => {
    const entry = await entryEditableByActor(actor, id, trx);
    const byTeacher = actor.kind === 'user';
    const confirmed = byTeacher && (await photosConfirmationChecked(entry, photosConfirmed, trx));
    await entriesStateChange(
      [entry.id],
      { from: ENTRY_TRANSITIONS.submit.from },
      {
        state: 'submitted',
        teacher_approved: byTeacher,
        submitted_at: new Date(),
        ...(confirmed ? { photos_confirmed_at: new Date(), photos_confirmed_by: (actor as UserActor).userId } : {}),
      },
      trx,
    );
    await auditEntry(
      actor,
      entry.id,
      byTeacher ? 'entry.submit' : 'entry.team_submitted',
      entry.state,
      'submitted',
      trx,
    );
  });
}

/** The locked entry when the actor is its class's teacher; NotFoundError otherwise. */
async function entryOfOwnClass(actor: Actor, id: string, trx: Knex): Promise<EntryJoined> {
  const entry = await entryForActor(actor, id, trx);
  if (actor.kind !== 'user' || !entryIsOwnClass(actor, entry))
    throw new NotFoundError('There is no journal entry with that id among your classes’ entries.');
  return entry;
}

/** The teacher approves a team's submitted entry: it reaches the review queue. */
export async function entryApprove(actor: Actor, id: string, photosConfirmed: boolean): Promise<void> {
  await db().transaction(async (trx) => {
    const entry = await entryOfOwnClass(actor, id, trx);
    if (entry.state !== 'submitted' || entry.teacher_approved)
      throw new ConflictError(
        entry.state === 'submitted'
          ? 'This entry is already approved and waiting for review.'
          : `This entry is ${ENTRY_STATE_LABELS[entry.state].toLowerCase()}; only a team’s submitted entry waits for approval.`,
      );
    const confirmed = await photosConfirmationChecked(entry, photosConfirmed, trx);
    await entriesStateChange(
      [entry.id],
      { from: ['submitted'], teacherApproved: false },
      {
        teacher_approved: true,
        submitted_at: new Date(),
        ...(confirmed ? { photos_confirmed_at: new Date(), photos_confirmed_by: (actor as UserActor).userId } : {}),
      },
      trx,
    );
    await auditEntry(actor, entry.id, 'entry.approve', 'submitted', 'submitted', trx);
  });
}

/** The teacher withdraws a submitted entry (theirs or a team's): it becomes a draft again. */
export async function entryWithdraw(actor: Actor, id: string): Promise<void> {
  await db().transaction(async (trx) => {
    const entry = await entryOfOwnClass(actor, id, trx);
    if (entry.state !== 'submitted')
      throw new ConflictError(
        `This entry is ${ENTRY_STATE_LABELS[entry.state].toLowerCase()}; only a submitted entry can be withdrawn.`,
      );
    await entriesStateChange(
      [entry.id],
      { from: ENTRY_TRANSITIONS.withdraw.from },
      { state: 'draft', teacher_approved: false, submitted_at: null },
      trx,
    );
    await auditEntry(actor, entry.id, 'entry.withdraw', 'submitted', 'draft', trx);
  });
}

function decidedConflict(entry: EntryJoined): ConflictError {
  if (entry.state === 'submitted')
    return new ConflictError('This entry is waiting for its teacher’s approval and is not in the review queue yet.');
  const who = entry.reviewer_name ? ` by ${entry.reviewer_name}` : '';
  const when = entry.reviewed_at ? ` at ${new Date(entry.reviewed_at).toISOString()}` : '';
  return new ConflictError(
    entry.reviewed_by
      ? `This entry was already decided${who}${when}: ${ENTRY_STATE_LABELS[entry.state].toLowerCase()}.`
      : `This entry is ${ENTRY_STATE_LABELS[entry.state].toLowerCase()} and not waiting for review.`,
  );
}

function decisionMail(entry: EntryJoined, state: EntryState, note: string | null, ctx: FlowContext) {
  if (!entry.teacher_email) return;
  mailSendLater(
    entryDecisionMessage({
      to: entry.teacher_email,
      teacherName: entry.teacher_name ?? 'teacher',
      entryTitle: entry.title,
      className: entry.class_name,
      state,
      note,
      link: new URL(`/journal/${entry.id}`, ctx.siteUrl).toString(),
    }),
    ctx.requestId,
  );
}

/**
 * A coordinator's decision on one entry, as a conditional update on its current state: of two coordinators deciding
 * at once, the second waits for the first's row lock, then finds the entry decided and gets a 409 naming who.
 */
export async function reviewDecide(actor: UserActor, id: string, input: ReviewDecisionInput, ctx: FlowContext) {
  const to = reviewDecisionState(input.decision);
  const note = input.note?.trim() || null;
  const entry = await db().transaction(async (trx) => {
    const current = await entryForActor(actor, id, trx);
    const now = new Date();
    const moved = await entriesStateChange(
      [current.id],
      { from: ENTRY_TRANSITIONS[input.decision].from, teacherApproved: true },
      {
        state: to,
        review_note: note,
        reviewed_by: actor.userId,
        reviewed_at: now,
        ...(to === 'published' ? { published_at: now } : {}),
      },
      trx,
    );
    // Read again: a row locked while another decision committed comes back re-checked (PostgreSQL's EvalPlanQual)
    // with its old join, so its reviewer's name is missing; a new statement sees the winner's row and name.
    if (moved.length === 0) throw decidedConflict(await entryForActor(actor, id, trx));
    await auditEntry(actor, current.id, `entry.${input.decision}`, 'submitted', to, trx, note ? { note } : {});
    return current;
  });
  decisionMail(entry, to, note, ctx);
  return to;
}

/**
 * Publishes the selected entries at once: one conditional UPDATE, so an entry someone decided meanwhile is left out
 * (and listed as skipped), and none is published twice.
 */
export async function reviewBulkPublish(actor: UserActor, ids: readonly string[], ctx: FlowContext) {
  const unique = [...new Set(ids)];
  const published = await db().transaction(async (trx) => {
    const now = new Date();
    const moved = await entriesStateChange(
      unique,
      { from: ENTRY_TRANSITIONS.publish.from, teacherApproved: true },
      { state: 'published', reviewed_by: actor.userId, reviewed_at: now, published_at: now, review_note: null },
      trx,
    );
    for (const entryId of moved)
      await auditEntry(actor, entryId, 'entry.publish', 'submitted', 'published', trx, { bulk: true });
    return moved;
  });
  const entries = await Promise.all(published.map((entryId) => entryById(entryId)));
  for (const entry of entries) if (entry) decisionMail(entry, 'published', null, ctx);
  return { published, skipped: unique.filter((entryId) => !published.includes(entryId)) };
}
