/**
 * The streamed answer of a long request (a kit build): one JSON object per line (NDJSON). The server sends
 * a `stage` line as each stage of the work ends, then exactly one `result` or `error` line. A client asks
 * for it with `Accept: application/x-ndjson`; without that header the same endpoint answers plain JSON.
 */
import type { ErrorBody } from './respond';

export const PROGRESS_CONTENT_TYPE = 'application/x-ndjson';

export type ProgressLine =
  | { type: 'stage'; stage: string; ms: number }
  | { type: 'result'; data: unknown }
  | { type: 'error'; status: number; error: ErrorBody['error'] };

/** Reports a finished stage: its name and the milliseconds it took. */
export type StageReport = (stage: string, ms: number) => void;

/** True when the request asked for a streamed answer. */
export function progressWanted(request: Request): boolean {
  return (request.headers.get('accept') ?? '').includes(PROGRESS_CONTENT_TYPE);
}

/** A file carried in a result line (a download that streamed its progress first). */
export interface StreamedFile {
  name: string;
  type: string;
  base64: string;
}
