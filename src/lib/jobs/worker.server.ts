/**
 * Starts the job worker inside the app process (the built server's entry calls it, so `npm start` and `npm test`
 * run it). graphile-worker: jobs wait in PostgreSQL, each is locked by one worker at a time, new jobs are
 * picked up by LISTEN/NOTIFY, and the crontab's hourly tick is scheduled once across every app instance.
 */
import { Logger, run, runMigrations, type Runner } from 'graphile-worker';
import { JOB_TASKS } from './tasks.server';

/** Every hour on the hour, with up to two missed hours filled after a restart. */
export const JOB_CRONTAB = '0 * * * * event-reminders ?fill=2h';

export interface JobWorkerOptions {
  connectionString: string;
  concurrency?: number;
  /** Run without the crontab (tests that drive the tasks themselves). */
  noCron?: boolean;
}

/** Installs or updates the queue's own schema (graphile_worker); idempotent. */
export async function jobSchemaMigrate(connectionString: string): Promise<void> {
  await runMigrations({ connectionString, logger: quietLogger() });
}

/** A worker running until `stop()`. */
export async function jobWorkerStart(options: JobWorkerOptions): Promise<Runner> {
  return run({
    connectionString: options.connectionString,
    concurrency: options.concurrency ?? 2,
    maxPoolSize: (options.concurrency ?? 2) + 2,
    noHandleSignals: true,
    pollInterval: 2000,
    taskList: JOB_TASKS,
    crontab: options.noCron ? '' : JOB_CRONTAB,
    logger: quietLogger(),
  });
}

/** Warnings and errors only: a job picked up is not news. */
function quietLogger(): Logger {
  return new Logger(() => (level, message) => {
    if (level === 'error') console.error(`[jobs] ${message}`);
    else if (level === 'warning') console.warn(`[jobs] ${message}`);
  });
}
