/**
 * Proxied reads: an object from storage streamed as an HTTP response by the app, after the route has checked
 * who may see it. Nothing in storage is ever reachable at a URL of its own.
 */
import { Readable } from 'node:stream';
import type { StoredObject } from './object-storage';

/** A 200 response streaming the object, with its type and length; `headers` adds caching and the like. */
export function storageResponse(object: StoredObject, headers: Record<string, string> = {}): Response {
  return new Response(Readable.toWeb(object.stream) as ReadableStream<Uint8Array>, {
    status: 200,
    headers: {
      'content-type': object.contentType,
      'content-length': String(object.sizeBytes),
      'x-content-type-options': 'nosniff',
      ...headers,
    },
  });
}
