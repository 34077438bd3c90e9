/**
 * The fuzz suite: property-based requests (fast-check) against the running server, for every API route on disk
 * (routes-on-disk.ts, so a route added later is covered when its file exists). Each state-changing route gets
 * KW_FUZZ_CASES cases (200 unless set; raise it for a longer hunt, KW_FUZZ_SEED to replay a failure) derived from
 * the zod schemas its own file checks input with (route-input-schemas.plugin.ts, fuzz-arbitrary.ts): plausible
 * bodies with hostile values inside, malformed JSON, wrong content types, empty and oversize bodies, fuzzed path
 * parameters and query strings, each sent by a caller the route admits. Then every route with the methods it does
 * not answer, and malformed URLs and request lines.
 *
 * Every answer must hold the contract of the API (README's API map, respond.ts): never a 5xx; a 4xx is JSON
 * `{ error: { code, message } }` with both non-empty; every answer within ANSWER_MS_MAX.
 */
import fc from 'fast-check';
import type { Knex } from 'knex';
import type { ZodTypeAny } from 'zod';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { testKnex } from '../db/database';
import { SKEIN_KIT_INPUTS } from '../fixtures/kit-settings';
import { accountCreate, classCreateDirect, classSessionCookie, userSessionCookie } from './auth-helpers';
import type { TestAccount } from './auth-helpers';
import { hostileValue, zodArbitrary } from './fuzz-arbitrary';
import { fuzzClientClose, fuzzSend, fuzzSendRaw, type FuzzAnswer, type FuzzRequest } from './fuzz-client';
import { ROUTE_INPUT_SCHEMAS_EXPORT } from './route-input-schemas.plugin';
import { routesOnDisk, type RouteOnDisk } from './routes-on-disk';

/** Cases per state-changing route. */
const CASES = Number(process.env.KW_FUZZ_CASES ?? 200);
/** Cases per read-only route (query strings and path parameters only). */
const READ_CASES = Math.max(20, Math.round(CASES / 5));
const SEED = process.env.KW_FUZZ_SEED === undefined ? undefined : Number(process.env.KW_FUZZ_SEED);
/** Every answer within this, milliseconds (issue 16). */
const ANSWER_MS_MAX = 2_000;
/** An oversize body: above every JSON cap a route states (the largest is DEFAULT_JSON_LIMIT_BYTES, 1 MB). */
const OVERSIZE_BYTES = 1_100_000;
const STATE_CHANGING = new Set(['POST', 'PUT', 'PATCH', 'DELETE', 'ALL']);
const STANDARD_METHODS = ['GET', 'POST', 'PUT', 'PATCH', 'DELETE'] as const;
const MISSING_ID = '00000000-0000-4000-8000-000000000000';

type Caller = 'teacher' | 'admin' | 'coordinator' | 'classSession' | 'anonymous';
/** The order callers are tried in: the first a route admits sends its cases (a teacher reaches the most). */
const CALLERS: Caller[] = ['teacher', 'admin', 'coordinator', 'classSession', 'anonymous'];

/** One route method's own people: its fuzz can sign them out or rotate their class code without hurting others. */
interface Cast {
  teacher: TestAccount;
  admin: TestAccount;
  coordinator: TestAccount;
  classId: string;
  kitId: string | null;
}

let knex: Knex;

beforeAll(() => {
  knex = testKnex();
});

afterAll(async () => {
  fuzzClientClose();
  await knex?.destroy();
});

async function castCreate(label: string, withKit: boolean): Promise<Cast> {
  const teacher = await accountCreate(knex, { role: 'teacher', label: `fuzz-${label}` });
  const admin = await accountCreate(knex, { role: 'admin', label: `fuzz-${label}-admin` });
  const coordinator = await accountCreate(knex, { role: 'coordinator', label: `fuzz-${label}-coordinator` });
  const { id: classId } = await classCreateDirect(knex, teacher, `Fuzz class ${label}`);
  let kitId: string | null = null;
  if (withKit) {
    const saved = await fuzzSend({
      method: 'POST',
      path: '/api/kits',
      headers: { 'content-type': 'application/json', cookie: await userSessionCookie(knex, teacher.id) },
      body: JSON.stringify({ classId, inputs: SKEIN_KIT_INPUTS }),
    });
    expect(saved.status, saved.text).toBe(201);
    kitId = (JSON.parse(saved.text) as { kit: { id: string } }).kit.id;
  }
  return { teacher, admin, coordinator, classId, kitId };
}

/** A new session for the caller (a case that signs out ends only its own). */
async function cookieFor(caller: Caller, cast: Cast): Promise<Record<string, string>> {
  if (caller === 'anonymous') return {};
  if (caller === 'classSession') return { cookie: await classSessionCookie(knex, cast.classId) };
  return { cookie: await userSessionCookie(knex, cast[caller].id) };
}

/** The zod schemas each route file checks its input with (the plugin's export), filled by routeSchemasLoad. */
const schemasByFile = new Map<string, ZodTypeAny[]>();

/**
 * Imports every route module, one at a time, before any request is timed. Concurrent dynamic imports of modules
 * that import each other in a cycle can wait on each other forever in vitest's module runner, and an import
 * during the cases (transforming and evaluating a module graph on this thread) delays reading the answers of the
 * requests in flight, which then look slow.
 */
async function routeSchemasLoad(files: Iterable<string>): Promise<void> {
  for (const file of files) {
    const module = (await import(/* @vite-ignore */ file)) as Record<string, unknown>;
    schemasByFile.set(file, Object.values((module[ROUTE_INPUT_SCHEMAS_EXPORT] ?? {}) as Record<string, ZodTypeAny>));
  }
}

/** The schemas of a route file loaded by routeSchemasLoad. */
function routeSchemas(file: string): ZodTypeAny[] {
  const schemas = schemasByFile.get(file);
  if (!schemas) throw new Error(`${file} was not loaded before the cases`);
  return schemas;
}

/** What a path parameter may be: ids that exist, one that does not, and text that is no id at all. */
function paramArbitrary(cast: Cast): fc.Arbitrary<string> {
  return fc.oneof(
    fc.constantFrom(cast.classId, MISSING_ID, ...(cast.kitId ? [cast.kitId] : [])),
    fc.uuid(),
    fc.constantFrom('not-a-uuid', '0', '-1', '1e308', "'", '%00', '%2e%2e', '..%2f', '%F0%9F%9A%80', 'x'.repeat(5_000)),
    fc.string({ unit: 'binary', maxLength: 40 }).map(encodeURIComponent),
  );
}

/** A route pattern with each [param] and [...rest] filled. */
function pathArbitrary(route: string, cast: Cast): fc.Arbitrary<string> {
  const parts = route.split(/(\[[^\]]+\])/);
  return fc
    .tuple(...parts.map((p) => (p.startsWith('[') ? paramArbitrary(cast) : fc.constant(p))))
    .map((filled) => filled.join(''));
}

/** A query string: absent mostly, else fuzzed pairs, now and then with a malformed escape. */
const queryArbitrary: fc.Arbitrary<string> = fc.oneof(
  { weight: 6, arbitrary: fc.constant('') },
  {
    weight: 3,
    arbitrary: fc
      .array(
        fc.tuple(
          fc.oneof(fc.constantFrom('classId', 'limit', 'units', 'segmentLength', 'q', 'grade', 'sheet', 'next')),
          fc.oneof(
            fc.string({ unit: 'binary', maxLength: 30 }),
            fc.constantFrom('1e308', '-1', 'NaN', MISSING_ID, '', '[]', '{"a":1}'),
          ),
        ),
        { minLength: 1, maxLength: 4 },
      )
      .map((pairs) => '?' + pairs.map(([k, v]) => `${k}=${encodeURIComponent(v)}`).join('&')),
  },
  { weight: 1, arbitrary: fc.constantFrom('?%', '?a=%E0%A4%A', '?%ZZ=1', '?a=%00', '?&&==&', '?a[b]=1&a[b]=2') },
);

/** Percent-encodes text, a lone surrogate (which no UTF-8 holds) as the replacement character. */
const encodeText = (text: string) =>
  encodeURIComponent(text.replace(/[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/g, '\ufffd'));

/** A query string from a schema's values: each key of an object once, its value as text. */
function schemaQuery(schema: ZodTypeAny): fc.Arbitrary<string> {
  return zodArbitrary(schema).map((v) => {
    if (typeof v !== 'object' || v === null || Array.isArray(v)) return `?q=${encodeText(JSON.stringify(v) ?? '')}`;
    const text = (x: unknown) => (typeof x === 'object' && x !== null ? JSON.stringify(x) : String(x));
    const pairs = Object.entries(v).map(([k, x]) => `${encodeText(k)}=${encodeText(text(x))}`);
    return pairs.length > 0 ? `?${pairs.join('&')}` : '';
  });
}

interface BodyCase {
  type: string | null;
  body: string | Buffer | undefined;
}

/** A request body: JSON from the route's schemas mostly, else malformed JSON, a wrong type, nothing, or too much. */
function bodyArbitrary(schemas: ZodTypeAny[]): fc.Arbitrary<BodyCase> {
  // Mostly a hostile value somewhere inside; a quarter follow the shape everywhere (bounds and extremes within it).
  const values =
    schemas.length > 0
      ? fc.oneof(
          ...schemas.flatMap((s) => [
            { arbitrary: zodArbitrary(s), weight: 3 },
            { arbitrary: zodArbitrary(s, 0), weight: 1 },
          ]),
        )
      : hostileValue;
  const asJson = (v: unknown): BodyCase => ({ type: 'application/json', body: jsonOrOversize(v) });
  return fc.oneof(
    { weight: 24, arbitrary: values.map(asJson) },
    { weight: 1, arbitrary: fc.string({ maxLength: 60 }).map((s) => ({ type: 'application/json', body: `{${s}` })) },
    {
      weight: 1,
      arbitrary: fc
        .tuple(
          fc.constantFrom(
            'text/plain',
            'text/csv',
            'application/x-www-form-urlencoded',
            'multipart/form-data; boundary=x',
            'application/json; charset=utf-16',
          ),
          fc.string({ unit: 'binary', maxLength: 200 }),
        )
        .map(([type, body]) => ({ type, body })),
    },
    {
      weight: 1,
      arbitrary: fc.constantFrom<BodyCase>({ type: null, body: undefined }, { type: 'application/json', body: '' }),
    },
    {
      weight: 1,
      arbitrary: fc.constant<BodyCase>({
        type: 'application/json',
        body: Buffer.from(`{"pad":"${'x'.repeat(OVERSIZE_BYTES)}"}`),
      }),
    },
  );
}

/** JSON text of a value, or an oversize body where the text would not fit in a string at all. */
function jsonOrOversize(v: unknown): string {
  try {
    return JSON.stringify(v) ?? '';
  } catch {
    return `{"pad":"${'x'.repeat(OVERSIZE_BYTES)}"}`;
  }
}

/** The contract of every answer; a list of what it broke (empty when it held). */
function contractBroken(answer: FuzzAnswer, method = 'GET'): string[] {
  const broken: string[] = [];
  if (answer.status >= 500) broken.push(`status ${answer.status}`);
  if (answer.ms > ANSWER_MS_MAX) broken.push(`answered in ${Math.round(answer.ms)} ms`);
  if (answer.status >= 400 && method !== 'HEAD') {
    const type = String(answer.headers['content-type'] ?? '');
    if (!type.startsWith('application/json')) broken.push(`content-type "${type}"`);
    try {
      const { error } = JSON.parse(answer.text) as { error?: { code?: unknown; message?: unknown } };
      if (typeof error?.code !== 'string' || error.code === '') broken.push('no error.code');
      if (typeof error?.message !== 'string' || error.message === '') broken.push('no error.message');
    } catch {
      broken.push(`body is not JSON: ${answer.text.slice(0, 80)}`);
    }
  }
  return broken;
}

/** The body of a chunked HTTP/1.1 answer (RFC 9112 §7.1), without its size lines. */
function dechunked(raw: string): string {
  let out = '';
  let rest = raw;
  for (;;) {
    const line = rest.indexOf('\r\n');
    const size = parseInt(rest.slice(0, line), 16);
    if (!(size > 0)) return out;
    out += rest.slice(line + 2, line + 2 + size);
    rest = rest.slice(line + 2 + size + 2);
  }
}

/**
 * Runs a property over the requests an arbitrary makes (headers added by `sign`, e.g. a session cookie);
 * fails with the request and what its answer broke.
 */
async function fuzzRequests(
  requests: fc.Arbitrary<FuzzRequest>,
  numRuns: number,
  sign: () => Promise<Record<string, string>> = async () => ({}),
): Promise<void> {
  // One session while it lasts: a new one only after a case signed it out (a 401), to spare a row per case.
  let signed: Record<string, string> | null = null;
  await fc.assert(
    fc.asyncProperty(requests, async (req) => {
      signed ??= await sign();
      const r = { ...req, headers: { ...req.headers, ...signed } };
      const answer = await fuzzSend(r);
      if (answer.status === 401) signed = null;
      const broken = contractBroken(answer, r.method);
      const shown = typeof r.body === 'string' ? r.body.slice(0, 300) : r.body ? `<${r.body.length} bytes>` : '';
      expect(
        broken,
        `${r.method} ${r.path.slice(0, 200)} ${shown} → ${answer.status} ${answer.text.slice(0, 300)}`,
      ).toEqual([]);
    }),
    // No shrinking by default: each step is a request; KW_FUZZ_SEED with the reported seed replays the case.
    { numRuns, seed: SEED, endOnFailure: true },
  );
}

/** The first caller the route admits: a request with an empty object as each, until one is not 401/403. */
async function callerAdmitted(method: string, route: string, cast: Cast): Promise<Caller> {
  const path = route.replace(/\[[^\]]+\]/g, MISSING_ID);
  for (const caller of CALLERS) {
    const answer = await fuzzSend({
      method: method === 'ALL' ? 'POST' : method,
      path,
      headers: { 'content-type': 'application/json', ...(await cookieFor(caller, cast)) },
      body: '{}',
    });
    if (answer.status !== 401 && answer.status !== 403) return caller;
  }
  return 'anonymous';
}

// Test-only routes (KW_TEST_ROUTES, e.g. /api/test/fail answers 500 on purpose) are not part of the API.
const routes = routesOnDisk().filter((r) => !r.route.startsWith('/api/test/'));
const byFile = new Map<string, RouteOnDisk[]>();
for (const r of routes) byFile.set(r.file, [...(byFile.get(r.file) ?? []), r]);

describe.concurrent('fuzz: every route method on disk, with inputs derived from its own schemas', () => {
  // The plugin's transform of every route module: over 30 s on a loaded two-core machine.
  beforeAll(() => routeSchemasLoad(byFile.keys()), 300_000);

  it('finds the routes and the schemas they check input with', () => {
    expect(routes.length).toBeGreaterThan(10);
    const posts = routes.filter((r) => r.method === 'POST');
    const withSchemas = posts.map((r) => routeSchemas(r.file).length > 0);
    // Most POST routes read a body through a zod schema; the plugin must find them.
    expect(withSchemas.filter(Boolean).length).toBeGreaterThan(posts.length / 2);
  });

  for (const r of routes) {
    const stateChanging = STATE_CHANGING.has(r.method);
    const runs = stateChanging ? CASES : READ_CASES;
    it(`${r.method} ${r.route}: ${runs} cases`, { timeout: 120_000 }, async () => {
      const cast = await castCreate(`${r.method}-${r.route}`, r.route.startsWith('/api/kits/['));
      const caller = await callerAdmitted(r.method, r.route, cast);
      const schemas = routeSchemas(r.file);
      const method = r.method === 'ALL' ? fc.constantFrom(...STANDARD_METHODS) : fc.constant(r.method);
      const bodies = stateChanging ? bodyArbitrary(schemas) : fc.constant<BodyCase>({ type: null, body: undefined });
      // A read-only route's schemas check its query: query strings are derived from them as well.
      const queries =
        stateChanging || schemas.length === 0 ? queryArbitrary : fc.oneof(queryArbitrary, ...schemas.map(schemaQuery));
      const requests = fc
        .tuple(method, pathArbitrary(r.route, cast), queries, bodies)
        .map(([m, path, query, b]): FuzzRequest => ({
          method: m,
          path: path + query,
          headers: b.type === null ? {} : { 'content-type': b.type },
          body: m === 'GET' ? undefined : b.body,
        }));
      await fuzzRequests(requests, runs, () => cookieFor(caller, cast));
    });
  }

  for (const [file, exported] of byFile) {
    const route = exported[0]!.route;
    const answered = new Set(exported.map((r) => r.method));
    if (answered.has('ALL')) continue;
    const wrong = STANDARD_METHODS.filter((m) => !answered.has(m));
    it(`${route}: ${wrong.join(', ')} answer a JSON 405 with Allow`, async () => {
      const path = route.replace(/\[[^\]]+\]/g, MISSING_ID);
      for (const method of wrong) {
        const answer = await fuzzSend({ method, path, headers: { 'content-type': 'application/json' }, body: '{}' });
        expect(contractBroken(answer), `${method} ${path} (${file})`).toEqual([]);
        expect(answer.status, `${method} ${path}`).toBe(405);
        expect(String(answer.headers.allow).split(', ')).toEqual(expect.arrayContaining([...answered]));
      }
    });
  }
});

describe('fuzz: malformed URLs and request lines under /api/', () => {
  /** Named cases: each once. */
  const NAMED = [
    '/api/%2e%2e/health',
    '/api/%2E%2E/%2e%2e/etc/passwd',
    '/api/.%2e/health',
    '/api/..%2fhealth',
    '/api/%2e/health',
    '/api/kits/%2e%2e%2f%2e%2e%2fhealth',
    '/api/../tools/scale',
    '/api/health?%',
    '/api/health?a=%E0%A4%A',
    '/api/%ZZ',
    '/api/%',
    '/api/%00',
    '/api/%C0%AE%C0%AE/health',
    '/api/health%00.json',
    '/api/kits/' + 'a'.repeat(8_000),
    '/api/' + '%2e%2e/'.repeat(200) + 'health',
    '/api//////health',
    '/api/health/',
    '/api/HEALTH',
  ];

  it('answers each named malformed URL by the contract', async () => {
    for (const path of NAMED) {
      const answer = await fuzzSend({ method: 'GET', path });
      expect(contractBroken(answer), `GET ${path} → ${answer.status} ${answer.text.slice(0, 120)}`).toEqual([]);
      if (answer.status < 400) expect(String(answer.headers['content-type']), path).toMatch(/^application\/json/);
    }
  });

  it('answers generated /api/ paths of dots, slashes, escapes and odd text with JSON', async () => {
    const segment = fc.oneof(
      fc.constantFrom(
        '..',
        '.',
        '%2e%2e',
        '%2E.',
        '.%2e',
        '%2f',
        '%5c',
        '%',
        '%E0%A4',
        '%00',
        '',
        'health',
        'kits',
        '[id]',
      ),
      fc.string({ unit: 'binary', maxLength: 12 }).map(encodeURIComponent),
    );
    const paths = fc.array(segment, { minLength: 1, maxLength: 6 }).map((s) => `/api/${s.join('/')}`);
    await fuzzRequests(
      fc.tuple(paths, queryArbitrary).map(([path, query]): FuzzRequest => ({ method: 'GET', path: path + query })),
      CASES,
    );
    // And the answer to anything under /api/ is JSON, never the HTML 404 page.
    const answer = await fuzzSend({ method: 'GET', path: '/api/%2e%2e/health' });
    expect(String(answer.headers['content-type'])).toMatch(/^application\/json/);
  });

  it('answers request lines no client should write with a JSON 4xx or a closed connection, never a 5xx', async () => {
    const heads = [
      'GET http://elsewhere.example/api/health HTTP/1.1\r\nHost: elsewhere.example\r\nConnection: close\r\n\r\n',
      'GET * HTTP/1.1\r\nHost: 127.0.0.1\r\nConnection: close\r\n\r\n',
      `GET /api/health?${'a'.repeat(20_000)} HTTP/1.1\r\nHost: 127.0.0.1\r\nConnection: close\r\n\r\n`,
      'GET /api/health HTTP/1.1\r\nHost: 127.0.0.1\r\nX-Bad: a\u0001b\r\nConnection: close\r\n\r\n',
      'GET /api/hea lth HTTP/1.1\r\nHost: 127.0.0.1\r\nConnection: close\r\n\r\n',
      'POST /api/auth/sign-in HTTP/1.1\r\nHost: 127.0.0.1\r\nContent-Length: 5\r\nContent-Length: 7\r\nConnection: close\r\n\r\nhello',
      'POST /api/auth/sign-in HTTP/1.1\r\nHost: 127.0.0.1\r\nTransfer-Encoding: chunked\r\nContent-Length: 3\r\nConnection: close\r\n\r\nzz\r\n',
      'GARBAGE\r\n\r\n',
    ];
    for (const head of heads) {
      const { statusLine, text, ms } = await fuzzSendRaw(head);
      const shown = `${head.slice(0, 60).replace(/\r\n/g, '⏎')} → ${statusLine}`;
      expect(ms, shown).toBeLessThan(ANSWER_MS_MAX);
      if (statusLine === '') continue; // closed without an answer: allowed for a request line that is no HTTP
      const status = Number(statusLine.split(' ')[1]);
      expect(status, shown).toBeLessThan(500);
      if (status >= 400) {
        const [headPart, ...rest] = text.split('\r\n\r\n');
        const head = headPart!.toLowerCase();
        expect(head, shown).toContain('content-type: application/json');
        const body = rest.join('\r\n\r\n');
        expect(
          (
            JSON.parse(head.includes('transfer-encoding: chunked') ? dechunked(body) : body) as {
              error: { code: string };
            }
          ).error.code,
          shown,
        ).toBeTruthy();
      }
    }
  });
});
