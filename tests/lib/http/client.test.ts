/**
 * The islands' one HTTP client against a real HTTP server on loopback: what it sends (method, content type,
 * body, query) and how it reads the server's error body (src/lib/http/respond.ts) into one ApiError.
 */
import { createServer, type IncomingMessage, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiError, api, apiSettle } from '../../../src/lib/http/client';
import { errorResponse } from '../../../src/lib/http/respond';

interface Seen {
  method: string;
  url: string;
  contentType: string | undefined;
  body: string;
}

let server: Server;
let base = '';
const seen: Seen[] = [];

async function readBody(req: IncomingMessage): Promise<string> {
  let text = '';
  for await (const chunk of req) text += chunk;
  return text;
}

beforeAll(async () => {
  server = createServer(async (req, res) => {
    seen.push({
      method: req.method!,
      url: req.url!,
      contentType: req.headers['content-type'],
      body: await readBody(req),
    });
    // The error answers are the server's own responses, so the client is checked against respond.ts's shape.
    const answer = req.url!.startsWith('/busy')
      ? errorResponse(503, { code: 'busy', message: 'Busy; try again shortly.' }, { 'retry-after': '7' })
      : req.url!.startsWith('/invalid')
        ? errorResponse(400, { code: 'invalid_input', message: 'Check the form.', fields: { title: ['Too long'] } })
        : req.url!.startsWith('/plain')
          ? new Response('Bad Gateway', { status: 502 })
          : Response.json({ ok: true });
    res.writeHead(answer.status, Object.fromEntries(answer.headers));
    res.end(await answer.text());
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
});

afterAll(() => new Promise<void>((resolve) => server.close(() => resolve())));

describe('api', () => {
  it('sends a JSON body as POST and a bare call as GET', async () => {
    seen.length = 0;
    await api(`${base}/json`, { body: { a: 1 } });
    await api(`${base}/get`);
    expect(seen[0]).toMatchObject({ method: 'POST', contentType: 'application/json', body: '{"a":1}' });
    expect(seen[1]).toMatchObject({ method: 'GET', contentType: undefined, body: '' });
  });

  it('sends text with its own content type and leaves empty query values out', async () => {
    seen.length = 0;
    await api(`${base}/csv`, {
      text: { contentType: 'text/csv', data: 't,a\n0,1\n' },
      query: { rate: 100, unit: '', axis: undefined },
    });
    expect(seen[0]).toMatchObject({
      method: 'POST',
      url: '/csv?rate=100',
      contentType: 'text/csv',
      body: 't,a\n0,1\n',
    });
  });

  it('throws the server error body as an ApiError with its fields', async () => {
    const err = await api(`${base}/invalid`).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(ApiError);
    expect(err).toMatchObject({
      status: 400,
      code: 'invalid_input',
      message: 'Check the form.',
      fields: { title: ['Too long'] },
    });
  });

  it('reads Retry-After into the error', async () => {
    const err = (await api(`${base}/busy`).catch((e: unknown) => e)) as ApiError;
    expect([err.status, err.code, err.retryAfterSeconds]).toEqual([503, 'busy', 7]);
  });

  it('names the status when the answer is not the JSON error body', async () => {
    const err = (await api(`${base}/plain`).catch((e: unknown) => e)) as ApiError;
    expect([err.status, err.code, err.message]).toEqual([502, 'unknown', 'The server answered 502.']);
  });

  it('reports a network failure as status 0', async () => {
    const closed = createServer();
    await new Promise<void>((resolve) => closed.listen(0, '127.0.0.1', resolve));
    const { port } = closed.address() as AddressInfo;
    await new Promise<void>((resolve) => closed.close(() => resolve()));
    const err = (await api(`http://127.0.0.1:${port}/x`).catch((e: unknown) => e)) as ApiError;
    expect([err.status, err.code]).toEqual([0, 'network']);
  });
});

describe('apiSettle', () => {
  it('answers data or the ApiError as a value', async () => {
    expect(await apiSettle(`${base}/ok`)).toEqual({ ok: true, data: { ok: true } });
    const failed = await apiSettle(`${base}/invalid`, { method: 'PATCH', body: {} });
    expect(failed.ok).toBe(false);
    if (!failed.ok) expect(failed.error.fields).toEqual({ title: ['Too long'] });
  });
});
