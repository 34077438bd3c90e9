/**
 * Who may see or change which class — the one place that decides it. A teacher sees only their own classes
 * (another teacher's class answers 404, as if it did not exist); a class session sees only its own class;
 * coordinators and admins see every class of every school, without join codes.
 */
import { classById, classListAll, classListForTeacher, classView, type ClassView } from '../db/classes';
import { NotFoundError } from '../errors';
import type { Actor } from './actor';

const NOT_FOUND = 'There is no class with that id among the classes you can open.';

/** The class as this actor may see it; NotFoundError when it does not exist or is not theirs. */
export async function classForActor(actor: Actor, classId: string): Promise<ClassView> {
  const row = await classById(classId);
  if (!row) throw new NotFoundError(NOT_FOUND);
  if (actor.kind === 'user' && actor.role === 'teacher' && row.teacher_id === actor.userId) return classView(row, true);
  if (actor.kind === 'user' && actor.role !== 'teacher') return classView(row, false);
  if (actor.kind === 'class' && actor.classId === row.id) return classView(row, false);
  throw new NotFoundError(NOT_FOUND);
}

/** The class when the actor is its teacher; NotFoundError otherwise (also for staff: only owners change it). */
export async function classOwned(actor: Actor, classId: string): Promise<ClassView> {
  const row = await classById(classId);
  if (!row || actor.kind !== 'user' || row.teacher_id !== actor.userId) throw new NotFoundError(NOT_FOUND);
  return classView(row, true);
}

/** The classes an account may list: a teacher's own (with codes), or all of them for staff (without codes). */
export async function classListForActor(actor: Extract<Actor, { kind: 'user' }>): Promise<ClassView[]> {
  if (actor.role === 'teacher') return (await classListForTeacher(actor.userId)).map((r) => classView(r, true));
  return (await classListAll()).map((r) => classView(r, false));
}
