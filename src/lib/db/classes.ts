/**
 * Queries on classes and class_sessions. A class keeps a name, a grade band and a student count only; a class
 * session row keeps the SHA-256 of the cookie token, never the token.
 */
import type { Knex } from 'knex';
import type { GradeBand } from '../grade-bands';
import { isUuid } from './accounts';
import { db } from './knex';

export interface ClassRow {
  id: string;
  teacher_id: string;
  school_id: string | null;
  name: string;
  grade_band: GradeBand;
  student_count: number;
  join_code: string;
  archived_at: Date | null;
  created_at: Date;
  updated_at: Date;
}

/** A class as the API answers it; joinCode only for its own teacher. */
export interface ClassView {
  id: string;
  name: string;
  gradeBand: GradeBand;
  studentCount: number;
  schoolId: string | null;
  schoolName: string | null;
  teacherName: string | null;
  joinCode?: string;
  createdAt: string;
}

type ClassJoined = ClassRow & { school_name: string | null; teacher_name: string | null };

function classSelect(trx: Knex) {
  return trx('classes')
    .leftJoin('schools', 'schools.id', 'classes.school_id')
    .leftJoin('users', 'users.id', 'classes.teacher_id')
    .select('classes.*', 'schools.name as school_name', 'users.display_name as teacher_name')
    .whereNull('classes.archived_at');
}

/** Maps a row to the API view; the join code is included only when asked (the owner's view). */
export function classView(row: ClassJoined, withCode: boolean): ClassView {
  return {
    id: row.id,
    name: row.name,
    gradeBand: row.grade_band,
    studentCount: row.student_count,
    schoolId: row.school_id,
    schoolName: row.school_name,
    teacherName: row.teacher_name,
    ...(withCode ? { joinCode: row.join_code } : {}),
    createdAt: new Date(row.created_at).toISOString(),
  };
}

/** The class (not archived) with this id, with school and teacher names, or null. */
export async function classById(id: string, trx: Knex = db()): Promise<ClassJoined | null> {
  if (!isUuid(id)) return null;
  return ((await classSelect(trx).where('classes.id', id).first()) as ClassJoined | undefined) ?? null;
}

/** A teacher's classes, newest first. */
export async function classListForTeacher(teacherId: string, trx: Knex = db()): Promise<ClassJoined[]> {
  return classSelect(trx).where('classes.teacher_id', teacherId).orderBy('classes.created_at', 'desc');
}

/** Every class of every school (coordinators and admins), by school then name. */
export async function classListAll(trx: Knex = db()): Promise<ClassJoined[]> {
  return classSelect(trx)
    .orderBy([{ column: 'schools.name' }, { column: 'classes.name' }])
    .limit(2000);
}

/** The class (not archived) whose join code is this, or null. */
export async function classByJoinCode(code: string, trx: Knex = db()): Promise<ClassJoined | null> {
  return ((await classSelect(trx).where('classes.join_code', code).first()) as ClassJoined | undefined) ?? null;
}

/** Inserts a class with the given code; null when the code is taken (the caller draws another). */
export async function classInsert(
  input: { teacherId: string; schoolId: string | null; name: string; gradeBand: GradeBand; studentCount: number },
  joinCode: string,
  trx: Knex = db(),
): Promise<string | null> {
  const rows = await trx('classes')
    .insert({
      teacher_id: input.teacherId,
      school_id: input.schoolId,
      name: input.name,
      grade_band: input.gradeBand,
      student_count: input.studentCount,
      join_code: joinCode,
    })
    .onConflict('join_code')
    .ignore()
    .returning('id');
  return (rows[0] as { id: string } | undefined)?.id ?? null;
}

/** Updates name, grade band or student count. */
export async function classUpdate(
  id: string,
  changes: { name?: string; gradeBand?: GradeBand; studentCount?: number },
  trx: Knex = db(),
): Promise<void> {
  const row: Record<string, unknown> = { updated_at: trx.fn.now() };
  if (changes.name !== undefined) row.name = changes.name;
  if (changes.gradeBand !== undefined) row.grade_band = changes.gradeBand;
  if (changes.studentCount !== undefined) row.student_count = changes.studentCount;
  await trx('classes').where({ id }).update(row);
}

/** Sets a new join code; false when the code is taken by another class (the caller draws another). */
export async function classJoinCodeSet(id: string, joinCode: string, trx: Knex = db()): Promise<boolean> {
  const taken = await trx('classes').where({ join_code: joinCode }).first('id');
  if (taken) return false;
  try {
    await trx('classes').where({ id }).update({ join_code: joinCode, updated_at: trx.fn.now() });
    return true;
  } catch (err) {
    if ((err as { code?: string }).code === '23505') return false;
    throw err;
  }
}

/** Opens a class session (id = SHA-256 of the cookie token) that expires after the given hours. */
export async function classSessionInsert(id: string, classId: string, hours: number, trx: Knex = db()) {
  await trx('class_sessions').insert({
    id,
    class_id: classId,
    expires_at: trx.raw(`now() + make_interval(hours => ?)`, [hours]),
  });
}

/** The class id of a live class session (its class not archived), or null. */
export async function classSessionClassId(id: string, trx: Knex = db()): Promise<string | null> {
  const row = await trx('class_sessions')
    .join('classes', 'classes.id', 'class_sessions.class_id')
    .where('class_sessions.id', id)
    .where('class_sessions.expires_at', '>', trx.fn.now())
    .whereNull('classes.archived_at')
    .first('class_sessions.class_id');
  return (row as { class_id: string } | undefined)?.class_id ?? null;
}

/** Ends one class session. */
export async function classSessionDelete(id: string, trx: Knex = db()): Promise<void> {
  await trx('class_sessions').where({ id }).delete();
}

/** Ends every session of a class (after its code is rotated); returns how many. */
export async function classSessionsEnd(classId: string, trx: Knex = db()): Promise<number> {
  return trx('class_sessions').where({ class_id: classId }).delete();
}
