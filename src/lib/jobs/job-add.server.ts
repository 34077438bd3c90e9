/**
 * Adds a job to the PostgreSQL job queue (graphile-worker's schema) with its SQL function, so a job can be added
 * inside the caller's Knex transaction: the job exists if and only if the change that asked for it committed.
 */
import type { Knex } from 'knex';
import { db } from '../db/knex';

/** The tasks the worker knows (src/lib/jobs/tasks.server.ts). */
export type JobTask = 'mail-deliver' | 'event-reminders';

export interface JobOptions {
  /** Add inside this transaction. */
  trx?: Knex;
  /** Attempts before the job is given up (graphile-worker's default is 25). */
  maxAttempts?: number;
  /** At most one pending job per key. */
  jobKey?: string;
}

/** Queues a task with a JSON payload. */
export async function jobAdd(task: JobTask, payload: unknown, options: JobOptions = {}): Promise<void> {
  await (options.trx ?? db()).raw(
    'SELECT graphile_worker.add_job(identifier => ?, payload => ?::json, max_attempts => ?::int, job_key => ?)',
    [task, JSON.stringify(payload), options.maxAttempts ?? null, options.jobKey ?? null],
  );
}
