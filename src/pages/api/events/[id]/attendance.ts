import { STAFF } from '../../../../lib/auth/actor';
import { actorUser } from '../../../../lib/auth/actor-require';
import { auditRecord } from '../../../../lib/db/audit';
import { attendanceList, attendanceReplace } from '../../../../lib/db/events';
import { db } from '../../../../lib/db/knex';
import { eventVisible } from '../../../../lib/events/event-access.server';
import { AttendanceSchema } from '../../../../lib/events/event-schemas';
import { InputError } from '../../../../lib/errors';
import { endpoint } from '../../../../lib/http/endpoint';
import { readJson } from '../../../../lib/http/respond';
import { parseInput } from '../../../../lib/validation';
import { BODY_BYTES_LIST } from '../../../../lib/http/body-limits';

/** How many came from each school (staff). */
export const GET = endpoint({ access: STAFF }, async ({ locals, params }) => {
  const event = await eventVisible(locals.actor, params.id ?? '');
  return { attendance: await attendanceList(event.id) };
});

/** Records attendance as a count per school (no names); replaces what was recorded before (staff). */
export const PUT = endpoint({ access: STAFF }, async (context) => {
  const staff = actorUser(context.locals.actor);
  const event = await eventVisible(context.locals.actor, context.params.id ?? '');
  const input = parseInput(AttendanceSchema, await readJson(context.request, BODY_BYTES_LIST), 'attendance');
  await db().transaction(async (trx) => {
    const ids = input.rows.map((r) => r.schoolId);
    const known = ids.length ? await trx('schools').whereIn('id', ids).pluck('id') : [];
    const unknown = ids.filter((id) => !known.includes(id));
    if (unknown.length)
      throw new InputError('Pick each school from the list.', { rows: [`Unknown school ${unknown[0]}.`] });
    await attendanceReplace(event.id, input.rows, staff.userId, trx);
  });
  await auditRecord({
    actorId: staff.userId,
    action: 'event.attendance_recorded',
    targetType: 'event',
    targetId: event.id,
    details: { schools: input.rows.length, people: input.rows.reduce((n, r) => n + r.attendeeCount, 0) },
  });
  return { attendance: await attendanceList(event.id) };
});
