/**
 * The reminder the day before: every confirmed registration of a published event starting within the next
 * REMINDER_LEAD_HOURS gets one mail. Rows are claimed with FOR UPDATE SKIP LOCKED and marked in the same
 * transaction that queues their mail, so two workers running this at the same moment never both send one.
 */
import { tokenNew } from '../auth/tokens.server';
import { db } from '../db/knex';
import { mailSend } from '../mail/transport.server';
import { registrationReminderMessage } from './event-messages';
import { eventMailFacts, registrationCancelUrl } from './registration.server';

/** Reminders go out from this many hours before the start. */
export const REMINDER_LEAD_HOURS = 24;

/** Sends the due reminders; returns how many this call claimed. */
export async function remindersSend(site: string, now: Date = new Date()): Promise<number> {
  const horizon = new Date(now.getTime() + REMINDER_LEAD_HOURS * 3_600_000);
  return db().transaction(async (trx) => {
    const due = await trx('event_registrations as r')
      .join('events as e', 'e.id', 'r.event_id')
      .where('r.state', 'confirmed')
      .whereNull('r.reminder_sent_at')
      .where('e.state', 'published')
      .where('e.starts_at', '>', now)
      .where('e.starts_at', '<=', horizon)
      // Whoever got their place within the lead time has just had the calendar mail; no reminder on top.
      .whereRaw(`r.confirmed_at < e.starts_at - make_interval(hours => ?)`, [REMINDER_LEAD_HOURS])
      .select(
        'r.id as registration_id',
        'r.name as registrant_name',
        'r.email as registrant_email',
        'e.id',
        'e.title',
        'e.description',
        'e.venue',
        'e.starts_at',
        'e.ends_at',
        'e.time_zone',
        'e.capacity',
        'e.state',
        'e.revision',
      )
      .forUpdate('r')
      .skipLocked();
    for (const row of due) {
      const manage = tokenNew();
      await trx('event_registrations')
        .where({ id: row.registration_id })
        .update({ reminder_sent_at: now, manage_token_hash: manage.hash });
      await mailSend(
        registrationReminderMessage({
          to: row.registrant_email,
          name: row.registrant_name,
          event: eventMailFacts(row, site),
          cancelUrl: registrationCancelUrl(site, manage.token),
        }),
        { trx },
      );
    }
    return due.length;
  });
}
