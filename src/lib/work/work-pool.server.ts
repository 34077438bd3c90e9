/**
 * The worker pool for CPU-heavy work (kit builds and their PDF, SVG, STL and JSON files): piscina threads,
 * so one request's build never stalls every other request on the event loop. The queue is bounded: when
 * WORK_QUEUE_MAX_PER_THREAD tasks per thread already wait, a new one is refused with 503 and Retry-After
 * instead of making everyone wait longer. Stage reports and cancel cross the boundary on a MessagePort per task.
 */
import { availableParallelism } from 'node:os';
import { MessageChannel } from 'node:worker_threads';
import { Piscina } from 'piscina';
import workerUrl from 'virtual:kitwright/work-worker';
import { ServiceUnavailableError } from '../errors';
import type { StageReport } from '../http/progress-lines';
import { workErrorRaise } from './work-errors';
import type { WorkTask } from './work-tasks';
import { WORK_ABORT_MESSAGE, type WorkMessage, type WorkOutcome } from './work-worker';
import { serverConfig } from '../server-config';

/** Tasks that may wait per thread before new ones are refused. // common practice, no source */
export const WORK_QUEUE_MAX_PER_THREAD = 4;
/** Retry-After of a refused task, seconds: a few builds' time. // common practice, no source */
export const WORK_RETRY_AFTER_SECONDS = 5;

export interface WorkRunOptions {
  signal?: AbortSignal;
  onStage?: StageReport;
}

export interface WorkPool {
  run(task: WorkTask, options?: WorkRunOptions): Promise<unknown>;
  close(): Promise<void>;
}

/** A pool of `threads` workers running `filename` (a built work-worker), refusing tasks past `queueMax` waiting. */
export function workPoolCreate(o: { filename: string; threads: number; queueMax: number }): WorkPool {
  const pool = new Piscina({
    filename: o.filename,
    minThreads: o.threads,
    maxThreads: o.threads,
    // The queue bound is ours (below), so a full queue is a 503 with Retry-After, not piscina's own error.
    maxQueue: o.queueMax + 1,
    idleTimeout: 60 * 60_000,
  });
  return {
    async run(task, options = {}) {
      if (pool.queueSize >= o.queueMax)
        throw new ServiceUnavailableError(
          'The server is busy building other kits; try again in a few seconds.',
          WORK_RETRY_AFTER_SECONDS,
        );
      options.signal?.throwIfAborted();
      const { port1, port2 } = new MessageChannel();
      // Stages and then the outcome come on this one port, in the order they were sent.
      const outcome = new Promise<WorkOutcome>((resolve) =>
        port1.on('message', (m: WorkMessage) =>
          'outcome' in m ? resolve(m.outcome) : options.onStage?.(m.stage, m.ms),
        ),
      );
      // Not piscina's own signal option: that ends the whole thread, font and all, when a running task is cancelled.
      const cancel = () => port1.postMessage(WORK_ABORT_MESSAGE);
      options.signal?.addEventListener('abort', cancel, { once: true });
      try {
        // A thread that dies rejects here; one that finishes has already sent its outcome.
        const ran = pool.run({ task, port: port2 }, { transferList: [port2] }).then(() => outcome);
        const done = await Promise.race([outcome, ran]);
        if (!done.ok) throw workErrorRaise(done.error);
        return done.value;
      } finally {
        options.signal?.removeEventListener('abort', cancel);
        port1.close();
      }
    },
    close: () => pool.close(),
  };
}

/** Threads of the app's pool: KW_WORK_THREADS, else one per core but one, which the event loop keeps. */
function threadCount(): number {
  return serverConfig('KW_WORK_THREADS') ?? Math.max(1, availableParallelism() - 1);
}

let appPool: WorkPool | undefined;

/** Runs a task on the app's pool; on this thread where there is no built worker (the dev server). */
export async function workRun(task: WorkTask, options: WorkRunOptions = {}): Promise<unknown> {
  if (!workerUrl) {
    const { workTaskRun } = await import('./work-tasks');
    return workTaskRun(task, options.onStage ?? (() => undefined), options.signal ?? new AbortController().signal);
  }
  const threads = threadCount();
  appPool ??= workPoolCreate({
    filename: workerUrl,
    threads,
    queueMax: threads * WORK_QUEUE_MAX_PER_THREAD,
  });
  return appPool.run(task, options);
}
