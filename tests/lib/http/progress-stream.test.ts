/**
 * The streamed progress answer, both halves: progressResponse on the server and apiProgress in the islands,
 * joined by a fetch that hands the Request straight to the server function (no network, same Web streams).
 */
import { afterEach, describe, expect, it, vi } from 'vitest';
import { InputError } from '../../../src/lib/errors';
import { apiProgress, ApiError } from '../../../src/lib/http/client';
import type { ProgressLine } from '../../../src/lib/http/progress-lines';
import { progressResponse, type ProgressWork } from '../../../src/lib/http/progress-stream';

const request = (signal?: AbortSignal) =>
  new Request('http://127.0.0.1/api/work', { method: 'POST', headers: { accept: 'application/x-ndjson' }, signal });

function gate(): { open: () => void; opened: Promise<void> } {
  let open!: () => void;
  const opened = new Promise<void>((resolve) => (open = resolve));
  return { open, opened };
}

async function lines(res: Response): Promise<ProgressLine[]> {
  return (await res.text())
    .split('\n')
    .filter(Boolean)
    .map((l) => JSON.parse(l) as ProgressLine);
}

afterEach(() => vi.unstubAllGlobals());

describe('progressResponse', () => {
  it('answers after the first stage, while the work still runs, then streams the rest in order', async () => {
    const later = gate();
    let finished = false;
    const work: ProgressWork = async (report) => {
      report('patterns', 3);
      await later.opened;
      report('layout', 5);
      finished = true;
      return { sheets: 2 };
    };
    const res = await progressResponse(request(), 'req-1', work);
    expect(finished).toBe(false);
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toContain('application/x-ndjson');
    later.open();
    expect(await lines(res)).toEqual([
      { type: 'stage', stage: 'patterns', ms: 3 },
      { type: 'stage', stage: 'layout', ms: 5 },
      { type: 'result', data: { sheets: 2 } },
    ]);
  });

  it('answers an ordinary JSON error with its status when the work fails before its first stage', async () => {
    const res = await progressResponse(request(), 'req-2', async () => {
      throw new InputError('At 1:500 the pieces are too small.', { scaleDenominator: ['too small'] });
    });
    expect(res.status).toBe(400);
    expect(await res.json()).toEqual({
      error: {
        code: 'invalid_input',
        message: 'At 1:500 the pieces are too small.',
        fields: { scaleDenominator: ['too small'] },
      },
    });
  });

  it('ends the stream with an error line carrying the status when the work fails after a stage', async () => {
    const res = await progressResponse(request(), 'req-3', async (report) => {
      report('patterns', 1);
      await Promise.resolve();
      throw new InputError('More than 200 sheets.');
    });
    expect(await lines(res)).toEqual([
      { type: 'stage', stage: 'patterns', ms: 1 },
      { type: 'error', status: 400, error: { code: 'invalid_input', message: 'More than 200 sheets.' } },
    ]);
  });

  it('aborts the work when the client goes away, and sends no result', async () => {
    const client = new AbortController();
    const later = gate();
    let workSignal: AbortSignal | null = null;
    const res = await progressResponse(request(client.signal), 'req-4', async (report, signal) => {
      workSignal = signal;
      report('patterns', 1);
      await later.opened;
      signal.throwIfAborted();
      return 'never sent';
    });
    client.abort();
    later.open();
    expect(workSignal!.aborted).toBe(true);
    expect(await lines(res)).toEqual([{ type: 'stage', stage: 'patterns', ms: 1 }]);
  });
});

describe('apiProgress', () => {
  const serve = (work: ProgressWork) =>
    vi.stubGlobal('fetch', async (path: string, init: RequestInit) =>
      progressResponse(new Request(`http://127.0.0.1${path}`, init), 'req-c', work),
    );

  it('reports each stage to onStage and resolves with the result', async () => {
    serve(async (report) => {
      report('patterns', 2);
      report('svg', 4);
      return { ok: 'yes' };
    });
    const stages: string[] = [];
    const data = await apiProgress<{ ok: string }>('/api/work', { body: {}, onStage: (s) => stages.push(s) });
    expect(stages).toEqual(['patterns', 'svg']);
    expect(data).toEqual({ ok: 'yes' });
  });

  it('throws an ApiError with the status and fields of an error line', async () => {
    serve(async (report) => {
      report('patterns', 2);
      await Promise.resolve();
      throw new InputError('Too many sheets.', { copies: ['at most 30'] });
    });
    const err = await apiProgress('/api/work', { body: {}, onStage: () => undefined }).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(ApiError);
    expect(err).toMatchObject({ status: 400, code: 'invalid_input', fields: { copies: ['at most 30'] } });
  });
});
