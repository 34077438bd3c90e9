import { STAFF } from '../../../lib/auth/actor';
import { actorUser } from '../../../lib/auth/actor-require';
import { auditRecord } from '../../../lib/db/audit';
import { eventById, eventInsert, eventListAll, eventListPublished } from '../../../lib/db/events';
import { actorIsStaff } from '../../../lib/events/event-access.server';
import { EventCreateSchema } from '../../../lib/events/event-schemas';
import { endpoint } from '../../../lib/http/endpoint';
import { json, readJson } from '../../../lib/http/respond';
import { parseInput } from '../../../lib/validation';
import { BODY_BYTES_LONG_FORM } from '../../../lib/http/body-limits';

/** Published upcoming events for anyone; every event for staff with ?all=1. */
export const GET = endpoint({ access: ['anyone'] }, async ({ locals, url }) => ({
  events:
    url.searchParams.get('all') === '1' && actorIsStaff(locals.actor)
      ? await eventListAll()
      : await eventListPublished(),
}));

/** Creates an event as a draft (coordinators and admins). */
export const POST = endpoint({ access: STAFF }, async (context) => {
  const staff = actorUser(context.locals.actor);
  const input = parseInput(EventCreateSchema, await readJson(context.request, BODY_BYTES_LONG_FORM), 'event');
  const id = await eventInsert(input, staff.userId);
  await auditRecord({
    actorId: staff.userId,
    action: 'event.created',
    targetType: 'event',
    targetId: id,
    details: { title: input.title },
  });
  return json({ event: await eventById(id) }, 201);
});
