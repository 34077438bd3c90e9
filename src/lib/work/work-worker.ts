/**
 * The entry of each worker thread of the pool (work-pool.server.ts; config/server-entries.mjs builds it beside the
 * server's entry.mjs). A task arrives with a MessagePort: stage reports go out on it as they happen, and an
 * "abort" coming in stops the task between stages, as it would on the request's thread. Modules load once per
 * thread, so the font bytes (kit/fonts.server.ts) are read once per worker, not per build. Each thread runs at a
 * lower CPU priority than the event loop (thread-priority.server.ts).
 */
import { isMainThread, type MessagePort } from 'node:worker_threads';
import { workErrorData, type WorkErrorData } from './work-errors';
import { workTaskRun, type WorkTask } from './work-tasks';
import { threadPriorityLower } from './thread-priority.server';

// Builds yield the cores to the event loop, which answers every other request meanwhile. The request's thread
// imports this module too (for WORK_ABORT_MESSAGE) and keeps its priority.
if (!isMainThread) threadPriorityLower();

export type WorkOutcome = { ok: true; value: unknown } | { ok: false; error: WorkErrorData };

/** What a worker sends on the task's port: a stage report as each stage ends, then the outcome. */
export type WorkMessage = { stage: string; ms: number } | { outcome: WorkOutcome };

/** The message the request's thread sends when its client went away. */
export const WORK_ABORT_MESSAGE = 'abort';

export default async function workWorker({ task, port }: { task: WorkTask; port: MessagePort }): Promise<void> {
  const abort = new AbortController();
  port.on('message', (message) => {
    if (message === WORK_ABORT_MESSAGE)
      abort.abort(new DOMException('The client cancelled the request.', 'AbortError'));
  });
  // One turn of the loop first: an abort sent while the task waited in the queue arrives before any work.
  await new Promise((resolve) => setImmediate(resolve));
  const send = (message: WorkMessage) => port.postMessage(message);
  try {
    const value = await workTaskRun(task, (stage, ms) => send({ stage, ms }), abort.signal);
    send({ outcome: { ok: true, value } });
  } catch (err) {
    send({ outcome: { ok: false, error: workErrorData(err) } });
  } finally {
    port.close();
  }
}
