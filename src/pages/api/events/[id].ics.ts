import { eventVisible } from '../../../lib/events/event-access.server';
import { eventIcs } from '../../../lib/events/event-ics';
import { eventPageUrl } from '../../../lib/events/registration.server';
import { siteUrl } from '../../../lib/auth/site-url';
import { endpoint } from '../../../lib/http/endpoint';

/** The event's calendar file (RFC 5545), times in UTC. */
export const GET = endpoint({ access: ['anyone'] }, async ({ locals, params, url }) => {
  const event = await eventVisible(locals.actor, params.id ?? '');
  const body = eventIcs({
    id: event.id,
    title: event.title,
    description: event.description,
    venue: event.venue,
    startsAt: new Date(event.startsAt),
    endsAt: event.endsAt ? new Date(event.endsAt) : null,
    url: eventPageUrl(siteUrl(url), event.id),
    revision: event.revision,
    cancelled: event.state === 'cancelled',
  });
  return new Response(body, {
    headers: {
      'content-type': 'text/calendar; charset=utf-8',
      'content-disposition': 'attachment; filename="event.ics"',
      'cache-control': 'no-store',
    },
  });
});
