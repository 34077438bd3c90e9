/**
 * The job queue against a scratch database: two workers (two graphile-worker runners, each with its own
 * connection pool, as two app instances would have) send each day-before reminder exactly once; a mail the SMTP
 * server refuses is retried and then recorded as a dead letter.
 */
import { createServer } from 'node:net';
import type { Runner } from 'graphile-worker';
import { SMTPServer } from 'smtp-server';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { knexFor, migrateLatest } from '../../scripts/lib/migrate';
import { scratchDatabaseCreate } from './database';

async function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const s = createServer();
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address() as { port: number };
      s.close(() => resolve(port));
    });
  });
}

/** An SMTP server that accepts mail, except to @refused.example, which it refuses with 550. */
async function smtpStart(port: number) {
  const accepted: string[] = [];
  let refusals = 0;
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    onRcptTo(address, _session, cb) {
      if (address.address.endsWith('@refused.example')) {
        refusals += 1;
        return cb(Object.assign(new Error('mailbox unavailable'), { responseCode: 550 }));
      }
      cb();
    },
    onData(stream, session, cb) {
      stream.resume();
      stream.on('end', () => {
        accepted.push(...session.envelope.rcptTo.map((r) => r.address));
        cb();
      });
    },
  });
  await new Promise<void>((resolve) => server.listen(port, '127.0.0.1', () => resolve()));
  return { accepted, refusals: () => refusals, close: () => new Promise<void>((r) => server.close(() => r())) };
}

async function until(check: () => Promise<boolean>, timeoutMs: number): Promise<void> {
  const end = Date.now() + timeoutMs;
  while (!(await check())) {
    if (Date.now() > end) throw new Error('timed out waiting');
    await new Promise((r) => setTimeout(r, 100));
  }
}

describe('job queue', () => {
  let url: string;
  let knex: ReturnType<typeof knexFor>;
  let smtp: Awaited<ReturnType<typeof smtpStart>>;
  const runners: Runner[] = [];

  beforeAll(async () => {
    url = await scratchDatabaseCreate('kitwright_jobs_check');
    await migrateLatest(url);
    knex = knexFor(url);
    const port = await freePort();
    smtp = await smtpStart(port);
    process.env.DATABASE_URL = url;
    process.env.SMTP_URL = `smtp://127.0.0.1:${port}`;
    process.env.SITE_URL = 'http://127.0.0.1:4321';
    const { jobWorkerStart } = await import('../../src/lib/jobs/worker.server');
    for (let i = 0; i < 2; i++) runners.push(await jobWorkerStart({ connectionString: url, noCron: true }));
  }, 60_000);

  afterAll(async () => {
    await Promise.all(runners.map((r) => r.stop()));
    const { dbClose } = await import('../../src/lib/db/knex');
    await dbClose();
    await knex?.destroy();
    await smtp?.close();
  });

  const pendingJobs = async () => Number((await knex.raw('SELECT count(*) AS n FROM graphile_worker.jobs')).rows[0].n);

  it('sends each reminder once when two workers run the same hour’s job at the same time', async () => {
    const [event] = await knex('events')
      .insert({
        title: 'Night-sky build',
        kind: 'workshop',
        starts_at: new Date(Date.now() + 12 * 3_600_000),
        time_zone: 'UTC',
        state: 'published',
        published_at: new Date(),
      })
      .returning('id');
    const confirmedAt = new Date(Date.now() - 3 * 86_400_000);
    const emails = ['a@school.example', 'b@school.example', 'c@school.example'];
    await knex('event_registrations').insert([
      ...emails.map((email) => ({
        event_id: event.id,
        name: email,
        email,
        state: 'confirmed',
        confirmed_at: confirmedAt,
        queued_at: confirmedAt,
        manage_token_hash: `h-${email}`,
      })),
      {
        event_id: event.id,
        name: 'w',
        email: 'wait@school.example',
        state: 'waitlisted',
        queued_at: confirmedAt,
        manage_token_hash: 'h-wait',
      },
    ]);
    const { jobAdd } = await import('../../src/lib/jobs/job-add.server');
    // The same hour's job twice, added at once: both runners pick one each and run them concurrently.
    await Promise.all([jobAdd('event-reminders', {}), jobAdd('event-reminders', {})]);
    // And the claim itself, twice at the same moment, outside the queue.
    const { remindersSend } = await import('../../src/lib/events/reminders.server');
    const direct = await Promise.all([remindersSend('http://x.example'), remindersSend('http://x.example')]);
    await until(async () => (await pendingJobs()) === 0, 20_000);
    await new Promise((r) => setTimeout(r, 300));
    const reminded = smtp.accepted.filter((a) => emails.includes(a)).sort();
    expect(reminded).toEqual(emails);
    expect(smtp.accepted).not.toContain('wait@school.example');
    expect(direct[0] + direct[1]).toBeLessThanOrEqual(emails.length);
    const rows = await knex('event_registrations').where({ event_id: event.id, state: 'confirmed' });
    expect(rows.every((r) => r.reminder_sent_at !== null)).toBe(true);
  }, 30_000);

  it('retries a refused delivery and then records a dead letter', async () => {
    const { jobAdd } = await import('../../src/lib/jobs/job-add.server');
    await jobAdd(
      'mail-deliver',
      { to: 'nobody@refused.example', subject: 'Refused on purpose', text: 't', html: '<p>t</p>' },
      { maxAttempts: 2 },
    );
    // graphile-worker waits e^1 ≈ 2.7 s before the second attempt.
    await until(async () => (await knex('mail_dead_letters').count({ n: '*' }).first())!.n !== '0', 15_000);
    const dead = await knex('mail_dead_letters').first();
    expect(dead.to_address).toBe('nobody@refused.example');
    expect(dead.subject).toBe('Refused on purpose');
    expect(dead.attempts).toBe(2);
    expect(dead.last_error).toMatch(/550|mailbox unavailable/);
    expect(smtp.refusals()).toBe(2);
    expect(await pendingJobs()).toBe(0);
  }, 30_000);
});
