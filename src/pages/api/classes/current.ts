import { actorClass } from '../../../lib/auth/actor-require';
import { classForActor } from '../../../lib/auth/class-access.server';
import { endpoint } from '../../../lib/http/endpoint';

/** The class of this class session (name, grade band, student count; never a code or personal data). */
export const GET = endpoint({ access: ['class'] }, async ({ locals }) => {
  const actor = actorClass(locals.actor);
  return { class: await classForActor(actor, actor.classId) };
});
