/**
 * The islands' one way to call the API: JSON in, JSON out, errors as the shared `{ error: { code, message,
 * fields? } }` shape turned into an ApiFailure value (never thrown), so a form can show them next to fields.
 */
export interface ApiFailure {
  ok: false;
  status: number;
  code: string;
  message: string;
  fields: Record<string, string[]>;
  retryAfterSeconds?: number;
}

export type ApiResult<T> = { ok: true; status: number; data: T } | ApiFailure;

/** Sends a JSON request to a same-site API path and reads the answer. */
export async function apiSend<T = unknown>(method: string, path: string, body?: unknown): Promise<ApiResult<T>> {
  let res: Response;
  try {
    res = await fetch(path, {
      method,
      headers: body === undefined ? {} : { 'content-type': 'application/json' },
      body: body === undefined ? undefined : JSON.stringify(body),
      credentials: 'same-origin',
    });
  } catch {
    return {
      ok: false,
      status: 0,
      code: 'network',
      message: 'We could not reach Kitwright. Check your connection and try again.',
      fields: {},
    };
  }
  const data = (await res.json().catch(() => null)) as
    (T & { error?: { code: string; message: string; fields?: Record<string, string[]> } }) | null;
  if (res.ok) return { ok: true, status: res.status, data: data as T };
  const retry = Number(res.headers.get('retry-after'));
  return {
    ok: false,
    status: res.status,
    code: data?.error?.code ?? 'unknown',
    message: data?.error?.message ?? `The server answered ${res.status}.`,
    fields: data?.error?.fields ?? {},
    ...(Number.isFinite(retry) && retry > 0 ? { retryAfterSeconds: retry } : {}),
  };
}
