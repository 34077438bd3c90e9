/**
 * The worker pool's bound and boundary (src/lib/work/work-pool.server.ts) with a stand-in worker: a task past
 * the queue bound is refused as 503 with Retry-After (RFC 9110 §15.6.4 and §10.2.3) in the shared JSON error
 * shape, stage reports arrive on the request's thread, and a worker's InputError is raised again as InputError.
 */
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { InputError, ServiceUnavailableError } from '../../../src/lib/errors';
import { errorToResponse } from '../../../src/lib/http/respond';
import { WORK_RETRY_AFTER_SECONDS, workPoolCreate } from '../../../src/lib/work/work-pool.server';
import type { WorkTask } from '../../../src/lib/work/work-tasks';

const filename = fileURLToPath(new URL('../../fixtures/work/hold-worker.mjs', import.meta.url));
const pool = workPoolCreate({ filename, threads: 1, queueMax: 2 });
afterAll(() => pool.close());

// The stand-in worker reads its own fields; the pool passes any task through unchanged.
const held = (holdMs: number, answer: unknown) => ({ holdMs, answer }) as unknown as WorkTask;

describe('work pool', () => {
  it('refuses a task once the queue is full: 503, Retry-After, the shared JSON error', async () => {
    const ok = { ok: true, value: 'built' };
    const accepted = [held(400, ok), held(50, ok), held(50, ok)].map((t) => pool.run(t));
    // One task runs on the one thread; two wait, which fills the queue of two.
    await new Promise((resolve) => setTimeout(resolve, 100));
    const refused = await pool.run(held(1, ok)).catch((err: unknown) => err);
    expect(refused).toBeInstanceOf(ServiceUnavailableError);
    const res = errorToResponse(refused, 'test');
    expect(res.status).toBe(503);
    expect(res.headers.get('retry-after')).toBe(String(WORK_RETRY_AFTER_SECONDS));
    expect(((await res.json()) as { error: { code: string; message: string } }).error).toMatchObject({
      code: 'busy',
      message: expect.stringMatching(/try again/),
    });
    expect(await Promise.all(accepted)).toEqual(['built', 'built', 'built']);
    // Once the queue drained, tasks are taken again.
    expect(await pool.run(held(1, ok))).toBe('built');
  });

  it('reports stages on the request thread and raises a worker InputError as InputError with its fields', async () => {
    const stages: string[] = [];
    const failed = await pool
      .run(held(5, { ok: false, error: { name: 'InputError', message: 'too small', fields: { scale: ['no'] } } }), {
        onStage: (stage) => stages.push(stage),
      })
      .catch((err: unknown) => err);
    expect(failed).toBeInstanceOf(InputError);
    expect((failed as InputError).fields).toEqual({ scale: ['no'] });
    expect(stages).toEqual(['held']);
  });
});
