import { ANY_ACCOUNT } from '../../../lib/auth/actor';
import { actorUser } from '../../../lib/auth/actor-require';
import { classForActor, classOwned } from '../../../lib/auth/class-access.server';
import { ClassUpdateSchema } from '../../../lib/auth/class-schemas';
import { auditRecord } from '../../../lib/db/audit';
import { classUpdate } from '../../../lib/db/classes';
import { endpoint } from '../../../lib/http/endpoint';
import { readJson } from '../../../lib/http/respond';
import { parseInput } from '../../../lib/validation';
import { BODY_BYTES_FORM } from '../../../lib/http/body-limits';

/** One class: its teacher (with the code), staff, or a class session of that class; anyone else 404. */
export const GET = endpoint({ access: [...ANY_ACCOUNT, 'class'] }, async ({ locals, params }) => ({
  class: await classForActor(locals.actor, params.id ?? ''),
}));

/** Renames a class or changes its grade band or student count (its teacher only). */
export const PATCH = endpoint({ access: ['teacher'] }, async (context) => {
  const teacher = actorUser(context.locals.actor);
  const owned = await classOwned(teacher, context.params.id ?? '');
  const input = parseInput(ClassUpdateSchema, await readJson(context.request, BODY_BYTES_FORM), 'class change');
  await classUpdate(owned.id, input);
  await auditRecord({
    actorId: teacher.userId,
    action: 'class.updated',
    targetType: 'class',
    targetId: owned.id,
    details: input,
  });
  return { class: await classForActor(teacher, owned.id) };
});
