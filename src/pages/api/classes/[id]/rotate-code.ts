import { actorUser } from '../../../../lib/auth/actor-require';
import { classOwned } from '../../../../lib/auth/class-access.server';
import { classCodeRotate } from '../../../../lib/auth/class-flows.server';
import { endpoint } from '../../../../lib/http/endpoint';

/** Gives the class a new join code and ends every class session opened with the old one (its teacher). */
export const POST = endpoint({ access: ['teacher'] }, async (context) => {
  const teacher = actorUser(context.locals.actor);
  const owned = await classOwned(teacher, context.params.id ?? '');
  const { code, ended } = await classCodeRotate(teacher, owned.id);
  return { joinCode: code, sessionsEnded: ended };
});
