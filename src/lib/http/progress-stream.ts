/**
 * Server side of the streamed answer (progress-lines.ts): runs the work, writes a line per finished stage
 * as it happens, and ends with the result or the error in the shared shape. Work that fails before its
 * first stage (a refused scale, say) gets an ordinary JSON error with its own status instead of a stream.
 * The work's AbortSignal fires when the client goes away (Cancel in the builder aborts the fetch), so it
 * stops between stages instead of finishing for nobody.
 */
import { PROGRESS_CONTENT_TYPE, type ProgressLine, type StageReport } from './progress-lines';
import { errorAnswer, errorToResponse } from './respond';

export type ProgressWork = (report: StageReport, signal: AbortSignal) => Promise<unknown>;

/** Starts `work` and answers once its first stage ends: 200 NDJSON following it, or its error as JSON. */
export async function progressResponse(request: Request, requestId: string, work: ProgressWork): Promise<Response> {
  const abort = new AbortController();
  const stopWork = () => abort.abort(new DOMException('The client cancelled the request.', 'AbortError'));
  request.signal.addEventListener('abort', stopWork, { once: true });

  const encoder = new TextEncoder();
  const channel = new TransformStream<ProgressLine, Uint8Array>({
    transform: (line, out) => out.enqueue(encoder.encode(`${JSON.stringify(line)}\n`)),
  });
  const writer = channel.writable.getWriter();
  // Lines are queued, never awaited: a write waits for the reader, and there is none until we answer.
  const send = (line: ProgressLine) => void writer.write(line).catch(() => undefined);

  let streaming = false;
  let streamBegins!: () => void;
  const begun = new Promise<void>((resolve) => (streamBegins = resolve));
  const settled = work((stage, ms) => {
    streaming = true;
    streamBegins();
    send({ type: 'stage', stage, ms });
  }, abort.signal)
    .then(
      (data) => send({ type: 'result', data }),
      (err: unknown) => {
        if (!streaming) throw err;
        if (abort.signal.aborted) return;
        const { status, body } = errorAnswer(err, requestId);
        send({ type: 'error', status, error: body });
      },
    )
    .finally(() => {
      request.signal.removeEventListener('abort', stopWork);
      void writer.close().catch(() => undefined);
    });

  try {
    await Promise.race([begun, settled]);
  } catch (err) {
    return errorToResponse(err, requestId);
  }
  return new Response(channel.readable, {
    headers: {
      'content-type': `${PROGRESS_CONTENT_TYPE}; charset=utf-8`,
      'cache-control': 'no-store',
      // Proxies that buffer (nginx) would hold the stage lines back until the end.
      'x-accel-buffering': 'no',
    },
  });
}
