import { ANY_ACCOUNT } from '../../../lib/auth/actor';
import { actorUser } from '../../../lib/auth/actor-require';
import { classListForActor, classForActor } from '../../../lib/auth/class-access.server';
import { classCreate } from '../../../lib/auth/class-flows.server';
import { ClassCreateSchema } from '../../../lib/auth/class-schemas';
import { endpoint } from '../../../lib/http/endpoint';
import { json, readJson } from '../../../lib/http/respond';
import { parseInput } from '../../../lib/validation';
import { BODY_BYTES_FORM } from '../../../lib/http/body-limits';

/** A teacher's own classes (with join codes); every class for coordinators and admins (without codes). */
export const GET = endpoint({ access: ANY_ACCOUNT }, async ({ locals }) => ({
  classes: await classListForActor(actorUser(locals.actor)),
}));

/** Creates a class: name, grade band and a student count only (teachers). */
export const POST = endpoint({ access: ['teacher'] }, async (context) => {
  const teacher = actorUser(context.locals.actor);
  const input = parseInput(ClassCreateSchema, await readJson(context.request, BODY_BYTES_FORM), 'class');
  const id = await classCreate(teacher, input);
  return json({ class: await classForActor(teacher, id) }, 201);
});
