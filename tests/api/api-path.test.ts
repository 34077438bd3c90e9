/**
 * The server's own API path (src/server/api-serve.ts) answers as Astro's routing would: the same route ranking
 * (read from the route manifest Astro wrote into the build, its own priority order), HEAD as GET without a body,
 * a trailing slash ignored, and small JSON answers sent as they are while larger ones are compressed.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { request as httpRequest, type IncomingHttpHeaders } from 'node:http';
import { describe, expect, it } from 'vitest';
import { apiRouteTable } from '../../src/lib/http/api-route-table';
import { COMPRESS_THRESHOLD_BYTES } from '../../src/server/compress';
import { BASE_URL } from './harness';
import { routesOnDisk } from './routes-on-disk';

const SERVER_BUILD = join(process.cwd(), process.env.KW_OUT_DIR ?? 'dist', 'server');

/** The API routes in the order of the manifest Astro wrote into the build (it lists routes by its own priority). */
function astroManifestApiRoutes(): string[] {
  const file = readdirSync(SERVER_BUILD).find((name) => /^manifest_.*\.mjs$/.test(name));
  if (!file) throw new Error(`No Astro route manifest in ${SERVER_BUILD}; build the app first.`);
  const text = readFileSync(join(SERVER_BUILD, file), 'utf8');
  return [...text.matchAll(/"route":"(\/api\/[^"]*)"/g)].map((m) => m[1]!);
}

function head(path: string, headers: Record<string, string> = {}, method = 'GET') {
  return new Promise<{ status: number; headers: IncomingHttpHeaders; bytes: number }>((resolve, reject) => {
    const req = httpRequest(`${BASE_URL}${path}`, { method, headers }, (res) => {
      let bytes = 0;
      res.on('data', (c: Buffer) => (bytes += c.length));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, bytes }));
    });
    req.on('error', reject);
    req.end();
  });
}

describe('the API path', () => {
  it('ranks the API routes exactly as the route manifest Astro built', () => {
    const astro = astroManifestApiRoutes();
    const onDisk = [...new Set(routesOnDisk().map((r) => r.route))];
    expect(new Set(astro)).toEqual(new Set(onDisk));
    expect(apiRouteTable(onDisk.map((p) => [p, p] as const)).routes.map((r) => r.pattern)).toEqual(astro);
  });

  it('answers HEAD as GET without the body, and ignores a trailing slash', async () => {
    const got = await head('/api/health', {}, 'HEAD');
    expect(got.status).toBe(200);
    expect(got.headers['content-type']).toMatch(/^application\/json/);
    expect(got.bytes).toBe(0);
    expect((await head('/api/health/')).status).toBe(200);
  });

  it('sends a small JSON answer as it is and compresses a larger one', async () => {
    const small = await head('/api/health', { 'accept-encoding': 'br, gzip' });
    expect(Number(small.headers['content-length'])).toBeLessThan(COMPRESS_THRESHOLD_BYTES);
    expect(small.headers['content-encoding']).toBeUndefined();
    const large = await head('/api/activities', { 'accept-encoding': 'br, gzip' });
    expect(large.status).toBe(200);
    expect(large.headers['content-encoding']).toBe('br');
    expect(large.headers.vary).toMatch(/accept-encoding/i);
  });
});
