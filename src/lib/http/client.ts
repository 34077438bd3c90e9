import { PROGRESS_CONTENT_TYPE, type ProgressLine, type StageReport, type StreamedFile } from './progress-lines';

/**
 * The islands' small HTTP client for the JSON API: same-site requests with cookies, and any error answer
 * (the shared `{ error: { code, message, fields? } }` body) thrown as an ApiError, so TanStack Query sees
 * a failure and a form can show `fields` next to its inputs. Cancels with an AbortSignal.
 */

/** A failed API call: HTTP status (0 when the network failed), error code, message and per-field messages. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: Record<string, string[]> = {},
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

export interface ApiInit {
  method?: 'GET' | 'POST' | 'PATCH' | 'DELETE';
  /** Sent as JSON. */
  body?: unknown;
  signal?: AbortSignal;
  /** Extra request headers. */
  headers?: Record<string, string>;
}

async function send(path: string, init: ApiInit): Promise<Response> {
  let res: Response;
  try {
    res = await fetch(path, {
      method: init.method ?? (init.body === undefined ? 'GET' : 'POST'),
      headers: { ...(init.body === undefined ? {} : { 'content-type': 'application/json' }), ...init.headers },
      body: init.body === undefined ? undefined : JSON.stringify(init.body),
      credentials: 'same-origin',
      signal: init.signal,
    });
  } catch (err) {
    if (init.signal?.aborted) throw err;
    throw new ApiError(0, 'network', 'We could not reach Kitwright. Check your connection and try again.');
  }
  if (res.ok) return res;
  const data = (await res.json().catch(() => null)) as {
    error?: { code?: string; message?: string; fields?: Record<string, string[]> };
  } | null;
  throw new ApiError(
    res.status,
    data?.error?.code ?? 'unknown',
    data?.error?.message ?? `The server answered ${res.status}.`,
    data?.error?.fields ?? {},
  );
}

/** Calls a JSON endpoint and returns its parsed body; throws ApiError on an error answer. */
export async function api<T>(path: string, init: ApiInit = {}): Promise<T> {
  return (await (await send(path, init)).json()) as T;
}

/**
 * Calls an endpoint that streams its progress (progress-lines.ts): `onStage` hears each finished stage as
 * the server reports it; resolves with the result line's data and throws ApiError for the error line.
 */
export async function apiProgress<T>(path: string, init: ApiInit & { onStage: StageReport }): Promise<T> {
  const res = await send(path, { ...init, headers: { ...init.headers, accept: PROGRESS_CONTENT_TYPE } });
  const reader = res.body!.pipeThrough(new TextDecoderStream()).getReader();
  let buffered = '';
  for (;;) {
    const { done, value } = await reader.read();
    buffered += value ?? '';
    const lines = buffered.split('\n');
    buffered = done ? '' : lines.pop()!;
    for (const text of lines) {
      if (!text.trim()) continue;
      const line = JSON.parse(text) as ProgressLine;
      if (line.type === 'stage') init.onStage(line.stage, line.ms);
      else if (line.type === 'result') return line.data as T;
      else throw new ApiError(line.status, line.error.code, line.error.message, line.error.fields ?? {});
    }
    if (done) throw new ApiError(0, 'network', 'The connection closed before the build finished. Try again.');
  }
}

/** A file from an endpoint that streams its progress and ends with a StreamedFile, with its name. */
export async function apiFileProgress(
  path: string,
  init: ApiInit & { onStage: StageReport },
): Promise<{ blob: Blob; fileName: string }> {
  const file = await apiProgress<StreamedFile>(path, init);
  const bytes = Uint8Array.from(atob(file.base64), (c) => c.charCodeAt(0));
  return { blob: new Blob([bytes], { type: file.type }), fileName: file.name };
}
