/**
 * Lowers the CPU priority of the calling thread, so the pool's workers (work-worker.ts) take the cores only when
 * the event loop does not need them: a build may take longer, but every other request keeps its latency (issue 16:
 * GET /api/health p99 while four clients build). Linux schedules threads one by one: setpriority(2) with a thread
 * id changes that thread alone ("a bug in POSIX, relied upon": man 2 setpriority, NOTES), and node's
 * os.setPriority is setpriority. Raising a nice value needs no privilege. Elsewhere it does nothing.
 */
import { readlinkSync } from 'node:fs';
import { setPriority } from 'node:os';

/** The nice value of a pool worker: well below the event loop's 0, above the idle 19. // common practice, no source */
export const WORK_THREAD_NICE = 10;

/** The calling thread's kernel id (Linux /proc/thread-self → "PID/task/TID"), or null where there is none. */
export function threadIdKernel(): number | null {
  try {
    const tid = Number(readlinkSync('/proc/thread-self').split('/').pop());
    return Number.isInteger(tid) && tid > 0 ? tid : null;
  } catch {
    return null;
  }
}

/** Sets the calling thread's nice value; the thread id it changed, or null where threads have no id of their own. */
export function threadPriorityLower(nice = WORK_THREAD_NICE): number | null {
  const tid = threadIdKernel();
  if (tid === null) return null;
  try {
    setPriority(tid, nice);
    return tid;
  } catch {
    return null;
  }
}
