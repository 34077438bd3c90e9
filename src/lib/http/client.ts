import { PROGRESS_CONTENT_TYPE, type ProgressLine, type StageReport, type StreamedFile } from './progress-lines';
import type { ErrorBody } from './respond';

/**
 * The islands' one HTTP client for the API: same-site requests with cookies, and any error answer (the
 * server's `ErrorBody`, respond.ts) thrown as an ApiError, so TanStack Query sees a failure and a form can
 * show `fields` next to its inputs. Cancels with an AbortSignal. `apiSettle` gives the same answer as a value
 * for event handlers that branch on success.
 */

/**
 * A failed API call: HTTP status (0 when the network failed), error code, message, per-field messages and,
 * on 429 or 503, how many seconds to wait before trying again.
 */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: Record<string, string[]> = {},
    readonly retryAfterSeconds?: number,
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

export interface ApiInit {
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  /** Sent as JSON. */
  body?: unknown;
  /** Sent as is with its content type, instead of a JSON body (a CSV file for the data tools). */
  text?: { contentType: string; data: string };
  /** Sent as multipart/form-data (file uploads); the browser sets the content type with its boundary. */
  form?: FormData;
  /** Query parameters; empty and undefined values are left out. */
  query?: Record<string, string | number | undefined>;
  signal?: AbortSignal;
  /** Extra request headers. */
  headers?: Record<string, string>;
}

const NETWORK_MESSAGE = 'We could not reach Kitwright. Check your connection and try again.';

function withQuery(path: string, query: ApiInit['query']): string {
  const params = new URLSearchParams();
  for (const [k, v] of Object.entries(query ?? {})) if (v !== undefined && v !== '') params.set(k, String(v));
  return params.size ? `${path}?${params}` : path;
}

async function send(path: string, init: ApiInit): Promise<Response> {
  const hasBody = init.body !== undefined || init.text !== undefined || init.form !== undefined;
  const contentType = init.text ? init.text.contentType : 'application/json';
  let res: Response;
  try {
    res = await fetch(withQuery(path, init.query), {
      method: init.method ?? (hasBody ? 'POST' : 'GET'),
      headers: { ...(hasBody && !init.form ? { 'content-type': contentType } : {}), ...init.headers },
      body: init.form ?? (init.text ? init.text.data : init.body === undefined ? undefined : JSON.stringify(init.body)),
      credentials: 'same-origin',
      signal: init.signal,
    });
  } catch (err) {
    if (init.signal?.aborted) throw err;
    throw new ApiError(0, 'network', NETWORK_MESSAGE);
  }
  if (res.ok) return res;
  throw apiErrorOf(res.status, await res.json().catch(() => null), res.headers.get('retry-after'));
}

/** The ApiError of an error answer: its status, parsed body (null when not JSON) and Retry-After header. */
function apiErrorOf(status: number, body: unknown, retryAfter: string | null): ApiError {
  const error = (body as Partial<ErrorBody> | null)?.error;
  const retry = Number(retryAfter);
  return new ApiError(
    status,
    error?.code ?? 'unknown',
    error?.message ?? `The server answered ${status}.`,
    error?.fields ?? {},
    Number.isFinite(retry) && retry > 0 ? retry : undefined,
  );
}

/** Fetches a text file (an SVG sheet) from the app; throws ApiError on an error answer. */
export async function apiText(path: string, init: ApiInit = {}): Promise<string> {
  return (await send(path, init)).text();
}

/** Calls a JSON endpoint and returns its parsed body; throws ApiError on an error answer. */
export async function api<T>(path: string, init: ApiInit = {}): Promise<T> {
  return (await (await send(path, init)).json()) as T;
}

/** An API answer as a value: the data, or the ApiError the call would have thrown. */
export type ApiSettled<T> = { ok: true; data: T } | { ok: false; error: ApiError };

/** Calls a JSON endpoint like `api`, but answers errors as a value instead of throwing them. */
export async function apiSettle<T>(path: string, init: ApiInit = {}): Promise<ApiSettled<T>> {
  try {
    return { ok: true, data: await api<T>(path, init) };
  } catch (err) {
    if (err instanceof ApiError) return { ok: false, error: err };
    throw err;
  }
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

/**
 * Posts a multipart form with XMLHttpRequest, which (unlike fetch) reports how much of the body is sent:
 * `onProgress` hears the share sent, 0 to 1. Same-site with cookies like `api`; resolves with the parsed
 * answer, throws ApiError for an error answer or a failed network, and aborts with the signal.
 */
export function apiUpload<T>(
  path: string,
  init: { form: FormData; onProgress?: (sentShare: number) => void; signal?: AbortSignal },
): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', path);
    xhr.withCredentials = true;
    xhr.responseType = 'text';
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable && e.total > 0) init.onProgress?.(e.loaded / e.total);
    };
    xhr.onload = () => {
      let body: unknown = null;
      try {
        body = JSON.parse(xhr.responseText);
      } catch {
        // Not JSON (a proxy's page): the status alone says what happened.
      }
      if (xhr.status >= 200 && xhr.status < 300) resolve(body as T);
      else reject(apiErrorOf(xhr.status, body, xhr.getResponseHeader('retry-after')));
    };
    xhr.onerror = () => reject(new ApiError(0, 'network', NETWORK_MESSAGE));
    xhr.onabort = () => reject(new DOMException('The upload was cancelled.', 'AbortError'));
    init.signal?.addEventListener('abort', () => xhr.abort(), { once: true });
    xhr.send(init.form);
  });
}
