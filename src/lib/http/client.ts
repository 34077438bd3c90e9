/**
 * The islands' small fetch client: JSON or text in, JSON out. A non-2xx answer with the shared body
 * `{ error: { code, message, fields? } }` becomes a thrown ApiError, so TanStack Query sees it as an error
 * and a form can put `fields` (dotted paths) next to their inputs.
 */

/** Field name (dotted path) → messages, as the API sends them. */
export type ApiFieldErrors = Record<string, string[]>;

/** An API call that did not succeed: HTTP status (0 when the server was not reached), code, message, fields. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: ApiFieldErrors = {},
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

export interface ApiRequest {
  method?: string;
  /** Sent as application/json. */
  json?: unknown;
  /** Sent as raw text with `contentType` (e.g. CSV). */
  text?: string;
  contentType?: string;
  /** Query parameters; undefined values are left out. */
  query?: Record<string, string | number | undefined>;
  signal?: AbortSignal;
}

function urlWithQuery(path: string, query: ApiRequest['query']): string {
  const entries = Object.entries(query ?? {}).filter((e): e is [string, string | number] => e[1] !== undefined);
  if (entries.length === 0) return path;
  return `${path}?${new URLSearchParams(entries.map(([k, v]) => [k, String(v)])).toString()}`;
}

/** Calls a same-site API path and returns its JSON body; throws ApiError for a failure of any kind. */
export async function apiRequest<T>(path: string, req: ApiRequest = {}): Promise<T> {
  const headers: Record<string, string> = { accept: 'application/json' };
  let body: string | undefined;
  if (req.json !== undefined) {
    headers['content-type'] = 'application/json';
    body = JSON.stringify(req.json);
  } else if (req.text !== undefined) {
    headers['content-type'] = req.contentType ?? 'text/plain';
    body = req.text;
  }
  let res: Response;
  try {
    res = await fetch(urlWithQuery(path, req.query), {
      method: req.method ?? (body === undefined ? 'GET' : 'POST'),
      headers,
      body,
      credentials: 'same-origin',
      signal: req.signal,
    });
  } catch (err) {
    if (err instanceof DOMException && err.name === 'AbortError') throw err;
    throw new ApiError(0, 'network', 'We could not reach Kitwright. Check your connection and try again.');
  }
  const data = (await res.json().catch(() => null)) as
    (T & { error?: { code?: string; message?: string; fields?: ApiFieldErrors } }) | null;
  if (res.ok) return data as T;
  const e = data?.error;
  throw new ApiError(res.status, e?.code ?? 'unknown', e?.message ?? `The server answered ${res.status}.`, e?.fields);
}

/** Shorthands for the usual calls. */
export const api = {
  get: <T>(path: string, query?: ApiRequest['query']) => apiRequest<T>(path, { query }),
  post: <T>(path: string, json: unknown) => apiRequest<T>(path, { method: 'POST', json }),
  postText: <T>(path: string, text: string, contentType: string, query?: ApiRequest['query']) =>
    apiRequest<T>(path, { method: 'POST', text, contentType, query }),
};
