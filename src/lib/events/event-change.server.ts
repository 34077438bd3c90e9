/**
 * A coordinator's change to an event, applied and told to its registrants in one transaction: when a published
 * event that has not started is cancelled or moved (src/lib/events/event-change.ts), its revision goes up (the
 * calendar file's SEQUENCE) and everyone with a place or on the waiting list gets a mail through the job queue,
 * queued with the change so a change that rolls back sends nothing. A move clears the reminders already sent,
 * so the reminder comes again the day before the new date, and mails a fresh cancel link.
 */
import type { Knex } from 'knex';
import { tokenNew } from '../auth/tokens.server';
import { isUuid } from '../db/accounts';
import { eventUpdate } from '../db/events';
import { db } from '../db/knex';
import { mailSend } from '../mail/transport.server';
import { eventChangeNotice, type EventScheduleFacts } from './event-change';
import { eventCancelledMessage, eventMovedMessage } from './event-messages';
import type { EventPatch } from './event-schemas';
import { eventMailFacts, registrationCancelUrl, type EventRow } from './registration.server';

const scheduleFacts = (row: EventRow): EventScheduleFacts => ({
  state: row.state as EventScheduleFacts['state'],
  startsAt: row.starts_at,
  endsAt: row.ends_at,
  venue: row.venue,
});

/** Applies the change and queues the registrants' mails; false when no event has this id. */
export async function eventChangeApply(id: string, patch: EventPatch, site: string): Promise<boolean> {
  if (!isUuid(id)) return false;
  return db().transaction(async (trx) => {
    const before = (await trx('events').where({ id }).forUpdate().first()) as EventRow | undefined;
    if (!before || !(await eventUpdate(id, patch, trx))) return false;
    const after = (await trx('events').where({ id }).first()) as EventRow;
    const notice = eventChangeNotice(scheduleFacts(before), scheduleFacts(after), new Date());
    if (!notice) return true;
    const [{ revision }] = await trx('events').where({ id }).increment('revision', 1).returning('revision');
    const event = eventMailFacts({ ...after, revision }, site);
    if (notice === 'moved') {
      await trx('event_registrations').where({ event_id: id, state: 'confirmed' }).update({ reminder_sent_at: null });
    }
    for (const reg of await registrantsToTell(trx, id)) {
      const hasPlace = reg.state === 'confirmed';
      if (notice === 'cancelled') {
        await mailSend(eventCancelledMessage({ to: reg.email, name: reg.name, event, hasPlace }), { trx });
        continue;
      }
      // Each mail with a cancel link carries a new token (only its hash is kept): the newest mail's link works.
      const manage = tokenNew();
      await trx('event_registrations').where({ id: reg.id }).update({ manage_token_hash: manage.hash });
      const message = eventMovedMessage({
        to: reg.email,
        name: reg.name,
        event,
        before: eventMailFacts(before, site),
        hasPlace,
        cancelUrl: registrationCancelUrl(site, manage.token),
      });
      await mailSend(message, { trx });
    }
    return true;
  });
}

/** Registrations with a place or on the waiting list (a pending one never confirmed its address). */
function registrantsToTell(
  trx: Knex,
  eventId: string,
): Promise<{ id: string; name: string; email: string; state: string }[]> {
  return trx('event_registrations')
    .where({ event_id: eventId })
    .whereIn('state', ['confirmed', 'waitlisted'])
    .orderBy('created_at')
    .forUpdate()
    .select('id', 'name', 'email', 'state');
}
