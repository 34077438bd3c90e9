/**
 * Queries on class journal entries. Who may see or change which entry is decided in
 * src/lib/journal/entry-access.server.ts; state changes are conditional updates on the current state, so two
 * decisions on one entry end with exactly one.
 */
import type { Knex } from 'knex';
import type { SavedResult } from '../analysis/saved-result';
import type { EntryAuthorKind, EntryState, ReviewQueueQuery } from '../journal/entry-rules';
import { isUuid } from './accounts';
import { db } from './knex';
import { reachBuiltRows } from './reach-cache';

export interface EntryRow {
  id: string;
  class_id: string;
  kit_id: string | null;
  activity_slug: string | null;
  author_kind: EntryAuthorKind;
  author_id: string | null;
  team_name: string | null;
  title: string;
  body: string;
  saved_results: SavedResult[];
  state: EntryState;
  teacher_approved: boolean;
  review_note: string | null;
  reviewed_by: string | null;
  photos_confirmed_at: Date | null;
  photos_confirmed_by: string | null;
  submitted_at: Date | null;
  reviewed_at: Date | null;
  published_at: Date | null;
  created_at: Date;
  updated_at: Date;
}

/** An entry with its class, school, teacher and reviewer. */
export interface EntryJoined extends EntryRow {
  class_name: string;
  teacher_id: string;
  teacher_name: string | null;
  teacher_email: string | null;
  school_id: string | null;
  school_name: string | null;
  reviewer_name: string | null;
  kit_title: string | null;
}

/** An entry as lists and the review queue read it: the start of its body and the number of its saved results. */
export interface EntryListRow extends Omit<EntryJoined, 'body' | 'saved_results'> {
  /** The first ENTRY_LIST_BODY_CHARS characters of the body: enough for an excerpt. */
  body: string;
  result_count: number;
}

/**
 * Characters of the body a list reads: an excerpt shows about 220 characters of text, and Markdown markup rarely
 * takes more than a few times that (common practice, no source). Reading whole bodies (up to ENTRY_BODY_MAX) and
 * saved results (up to three of SAVED_RESULT_MAX_BYTES) for 25 rows costs the database, the wire and the
 * Markdown renderer far more than a page of the queue needs.
 */
export const ENTRY_LIST_BODY_CHARS = 2_000;

const ENTRY_LIST_COLUMNS = [
  'id',
  'class_id',
  'kit_id',
  'activity_slug',
  'author_kind',
  'author_id',
  'team_name',
  'title',
  'state',
  'teacher_approved',
  'review_note',
  'reviewed_by',
  'photos_confirmed_at',
  'photos_confirmed_by',
  'submitted_at',
  'reviewed_at',
  'published_at',
  'created_at',
  'updated_at',
].map((c) => `entries.${c}`);

/** Entries with their class, school, teacher, reviewer and kit joined, and those tables' names selected. */
function entryJoined(trx: Knex) {
  return trx('entries')
    .join('classes', 'classes.id', 'entries.class_id')
    .leftJoin('schools', 'schools.id', 'classes.school_id')
    .leftJoin('users as teacher', 'teacher.id', 'classes.teacher_id')
    .leftJoin('users as reviewer', 'reviewer.id', 'entries.reviewed_by')
    .leftJoin('kits', 'kits.id', 'entries.kit_id')
    .select(
      'classes.name as class_name',
      'classes.teacher_id as teacher_id',
      'classes.school_id as school_id',
      'schools.name as school_name',
      'teacher.display_name as teacher_name',
      'teacher.email as teacher_email',
      'reviewer.display_name as reviewer_name',
      'kits.title as kit_title',
    );
}

function entrySelect(trx: Knex) {
  return entryJoined(trx).select('entries.*');
}

function entryListSelect(trx: Knex) {
  return entryJoined(trx).select(
    ...ENTRY_LIST_COLUMNS,
    trx.raw('left(entries.body, ?) as body', [ENTRY_LIST_BODY_CHARS]),
    trx.raw('jsonb_array_length(entries.saved_results)::int as result_count'),
  );
}

/** The entry with this id, or null; `forUpdate` locks its row until the transaction ends. */
export async function entryById(
  id: string,
  trx: Knex = db(),
  options: { forUpdate?: boolean } = {},
): Promise<EntryJoined | null> {
  if (!isUuid(id)) return null;
  const query = entrySelect(trx).where('entries.id', id);
  if (options.forUpdate) query.forUpdate('entries');
  return ((await query.first()) as EntryJoined | undefined) ?? null;
}

export interface EntryInsert {
  classId: string;
  authorKind: EntryAuthorKind;
  authorId: string | null;
  teamName: string | null;
  title: string;
  body: string;
  activitySlug: string | null;
  kitId: string | null;
  savedResults: SavedResult[];
}

/** Inserts a draft and returns its id. */
export async function entryInsert(entry: EntryInsert, trx: Knex = db()): Promise<string> {
  const [row] = await trx('entries')
    .insert({
      class_id: entry.classId,
      author_kind: entry.authorKind,
      author_id: entry.authorId,
      team_name: entry.teamName,
      title: entry.title,
      body: entry.body,
      activity_slug: entry.activitySlug,
      kit_id: entry.kitId,
      saved_results: JSON.stringify(entry.savedResults),
    })
    .returning('id');
  return (row as { id: string }).id;
}

/** The columns an author may change, by their API names. */
export interface EntryFieldsPatch {
  teamName?: string;
  title?: string;
  body?: string;
  activitySlug?: string | null;
  kitId?: string | null;
  savedResults?: SavedResult[];
}

/** Changes an entry's fields while it is in one of `states`; false when it was not (someone moved it on). */
export async function entryFieldsUpdate(
  id: string,
  patch: EntryFieldsPatch,
  states: readonly EntryState[],
  trx: Knex = db(),
): Promise<boolean> {
  const row: Record<string, unknown> = { updated_at: trx.fn.now() };
  if (patch.teamName !== undefined) row.team_name = patch.teamName;
  if (patch.title !== undefined) row.title = patch.title;
  if (patch.body !== undefined) row.body = patch.body;
  if (patch.activitySlug !== undefined) row.activity_slug = patch.activitySlug;
  if (patch.kitId !== undefined) row.kit_id = patch.kitId;
  if (patch.savedResults !== undefined) row.saved_results = JSON.stringify(patch.savedResults);
  return (await trx('entries').where({ id }).whereIn('state', states).update(row)) > 0;
}

/** The condition a state change requires: the entry's current state, and for review, the teacher's approval. */
export interface EntryStateCondition {
  from: readonly EntryState[];
  teacherApproved?: boolean;
}

/** Column values a state change sets (besides updated_at). */
export type EntryStatePatch = Partial<
  Pick<
    EntryRow,
    | 'state'
    | 'teacher_approved'
    | 'review_note'
    | 'reviewed_by'
    | 'photos_confirmed_by'
    | 'photos_confirmed_at'
    | 'submitted_at'
    | 'reviewed_at'
    | 'published_at'
  >
>;

/**
 * Moves the entries whose ids are given and whose state matches the condition, in one conditional UPDATE; returns
 * the ids it moved (an entry someone else moved first is not among them).
 */
export async function entriesStateChange(
  ids: readonly string[],
  condition: EntryStateCondition,
  patch: EntryStatePatch,
  trx: Knex = db(),
): Promise<string[]> {
  if (ids.length === 0) return [];
  const query = trx('entries')
    .whereIn('id', [...ids])
    .whereIn('state', [...condition.from])
    .update({ ...patch, updated_at: trx.fn.now() })
    .returning('id');
  if (condition.teacherApproved !== undefined) query.where('teacher_approved', condition.teacherApproved);
  return ((await query) as { id: string }[]).map((r) => r.id);
}

/** Deletes an entry while it is in one of `states`; true when a row went. */
export async function entryDelete(id: string, states: readonly EntryState[], trx: Knex = db()): Promise<boolean> {
  return (await trx('entries').where({ id }).whereIn('state', states).delete()) > 0;
}

/** Entries of a class as lists read them, newest first, optionally in some states only. */
export async function entryListForClass(
  classId: string,
  options: { states?: readonly EntryState[]; limit?: number } = {},
  trx: Knex = db(),
): Promise<EntryListRow[]> {
  if (!isUuid(classId)) return [];
  const query = entryListSelect(trx)
    .where('entries.class_id', classId)
    .orderBy('entries.updated_at', 'desc')
    .limit(options.limit ?? 500);
  if (options.states) query.whereIn('entries.state', options.states);
  return (await query) as EntryListRow[];
}

/** Entries of all of a teacher's classes as lists read them, newest first. */
export async function entryListForTeacher(teacherId: string, trx: Knex = db()): Promise<EntryListRow[]> {
  return (await entryListSelect(trx)
    .where('classes.teacher_id', teacherId)
    .whereNull('classes.archived_at')
    .orderBy('entries.updated_at', 'desc')
    .limit(500)) as EntryListRow[];
}

const QUEUE_SORT_COLUMNS: Record<ReviewQueueQuery['sort'], string> = {
  submitted: 'entries.submitted_at',
  title: 'entries.title',
  school: 'schools.name',
  class: 'classes.name',
  activity: 'entries.activity_slug',
};

/**
 * The review queue (submitted, teacher-approved entries) under the filters. A school is matched through its
 * classes as a semi-join, so the count reads no other table and the partial queue indexes of
 * migrations/20261205123000_add_review_queue_filter_indexes.ts serve it alone.
 */
function reviewQueueFiltered(q: ReviewQueueQuery, now: Date, trx: Knex) {
  const query = trx('entries').where('entries.state', 'submitted').andWhere('entries.teacher_approved', true);
  if (q.schoolId) query.whereIn('entries.class_id', trx('classes').select('id').where('school_id', q.schoolId));
  if (q.classId) query.where('entries.class_id', q.classId);
  if (q.activity) query.where('entries.activity_slug', q.activity);
  if (q.minAgeDays !== undefined)
    query.where('entries.submitted_at', '<=', new Date(now.getTime() - q.minAgeDays * 86_400_000));
  if (q.maxAgeDays !== undefined)
    query.where('entries.submitted_at', '>=', new Date(now.getTime() - (q.maxAgeDays + 1) * 86_400_000));
  return query;
}

/**
 * One page of the review queue with the total that match the filters; the two queries run side by side. `now`
 * sets the age filters: pass it to the minute (reviewQueueNow) so a repeated page is the same query.
 */
/** The queue's clock: now, to the minute, so age filters change once a minute and repeated pages can be cached. */
export function reviewQueueNow(): Date {
  return new Date(Math.floor(Date.now() / 60_000) * 60_000);
}

export async function reviewQueuePage(
  q: ReviewQueueQuery,
  now: Date,
  trx: Knex = db(),
): Promise<{ rows: EntryListRow[]; total: number }> {
  const order = [
    { column: QUEUE_SORT_COLUMNS[q.sort], order: q.dir, nulls: 'last' as const },
    { column: 'entries.id', order: q.dir },
  ];
  const ids = reviewQueueFiltered(q, now, trx)
    .select('entries.id')
    .orderBy(order)
    .limit(q.pageSize)
    .offset((q.page - 1) * q.pageSize);
  // Only a sort by class or school needs those tables to choose the page.
  if (q.sort === 'class' || q.sort === 'school') ids.join('classes', 'classes.id', 'entries.class_id');
  if (q.sort === 'school') ids.leftJoin('schools', 'schools.id', 'classes.school_id');
  // Pages asked for again before the queue changes (reloads, many coordinators) come from the reach cache.
  const [countRows, rows] = await Promise.all([
    reachBuiltRows<{ count: string }>(trx, reviewQueueFiltered(q, now, trx).count({ count: '*' })),
    reachBuiltRows<EntryListRow>(trx, entryListSelect(trx).whereIn('entries.id', ids).orderBy(order)),
  ]);
  return { rows, total: Number(countRows[0]?.count ?? 0) };
}

/** Published entries, newest first, for an activity, a class, a school, or all. */
export async function publishedEntries(
  filter: { activitySlug?: string; classId?: string; schoolId?: string; limit?: number; offset?: number },
  trx: Knex = db(),
): Promise<EntryJoined[]> {
  const query = entrySelect(trx)
    .where('entries.state', 'published')
    .orderBy([
      { column: 'entries.published_at', order: 'desc' },
      { column: 'entries.id', order: 'desc' },
    ])
    .limit(Math.min(filter.limit ?? 50, 500))
    .offset(filter.offset ?? 0);
  if (filter.activitySlug) query.where('entries.activity_slug', filter.activitySlug);
  if (filter.classId) {
    if (!isUuid(filter.classId)) return [];
    query.where('entries.class_id', filter.classId);
  }
  if (filter.schoolId) {
    if (!isUuid(filter.schoolId)) return [];
    query.where('classes.school_id', filter.schoolId);
  }
  return (await query) as EntryJoined[];
}

/** How many photos an entry has. */
export async function entryPhotoCount(entryId: string, trx: Knex = db()): Promise<number> {
  const row = await trx('entry_photos').where({ entry_id: entryId }).count<{ count: string }[]>({ count: '*' }).first();
  return Number(row?.count ?? 0);
}
