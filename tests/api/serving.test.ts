/**
 * How the server entry (src/server/serve.ts) serves: Content-Encoding negotiated per RFC 9110 §12.5.3 (br, gzip or
 * none as Accept-Encoding allows) with the bodies decoded by node:zlib, build assets cached as immutable
 * (RFC 8246), and a streamed NDJSON answer decodable line by line while it is still streaming. Raw node:http
 * requests: fetch would negotiate and decode on its own.
 */
import { request as httpRequest, type IncomingHttpHeaders } from 'node:http';
import { brotliDecompressSync, constants, gunzipSync } from 'node:zlib';
import type { Knex } from 'knex';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { testKnex } from '../db/database';
import { BASE_URL } from './harness';
import { accountCreate, userSessionCookie } from './auth-helpers';

interface Raw {
  status: number;
  headers: IncomingHttpHeaders;
  body: Buffer;
}

function raw(path: string, headers: Record<string, string> = {}, body?: string): Promise<Raw> {
  return new Promise((resolve, reject) => {
    const req = httpRequest(`${BASE_URL}${path}`, { method: body ? 'POST' : 'GET', headers }, (res) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body: Buffer.concat(chunks) }));
      res.on('error', reject);
    });
    req.on('error', reject);
    req.end(body);
  });
}

const decoded = (r: Raw) =>
  r.headers['content-encoding'] === 'br'
    ? brotliDecompressSync(r.body)
    : r.headers['content-encoding'] === 'gzip'
      ? gunzipSync(r.body)
      : r.body;

/** The first /_astro/ script the home page loads. */
async function astroScript(): Promise<string> {
  const home = decoded(await raw('/')).toString('utf8');
  const match = home.match(/\/_astro\/[\w.-]+\.js/);
  expect(match).not.toBeNull();
  return match![0];
}

describe('compression', () => {
  it.each([
    ['br, gzip', 'br'],
    ['gzip', 'gzip'],
    ['gzip;q=0, br', 'br'],
  ])('answers an HTML page with Accept-Encoding "%s" as %s, same page as uncompressed', async (accept, encoding) => {
    const plain = await raw('/tools', {});
    expect(plain.headers['content-encoding']).toBeUndefined();
    const packed = await raw('/tools', { 'accept-encoding': accept });
    expect(packed.status).toBe(200);
    expect(packed.headers['content-encoding']).toBe(encoding);
    expect(packed.headers.vary).toMatch(/accept-encoding/i);
    expect(packed.body.length).toBeLessThan(plain.body.length / 2);
    // Pages carry per-request ids and nonces; the text up to the main content is the same.
    expect(decoded(packed).toString('utf8').slice(0, 200)).toBe(plain.body.toString('utf8').slice(0, 200));
  });

  it('compresses a JSON answer of the API above the 1 kB threshold', async () => {
    const res = await raw('/api/activities', { 'accept-encoding': 'gzip, br' });
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('br');
    expect(decoded(res).byteLength).toBeGreaterThan(1024);
    expect(JSON.parse(decoded(res).toString('utf8'))).toBeTruthy();
  });

  it('sends a JSON answer under the threshold as it is, with its Content-Length and no chunked framing', async () => {
    const res = await raw('/api/health', { 'accept-encoding': 'gzip, br' });
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBeUndefined();
    // RFC 9112 §6.1–6.3: the length is known, so the body goes without chunk headers.
    expect(res.headers['transfer-encoding']).toBeUndefined();
    expect(Number(res.headers['content-length'])).toBe(res.body.byteLength);
    expect(res.body.byteLength).toBeLessThan(1024);
    expect((JSON.parse(res.body.toString('utf8')) as { status: string }).status).toBe('ok');
  });

  it('answers a build script from its brotli twin, byte for byte the script, cached as immutable', async () => {
    const path = await astroScript();
    const plain = await raw(path);
    const packed = await raw(path, { 'accept-encoding': 'br' });
    expect(packed.headers['content-encoding']).toBe('br');
    expect(decoded(packed).equals(plain.body)).toBe(true);
    for (const r of [plain, packed]) {
      expect(r.headers['cache-control']).toBe('public, max-age=31536000, immutable');
      expect(r.headers['content-type']).toMatch(/javascript/);
    }
  });

  it('keeps API answers uncached and pages out of the immutable rule', async () => {
    const page = await raw('/tools', { 'accept-encoding': 'br' });
    expect(page.headers['cache-control'] ?? '').not.toMatch(/immutable/);
    const health = await raw('/api/health');
    expect(health.headers['cache-control'] ?? '').not.toMatch(/immutable/);
  });
});

describe('a streamed answer through compression', () => {
  let knex: Knex;
  let cookie: string;
  beforeAll(async () => {
    knex = testKnex();
    const teacher = await accountCreate(knex, { role: 'teacher', label: 'serving' });
    cookie = await userSessionCookie(knex, teacher.id);
  });
  afterAll(async () => {
    await knex?.destroy();
  });

  it('decodes the first stage line before the answer ends (the compressor is flushed per line)', async () => {
    // A scale no other test builds, so the stages run rather than the cache answering.
    const inputs = {
      modelId: 'skein-probe',
      scaleDenominator: 27,
      sheetSizeId: 'letter',
      paperGsm: 160,
      copies: 1,
      units: 'metric',
      venue: { kind: 'preset', id: 'classroom' },
    };
    // The text decodable after each chunk of the compressed body (a sync flush decodes partial input).
    let encoding: string | undefined;
    const decodedAfterChunk = await new Promise<string[]>((resolve, reject) => {
      const seen: string[] = [];
      let packed = Buffer.alloc(0);
      const req = httpRequest(
        `${BASE_URL}/api/kits/preview`,
        {
          method: 'POST',
          headers: {
            cookie,
            origin: BASE_URL,
            'content-type': 'application/json',
            accept: 'application/x-ndjson',
            'accept-encoding': 'br',
          },
        },
        (res) => {
          encoding = res.headers['content-encoding'];
          res.on('data', (c: Buffer) => {
            packed = Buffer.concat([packed, c]);
            seen.push(brotliDecompressSync(packed, { finishFlush: constants.BROTLI_OPERATION_FLUSH }).toString('utf8'));
          });
          res.on('end', () => resolve(seen));
          res.on('error', reject);
        },
      );
      req.on('error', reject);
      req.end(JSON.stringify(inputs));
    });
    expect(encoding).toBe('br');
    // Before the last chunk arrived, the patterns line could already be read whole.
    expect(decodedAfterChunk.length).toBeGreaterThanOrEqual(2);
    expect(decodedAfterChunk[decodedAfterChunk.length - 2]).toMatch(/^\{"type":"stage","stage":"patterns".*\}\n/);
    const lines = decodedAfterChunk[decodedAfterChunk.length - 1]!.split('\n')
      .filter(Boolean)
      .map((l) => JSON.parse(l) as { type: string });
    expect(lines.map((l) => l.type)).toEqual(['stage', 'stage', 'stage', 'result']);
  });
});
