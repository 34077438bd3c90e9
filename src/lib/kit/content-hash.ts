/**
 * A content hash of a kit's inputs and the engine version: SHA-256 (FIPS 180-4) by the Web Crypto API, which
 * browsers and Node ≥ 20 both provide as globalThis.crypto, over a canonical JSON (keys sorted).
 */
import { ENGINE_VERSION } from './engine-version';

/**
 * JSON with object keys in sorted order, so equal values give equal text; undefined members are left out. A typed
 * array is written as its kind and length only: the one object that holds them (an imported mesh, MeshShape)
 * carries the SHA-256 of its stored bytes beside them, so equal text still means equal content.
 */
export function contentHashCanonicalJson(value: unknown): string {
  if (ArrayBuffer.isView(value)) return JSON.stringify(`${value.constructor.name}:${value.byteLength}`);
  if (Array.isArray(value))
    return `[${value.map((v) => (v === undefined ? 'null' : contentHashCanonicalJson(v))).join(',')}]`;
  if (value && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, v]) => v !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${contentHashCanonicalJson(v)}`).join(',')}}`;
  }
  return JSON.stringify(value) ?? 'null';
}

/** Lower-case hex SHA-256 of the canonical JSON of `{ engineVersion, input }`. */
export async function contentHash(input: unknown, engineVersion: string = ENGINE_VERSION): Promise<string> {
  const bytes = new TextEncoder().encode(contentHashCanonicalJson({ engineVersion, input }));
  const digest = await crypto.subtle.digest('SHA-256', bytes);
  return [...new Uint8Array(digest)].map((b) => b.toString(16).padStart(2, '0')).join('');
}
