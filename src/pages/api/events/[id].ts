import { STAFF } from '../../../lib/auth/actor';
import { actorUser } from '../../../lib/auth/actor-require';
import { auditRecord } from '../../../lib/db/audit';
import { siteUrl } from '../../../lib/auth/site-url';
import { eventById } from '../../../lib/db/events';
import { eventChangeApply } from '../../../lib/events/event-change.server';
import { eventVisible } from '../../../lib/events/event-access.server';
import { EventPatchSchema } from '../../../lib/events/event-schemas';
import { NotFoundError } from '../../../lib/errors';
import { endpoint } from '../../../lib/http/endpoint';
import { readJson } from '../../../lib/http/respond';
import { parseInput } from '../../../lib/validation';
import { BODY_BYTES_LONG_FORM } from '../../../lib/http/body-limits';

/** One event: anyone once published; staff always. */
export const GET = endpoint({ access: ['anyone'] }, async ({ locals, params }) => ({
  event: await eventVisible(locals.actor, params.id ?? ''),
}));

/**
 * Changes an event, publishes it (state "published") or cancels it (staff). Registrants of a published event are
 * e-mailed when it is cancelled or moved to another time or place.
 */
export const PATCH = endpoint({ access: STAFF }, async (context) => {
  const staff = actorUser(context.locals.actor);
  const id = context.params.id ?? '';
  const patch = parseInput(EventPatchSchema, await readJson(context.request, BODY_BYTES_LONG_FORM), 'event change');
  if (!(await eventChangeApply(id, patch, siteUrl(context.url)))) throw new NotFoundError('No event has this address.');
  await auditRecord({
    actorId: staff.userId,
    action: 'event.updated',
    targetType: 'event',
    targetId: id,
    details: patch,
  });
  return { event: await eventById(id) };
});
