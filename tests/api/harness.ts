/** Helpers for API tests against the running test server (scripts/test.ts sets the URLs). */
export const BASE_URL = process.env.KW_TEST_BASE_URL ?? 'http://127.0.0.1:4322';
export const MAIL_URL = process.env.KW_TEST_MAIL_URL ?? 'http://127.0.0.1:2581';

/** fetch against the test server with a path. */
export function api(path: string, init: RequestInit = {}): Promise<Response> {
  return fetch(`${BASE_URL}${path}`, { redirect: 'manual', ...init });
}

/** POST a JSON body (any value; strings are sent as they are). */
export function postJson(path: string, body: unknown, headers: Record<string, string> = {}): Promise<Response> {
  return api(path, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: BASE_URL, ...headers },
    body: typeof body === 'string' ? body : JSON.stringify(body),
  });
}
