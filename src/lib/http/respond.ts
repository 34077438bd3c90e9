/**
 * The one place that turns results and errors into HTTP responses for API routes. Every API error has the
 * shape `{ error: { code, message, fields?, requestId? } }`; unexpected errors are logged with a request id
 * and answered 500 with that id, never a stack trace.
 */
import { BytesResponse } from './bytes-response';
import { AppError, InputError, MethodNotAllowedError, PayloadTooLargeError, RetryLaterError } from '../errors';

export interface ErrorBody {
  error: { code: string; message: string; fields?: Record<string, string[]>; requestId?: string };
}

const JSON_HEADERS = { 'content-type': 'application/json; charset=utf-8', 'cache-control': 'no-store' };

/**
 * A JSON response with the given status, and its Content-Length: without one node sends the body chunked, a
 * chunk header and a last empty chunk around every answer (RFC 9112 §7.1). Its bytes are known at once, so it is
 * a BytesResponse (./bytes-response.ts).
 */
export function json(data: unknown, status = 200, headers: Record<string, string> = {}): Response {
  const bytes = new TextEncoder().encode(JSON.stringify(data) ?? '');
  return new BytesResponse(bytes, {
    status,
    headers: { ...JSON_HEADERS, 'content-length': String(bytes.byteLength), ...headers },
  });
}

/** A JSON error response of the shared shape. */
export function errorResponse(
  status: number,
  body: ErrorBody['error'],
  headers: Record<string, string> = {},
): Response {
  return json({ error: body }, status, headers);
}

/** An error answer before it becomes a response: status, the shared body and any extra headers. */
export interface ErrorAnswer {
  status: number;
  body: ErrorBody['error'];
  headers: Record<string, string>;
}

/** Maps any thrown value to its error answer; logs unexpected ones with the request id. */
export function errorAnswer(err: unknown, requestId: string): ErrorAnswer {
  if (err instanceof AppError) {
    const headers: Record<string, string> =
      err instanceof RetryLaterError
        ? { 'retry-after': String(Math.max(1, Math.ceil(err.retryAfterSeconds))) }
        : err instanceof MethodNotAllowedError
          ? { allow: err.allowed.join(', ') }
          : {};
    return {
      status: err.status,
      body: { code: err.code, message: err.message, ...(err.fields ? { fields: err.fields } : {}) },
      headers,
    };
  }
  console.error(`[${requestId}] unexpected error`, err);
  return {
    status: 500,
    body: {
      code: 'internal',
      message: `Something went wrong on our side. Quote request id ${requestId} if you report it.`,
      requestId,
    },
    headers: {},
  };
}

/** Maps any thrown value to a JSON error response; logs unexpected ones with the request id. */
export function errorToResponse(err: unknown, requestId: string): Response {
  const { status, body, headers } = errorAnswer(err, requestId);
  return errorResponse(status, body, headers);
}

/** Default cap for JSON request bodies, bytes. Endpoints that take more state their own limit. */
export const DEFAULT_JSON_LIMIT_BYTES = 1_000_000;

/**
 * Reads a JSON request body with a size cap: 413 above the cap, 400 for malformed JSON or a wrong
 * content type. Reads the stream so a lying Content-Length cannot get past the cap.
 */
export async function readJson(request: Request, limitBytes = DEFAULT_JSON_LIMIT_BYTES): Promise<unknown> {
  const type = request.headers.get('content-type') ?? '';
  if (!type.toLowerCase().includes('application/json')) {
    throw new InputError(
      `Send the request body as JSON (Content-Type: application/json); received "${type || 'none'}".`,
    );
  }
  const text = await readTextCapped(request, limitBytes);
  if (text.trim() === '') throw new InputError('The request body is empty; send a JSON object.');
  try {
    return JSON.parse(text);
  } catch {
    throw new InputError('The request body is not valid JSON.');
  }
}

/** Reads a request body as text, refusing (413) once it exceeds the cap. */
export async function readTextCapped(request: Request, limitBytes: number): Promise<string> {
  const declared = Number(request.headers.get('content-length') ?? NaN);
  if (Number.isFinite(declared) && declared > limitBytes) throw tooLarge(declared, limitBytes);
  if (!request.body) return '';
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > limitBytes) {
      await reader.cancel();
      throw tooLarge(total, limitBytes);
    }
    chunks.push(value);
  }
  return new TextDecoder().decode(concat(chunks, total));
}

function concat(chunks: Uint8Array[], total: number): Uint8Array {
  const out = new Uint8Array(total);
  let offset = 0;
  for (const c of chunks) {
    out.set(c, offset);
    offset += c.byteLength;
  }
  return out;
}

function tooLarge(received: number, limit: number): PayloadTooLargeError {
  return new PayloadTooLargeError(
    `The request body is larger than the ${formatBytes(limit)} this endpoint accepts${Number.isFinite(received) ? ` (received at least ${formatBytes(received)})` : ''}.`,
  );
}

/** Human bytes: "1 MB", "250 kB". */
export function formatBytes(bytes: number): string {
  if (bytes >= 1_000_000) return `${+(bytes / 1_000_000).toFixed(1)} MB`;
  if (bytes >= 1_000) return `${+(bytes / 1_000).toFixed(1)} kB`;
  return `${bytes} bytes`;
}
