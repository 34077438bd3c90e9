/**
 * Answers the server entry (src/server/serve.ts) gives before Astro sees a request, in the API's own JSON error
 * shape: an /api/ request-target whose dot segments (`..`, `%2e%2e`, `.%2e`) climb out of /api/ — URL parsing
 * (WHATWG URL, as Astro does it) resolves them, so Astro would route `/api/%2e%2e/health` to the HTML 404 page —
 * and a request line or head that node:http cannot parse, which node would answer with an empty 400.
 */
import { errorAnswer } from './respond';
import { InputError, NotFoundError, PayloadTooLargeError } from '../errors';

const API_PREFIX = '/api/';

/**
 * The origin-form (path and query) of an absolute-form request-target (`GET http://host/api/health`, which
 * RFC 9112 §3.2.2 says a server must accept), with its authority for the Host header; null for any other form.
 */
export function rawTargetOriginForm(target: string): { path: string; host: string } | null {
  if (!/^https?:\/\//i.test(target)) return null;
  try {
    const url = new URL(target);
    return { path: `${url.pathname}${url.search}`, host: url.host };
  } catch {
    return null;
  }
}

/** The JSON 400 for a request-target that is neither a path nor an absolute URL (`*`, `host:port`). */
export function rawTargetUnusable(target: string, requestId: string): { status: number; body: string } {
  const shown = target.length > 200 ? `${target.slice(0, 200)}…` : target;
  const { status, body } = errorAnswer(
    new InputError(`The request-target "${shown}" is not a path such as /api/health.`),
    requestId,
  );
  return { status, body: JSON.stringify({ error: body }) };
}

/** True when the raw request-target names /api/ but its resolved path lies outside /api/. */
export function rawTargetLeavesApi(target: string): boolean {
  // Only a dot segment climbs, and one is written with a dot or its escape: most targets need no URL parse.
  if (!target.startsWith(API_PREFIX) || !/\.|%2e/i.test(target)) return false;
  try {
    return !new URL(target, 'http://target.invalid').pathname.startsWith(API_PREFIX);
  } catch {
    return true;
  }
}

/** The JSON 404 for such a target, with the request id. */
export function rawTargetAnswer(target: string, requestId: string): { status: number; body: string } {
  const shown = target.length > 200 ? `${target.slice(0, 200)}…` : target;
  const { status, body } = errorAnswer(
    new NotFoundError(
      `No API route answers ${shown}: its dot segments lead outside /api/. Send the path without "." or ".." segments.`,
    ),
    requestId,
  );
  return { status, body: JSON.stringify({ error: body }) };
}

/**
 * A whole raw HTTP/1.1 answer for a request node:http could not parse (its `clientError` event): 431 for a head
 * above node's header size limit, 400 for anything else. The connection closes after it.
 */
export function clientErrorAnswer(parserCode: string | undefined, requestId: string): string {
  const headTooLarge = parserCode === 'HPE_HEADER_OVERFLOW';
  const err = headTooLarge
    ? new PayloadTooLargeError('The request line and headers are too large; send a shorter URL and fewer cookies.')
    : new InputError('The request is not well-formed HTTP/1.1 (request line, header or body framing).');
  const { body } = errorAnswer(err, requestId);
  const status = headTooLarge ? 431 : 400;
  const text = JSON.stringify({ error: body });
  return (
    `HTTP/1.1 ${status} ${headTooLarge ? 'Request Header Fields Too Large' : 'Bad Request'}\r\n` +
    'content-type: application/json; charset=utf-8\r\ncache-control: no-store\r\n' +
    `content-length: ${new TextEncoder().encode(text).byteLength}\r\nx-request-id: ${requestId}\r\nconnection: close\r\n\r\n${text}`
  );
}
