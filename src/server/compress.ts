/**
 * Compression of the server's answers: the `compression` middleware (brotli or gzip, as the client accepts),
 * flushed after every write of a streamed NDJSON answer so each stage line reaches the client when it happens.
 */
import type { IncomingMessage, ServerResponse } from 'node:http';
import compression from 'compression';
import { PROGRESS_CONTENT_TYPE } from '../lib/http/progress-lines';

/**
 * Smaller bodies go out as they are: they cost more to compress than they save (1 kB is the middleware's own
 * default). The middleware can only see the size of an answer that states its Content-Length, as the API's
 * JSON does (src/lib/http/respond.ts).
 */
export const COMPRESS_THRESHOLD_BYTES = 1024;

const compress = compression({
  threshold: COMPRESS_THRESHOLD_BYTES,
  // The media-type list the middleware consults does not know NDJSON; its result line holds every sheet's SVG.
  filter: (req, res) =>
    String(res.getHeader('content-type') ?? '').startsWith(PROGRESS_CONTENT_TYPE) || compression.filter(req, res),
});

/** Flushes the compressor after each write of a streamed progress answer, so no stage line waits in a buffer. */
function flushStreamedLines(res: ServerResponse & { flush?: () => void }): void {
  const write = res.write.bind(res) as (...args: unknown[]) => boolean;
  res.write = ((...args: unknown[]) => {
    const ok = write(...args);
    if (String(res.getHeader('content-type') ?? '').startsWith(PROGRESS_CONTENT_TYPE)) res.flush?.();
    return ok;
  }) as ServerResponse['write'];
}

/** Runs `answer` with the response behind the compressor. */
export function compressed(req: IncomingMessage, res: ServerResponse, answer: () => void): void {
  compress(req as Parameters<typeof compress>[0], res as Parameters<typeof compress>[1], () => {
    flushStreamedLines(res);
    answer();
  });
}
