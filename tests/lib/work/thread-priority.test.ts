/**
 * A pool worker's lower CPU priority (src/lib/work/thread-priority.server.ts): the nice value lands on the calling
 * thread alone, read back from the kernel's own record of each thread (proc(5): /proc/PID/task/TID/stat, field 19
 * "nice"), while the process's main thread keeps its own. Linux only, like the mechanism.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';
import { describe, expect, it } from 'vitest';
import { WORK_THREAD_NICE, threadIdKernel } from '../../../src/lib/work/thread-priority.server';

/** Field 19 (nice) of /proc/PID/task/TID/stat; the fields after the parenthesised command name start at 3. */
function niceOf(tid: number): number {
  const stat = readFileSync(`/proc/${process.pid}/task/${tid}/stat`, 'utf8');
  return Number(stat.slice(stat.lastIndexOf(')') + 2).split(' ')[19 - 3]);
}

const linux = process.platform === 'linux';

describe.runIf(linux)('worker thread priority', () => {
  it('lowers the calling worker thread to WORK_THREAD_NICE and leaves the main thread as it was', async () => {
    const main = threadIdKernel()!;
    const mainBefore = niceOf(main);
    // The module, loaded in a worker thread of this process through tsx's require (the TypeScript loader).
    const source = fileURLToPath(new URL('../../../src/lib/work/thread-priority.server.ts', import.meta.url));
    const worker = new Worker(
      `const m = require('tsx/cjs/api').require(${JSON.stringify(source)}, ${JSON.stringify(source)});\n` +
        `require('node:worker_threads').parentPort.postMessage(m.threadPriorityLower());`,
      { eval: true },
    );
    const tid = (await new Promise((resolve, reject) => {
      worker.once('message', resolve);
      worker.once('error', reject);
    })) as number;
    try {
      expect(tid).not.toBe(main);
      expect(niceOf(tid)).toBe(WORK_THREAD_NICE);
      expect(niceOf(main)).toBe(mainBefore);
    } finally {
      await worker.terminate();
    }
  });
});
