/**
 * The job queue's tasks: deliver one mail (retried by the queue with backoff; the last failure becomes a dead
 * letter) and send the day-before event reminders (run hourly by the crontab in worker.server.ts).
 */
import type { JobHelpers, Task, TaskList } from 'graphile-worker';
import { db } from '../db/knex';
import { remindersSend } from '../events/reminders.server';
import type { MailMessage } from '../mail/message';
import { mailDeliver } from '../mail/transport.server';
import { serverConfig } from '../server-config';

function isMailMessage(payload: unknown): payload is MailMessage {
  const m = payload as Partial<MailMessage> | null;
  return Boolean(m && typeof m.to === 'string' && typeof m.subject === 'string' && typeof m.text === 'string');
}

/** Delivers one queued message; on its last attempt a refusal is written to mail_dead_letters instead of thrown. */
export const mailDeliverTask: Task = async (payload: unknown, helpers: JobHelpers) => {
  if (!isMailMessage(payload)) {
    helpers.logger.error('mail-deliver: payload is not a message; dropped');
    return;
  }
  try {
    await mailDeliver(payload);
  } catch (err) {
    if (helpers.job.attempts < helpers.job.max_attempts) throw err;
    await db()('mail_dead_letters').insert({
      to_address: payload.to,
      subject: payload.subject,
      last_error: err instanceof Error ? err.message : String(err),
      attempts: helpers.job.attempts,
    });
    helpers.logger.error(`mail-deliver: gave up on "${payload.subject}" after ${helpers.job.attempts} attempts`);
  }
};

export const eventRemindersTask: Task = async (_payload, helpers) => {
  const sent = await remindersSend(serverConfig('SITE_URL') ?? 'http://127.0.0.1:4321');
  if (sent > 0) helpers.logger.info(`event-reminders: ${sent} reminder(s) queued`);
};

export const JOB_TASKS: TaskList = {
  'mail-deliver': mailDeliverTask,
  'event-reminders': eventRemindersTask,
};
