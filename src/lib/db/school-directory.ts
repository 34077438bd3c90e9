/**
 * The schools directory for coordinators: list with filters and paging, one school with its teachers and
 * classes, edits and acceptance, near-duplicate names (pg_trgm similarity), and merging one school into
 * another in one transaction written to the audit log.
 */
import type { Knex } from 'knex';
import { ConflictError, InputError, NotFoundError } from '../errors';
import {
  SCHOOL_DUPLICATE_SIMILARITY,
  type SchoolDirectoryQuery,
  type SchoolDuplicate,
  type SchoolRecord,
  type SchoolUpdate,
} from '../reach/school-schema';
import { auditRecord } from './audit';
import { likeEscape, schoolFilterSql } from './reach';
import { db } from './knex';

const RECORD_COLUMNS = `s.id, s.name, s.city, s.district, s.region, s.country, s.setting, s.grade_bands,
  s.high_need, s.high_need_basis, s.high_need_year, s.status,
  (SELECT count(*) FROM users u WHERE u.school_id = s.id AND u.role = 'teacher')::int AS teacher_count,
  (SELECT count(*) FROM classes c WHERE c.school_id = s.id)::int AS class_count`;

function schoolRecord(r: Record<string, unknown>): SchoolRecord {
  return {
    id: r.id as string,
    name: r.name as string,
    city: r.city as string,
    district: r.district as string,
    region: r.region as string,
    country: r.country as string,
    setting: r.setting as SchoolRecord['setting'],
    gradeBands: pgArray(r.grade_bands) as SchoolRecord['gradeBands'],
    highNeed: r.high_need as boolean,
    highNeedBasis: r.high_need_basis as string,
    highNeedYear: (r.high_need_year as number | null) ?? null,
    status: r.status as SchoolRecord['status'],
    teacherCount: Number(r.teacher_count),
    classCount: Number(r.class_count),
  };
}

/** node-postgres returns arrays of enum types as their text form '{K-2,3-5}'. */
function pgArray(value: unknown): string[] {
  if (Array.isArray(value)) return value as string[];
  const text = String(value ?? '{}').replace(/^\{|\}$/g, '');
  return text ? text.split(',').map((s) => s.replace(/^"|"$/g, '')) : [];
}

/**
 * The directory, filtered and paged, by name; with the number of schools across all pages. With `all`, every
 * school under the filters (the CSV export), the paging ignored.
 */
export async function schoolDirectory(
  query: SchoolDirectoryQuery,
  all = false,
  trx: Knex = db(),
): Promise<{ schools: SchoolRecord[]; total: number }> {
  const bindings: Record<string, string | number | boolean | Date> = {
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  };
  const where = [schoolFilterSql(query, bindings)];
  if (query.q) {
    where.push("(s.name ILIKE '%' || :q || '%' OR s.city ILIKE '%' || :q || '%')");
    bindings.q = likeEscape(query.q);
  }
  if (query.status) {
    where.push('s.status = CAST(:status AS school_status)');
    bindings.status = query.status;
  }
  const { rows } = await trx.raw(
    `SELECT ${RECORD_COLUMNS}, count(*) OVER () AS total FROM schools s WHERE ${where.join(' AND ')}
     ORDER BY s.name, s.city, s.id ${all ? '' : 'LIMIT :limit OFFSET :offset'}`,
    bindings,
  );
  return { schools: rows.map(schoolRecord), total: rows.length ? Number(rows[0].total) : 0 };
}

/** One school, or null. */
export async function schoolRecordById(id: string, trx: Knex = db()): Promise<SchoolRecord | null> {
  const { rows } = await trx.raw(`SELECT ${RECORD_COLUMNS} FROM schools s WHERE s.id = ?`, [id]);
  return rows[0] ? schoolRecord(rows[0]) : null;
}

/** A school's teachers and classes (names and counts only; never students). */
export async function schoolPeople(id: string, trx: Knex = db()) {
  const teachers = await trx('users')
    .where({ school_id: id, role: 'teacher' })
    .select('id', 'display_name as displayName', 'email')
    .orderBy('display_name');
  const classes = await trx('classes as c')
    .join('users as u', 'u.id', 'c.teacher_id')
    .where('c.school_id', id)
    .select(
      'c.id',
      'c.name',
      'c.grade_band as gradeBand',
      'c.student_count as studentCount',
      'u.display_name as teacherName',
      trx.raw('(SELECT count(*) FROM kits k WHERE k.class_id = c.id)::int AS "kitCount"'),
      trx.raw(
        `(SELECT count(*) FROM entries e WHERE e.class_id = c.id AND e.state = 'published')::int AS "entryCount"`,
      ),
    )
    .orderBy('c.name');
  const events = await trx.raw(
    `SELECT ev.id, ev.title, ev.starts_at AS "startsAt", a.attendee_count AS "attendeeCount",
            (ev.school_id = :id) AS hosted
     FROM events ev LEFT JOIN event_attendance a ON a.event_id = ev.id AND a.school_id = :id
     WHERE ev.school_id = :id OR a.school_id IS NOT NULL ORDER BY ev.starts_at DESC`,
    { id },
  );
  return {
    teachers: teachers as { id: string; displayName: string; email: string }[],
    classes: classes as {
      id: string;
      name: string;
      gradeBand: string;
      studentCount: number;
      teacherName: string;
      kitCount: number;
      entryCount: number;
    }[],
    events: (events.rows as Record<string, unknown>[]).map((e) => ({
      id: e.id as string,
      title: e.title as string,
      startsAt: (e.startsAt as Date).toISOString(),
      attendeeCount: (e.attendeeCount as number | null) ?? null,
      hosted: Boolean(e.hosted),
    })),
  };
}

const UPDATE_COLUMNS: Record<keyof SchoolUpdate, string> = {
  name: 'name',
  city: 'city',
  district: 'district',
  region: 'region',
  country: 'country',
  setting: 'setting',
  gradeBands: 'grade_bands',
  highNeed: 'high_need',
  highNeedBasis: 'high_need_basis',
  highNeedYear: 'high_need_year',
  status: 'status',
};

/** Changes a school's fields (and accepts a proposed one); 404 when missing, 409 when name + city is taken. */
export async function schoolUpdate(id: string, input: SchoolUpdate, actorId: string, trx: Knex = db()) {
  const patch: Record<string, unknown> = { updated_at: trx.fn.now() };
  for (const [key, value] of Object.entries(input)) {
    const column = UPDATE_COLUMNS[key as keyof SchoolUpdate];
    patch[column] = key === 'gradeBands' ? trx.raw('CAST(? AS grade_band[])', [value]) : value;
  }
  await trx.transaction(async (t) => {
    const before = await t('schools').where({ id }).forUpdate().first('status');
    if (!before) throw new NotFoundError('No school with that id.');
    try {
      await t('schools').where({ id }).update(patch);
    } catch (err) {
      if ((err as { constraint?: string }).constraint === 'schools_name_city_unique') {
        throw new ConflictError('Another school already has that name in that city: merge the two instead.');
      }
      throw err;
    }
    const accepted = before.status === 'proposed' && input.status === 'approved';
    await auditRecord(
      {
        actorId,
        action: accepted ? 'school.accepted' : 'school.updated',
        targetType: 'school',
        targetId: id,
        details: input,
      },
      t,
    );
  });
  return schoolRecordById(id, trx);
}

/**
 * Proposed schools, each with the schools whose names are similar (pg_trgm similarity of the lower-cased
 * names at or above SCHOOL_DUPLICATE_SIMILARITY, the trigram index finds them), most similar first.
 */
export async function schoolProposals(trx: Knex = db()): Promise<SchoolDuplicate[]> {
  const { rows } = await trx.raw(
    `SELECT ${RECORD_COLUMNS},
            COALESCE(json_agg(json_build_object('id', o.id, 'name', o.name, 'city', o.city, 'status', o.status,
                     'similarity', round(similarity(lower(o.name), lower(s.name))::numeric, 3))
                     ORDER BY similarity(lower(o.name), lower(s.name)) DESC, o.name)
                     FILTER (WHERE o.id IS NOT NULL), '[]') AS similar
     FROM schools s
     LEFT JOIN LATERAL (
       SELECT o.* FROM schools o
       WHERE o.id <> s.id AND lower(o.name) % lower(s.name)
         AND similarity(lower(o.name), lower(s.name)) >= :threshold
       ORDER BY similarity(lower(o.name), lower(s.name)) DESC LIMIT 5
     ) o ON true
     WHERE s.status = 'proposed'
     GROUP BY s.id ORDER BY s.created_at, s.name`,
    { threshold: SCHOOL_DUPLICATE_SIMILARITY },
  );
  return rows.map((r: Record<string, unknown>) => ({
    school: schoolRecord(r),
    similar: (r.similar as SchoolDuplicate['similar']).map((s) => ({ ...s, similarity: Number(s.similarity) })),
  }));
}

/** Every column with a foreign key to schools(id), read from the catalog so columns added later move too. */
async function schoolReferences(trx: Knex): Promise<{ table: string; column: string }[]> {
  const { rows } = await trx.raw(
    `SELECT cl.relname AS "table", a.attname AS "column"
     FROM pg_constraint c
     JOIN pg_class cl ON cl.oid = c.conrelid
     JOIN pg_attribute a ON a.attrelid = c.conrelid AND a.attnum = ANY (c.conkey)
     WHERE c.contype = 'f' AND c.confrelid = 'schools'::regclass AND cardinality(c.conkey) = 1
     ORDER BY 1, 2`,
  );
  return rows;
}

/** What a merge moved, by table and column. */
export type SchoolMergeMoved = Record<string, number>;

/**
 * Merges school `fromId` into `intoId` in one transaction: every row pointing at `fromId` (teachers, classes,
 * events, attendance and any later table) points at `intoId`; attendance of both at the same event is summed
 * into one row; `fromId` is deleted; the audit log records what moved. 404 for a missing school, 400 for a
 * school merged into itself.
 */
export async function schoolMerge(
  fromId: string,
  intoId: string,
  actorId: string,
  trx: Knex = db(),
): Promise<{ kept: SchoolRecord; moved: SchoolMergeMoved }> {
  if (fromId === intoId) throw new InputError('A school cannot be merged into itself.', { intoId: ['Same school.'] });
  const moved: SchoolMergeMoved = {};
  await trx.transaction(async (t) => {
    // Lock both rows in id order so two merges of the same pair cannot deadlock.
    const locked = await t('schools').whereIn('id', [fromId, intoId]).orderBy('id').forUpdate().select('id', 'name');
    const from = locked.find((s) => s.id === fromId);
    const into = locked.find((s) => s.id === intoId);
    if (!from) throw new NotFoundError('The school to merge no longer exists.');
    if (!into) throw new NotFoundError('The school to keep does not exist.');
    const summed = await t.raw(
      `INSERT INTO event_attendance (event_id, school_id, attendee_count, recorded_by, recorded_at)
       SELECT event_id, :into, attendee_count, recorded_by, recorded_at FROM event_attendance WHERE school_id = :from
       ON CONFLICT (event_id, school_id)
       DO UPDATE SET attendee_count = event_attendance.attendee_count + EXCLUDED.attendee_count`,
      { from: fromId, into: intoId },
    );
    moved['event_attendance.school_id'] = summed.rowCount ?? 0;
    await t('event_attendance').where({ school_id: fromId }).delete();
    for (const ref of await schoolReferences(t)) {
      if (ref.table === 'event_attendance') continue;
      const count = await t(ref.table)
        .where(ref.column, fromId)
        .update({ [ref.column]: intoId });
      if (count > 0) moved[`${ref.table}.${ref.column}`] = count;
    }
    await t('schools').where({ id: fromId }).delete();
    await auditRecord(
      {
        actorId,
        action: 'school.merged',
        targetType: 'school',
        targetId: intoId,
        details: { mergedId: fromId, mergedName: from.name, keptName: into.name, moved },
      },
      t,
    );
  });
  return { kept: (await schoolRecordById(intoId, trx))!, moved };
}
