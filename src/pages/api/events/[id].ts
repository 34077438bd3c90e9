import { STAFF } from '../../../lib/auth/actor';
import { actorUser } from '../../../lib/auth/actor-require';
import { auditRecord } from '../../../lib/db/audit';
import { eventById, eventUpdate } from '../../../lib/db/events';
import { eventVisible } from '../../../lib/events/event-access.server';
import { EventPatchSchema } from '../../../lib/events/event-schemas';
import { NotFoundError } from '../../../lib/errors';
import { endpoint } from '../../../lib/http/endpoint';
import { readJson } from '../../../lib/http/respond';
import { parseInput } from '../../../lib/validation';

/** One event: anyone once published; staff always. */
export const GET = endpoint({ access: ['anyone'] }, async ({ locals, params }) => ({
  event: await eventVisible(locals.actor, params.id ?? ''),
}));

/** Changes an event, publishes it (state "published") or cancels it (staff). */
export const PATCH = endpoint({ access: STAFF }, async (context) => {
  const staff = actorUser(context.locals.actor);
  const id = context.params.id ?? '';
  const patch = parseInput(EventPatchSchema, await readJson(context.request, 16_000), 'event change');
  if (!(await eventUpdate(id, patch))) throw new NotFoundError('No event has this address.');
  await auditRecord({
    actorId: staff.userId,
    action: 'event.updated',
    targetType: 'event',
    targetId: id,
    details: patch,
  });
  return { event: await eventById(id) };
});
