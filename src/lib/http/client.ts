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
}

async function send(path: string, init: ApiInit): Promise<Response> {
  let res: Response;
  try {
    res = await fetch(path, {
      method: init.method ?? (init.body === undefined ? 'GET' : 'POST'),
      headers: init.body === undefined ? {} : { 'content-type': 'application/json' },
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

/** Calls an endpoint that answers a file; returns it with the name from Content-Disposition. */
export async function apiFile(path: string, init: ApiInit = {}): Promise<{ blob: Blob; fileName: string }> {
  const res = await send(path, init);
  const disposition = res.headers.get('content-disposition') ?? '';
  const fileName = /filename="([^"]+)"/.exec(disposition)?.[1] ?? 'kit';
  return { blob: await res.blob(), fileName };
}
