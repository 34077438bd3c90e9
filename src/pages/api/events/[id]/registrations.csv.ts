import { STAFF } from '../../../../lib/auth/actor';
import { registrationList } from '../../../../lib/db/events';
import { eventVisible } from '../../../../lib/events/event-access.server';
import { registrationsCsv } from '../../../../lib/events/registrations-csv';
import { endpoint } from '../../../../lib/http/endpoint';

/** The event's registrations as CSV (staff). */
export const GET = endpoint({ access: STAFF }, async ({ locals, params }) => {
  const event = await eventVisible(locals.actor, params.id ?? '');
  return new Response(registrationsCsv(await registrationList(event.id)), {
    headers: {
      'content-type': 'text/csv; charset=utf-8',
      'content-disposition': 'attachment; filename="registrations.csv"',
      'cache-control': 'no-store',
    },
  });
});
