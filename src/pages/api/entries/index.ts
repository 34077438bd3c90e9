import { z } from 'zod';
import { entryListForClass, entryListForTeacher, entryById } from '../../../lib/db/entries';
import { endpoint } from '../../../lib/http/endpoint';
import { json, readJson } from '../../../lib/http/respond';
import { entryCreate } from '../../../lib/journal/entry-flows.server';
import { ENTRY_REQUEST_BYTES_MAX, EntryCreateSchema } from '../../../lib/journal/entry-rules';
import { entrySummary, entryView } from '../../../lib/journal/entry-view.server';
import { classForActor } from '../../../lib/auth/class-access.server';
import { InputError } from '../../../lib/errors';
import { parseInput } from '../../../lib/validation';
import { ENTRY_AUTHORS, ENTRY_CALLERS } from './_access';

const ListQuerySchema = z.object({ classId: z.string().uuid().optional() }).strict();

/**
 * Journal entries: a class session's class, a teacher's classes (or one of them), or one class for coordinators
 * and admins (they name it with ?classId=).
 */
export const GET = endpoint({ access: ENTRY_CALLERS }, async ({ locals, url }) => {
  const { classId } = parseInput(ListQuerySchema, Object.fromEntries(url.searchParams), 'query');
  const actor = locals.actor;
  let rows;
  if (classId) rows = await entryListForClass((await classForActor(actor, classId)).id);
  else if (actor.kind === 'class') rows = await entryListForClass(actor.classId);
  else if (actor.kind === 'user' && actor.role === 'teacher') rows = await entryListForTeacher(actor.userId);
  else throw new InputError('Name the class with ?classId=; the review queue lists every submitted entry.');
  const now = new Date();
  return { entries: rows.map((r) => entrySummary(r, now)) };
});

/** Writes a draft entry (a teacher for one of their classes; a team through its class session). */
export const POST = endpoint({ access: ENTRY_AUTHORS }, async ({ locals, request }) => {
  const input = parseInput(EntryCreateSchema, await readJson(request, ENTRY_REQUEST_BYTES_MAX), 'entry');
  const id = await entryCreate(locals.actor, input);
  return json({ entry: entryView((await entryById(id))!, locals.actor) }, 201);
});
