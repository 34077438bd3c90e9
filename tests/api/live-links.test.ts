/**
 * Live links through the running server: a new link redirects /go/CODE to its target and counts the scan;
 * changing the target sends the next scan there; a scan row holds the link id, the day and the count only;
 * an unknown code answers a friendly page; the QR code decodes (jsQR) to the /go/ address.
 */
import type { Knex } from 'knex';
import jsQR from 'jsqr';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { testKnex } from '../db/database';
import { accountCreate, userSessionCookie } from './auth-helpers';
import { api, BASE_URL } from './harness';

let knex: Knex;
let cookie: string;
const send = (method: string, path: string, body: unknown) =>
  api(path, {
    method,
    headers: { 'content-type': 'application/json', origin: BASE_URL, cookie },
    body: JSON.stringify(body),
  });

beforeAll(async () => {
  knex = testKnex();
  cookie = await userSessionCookie(knex, (await accountCreate(knex, { role: 'coordinator' })).id);
});
afterAll(async () => knex.destroy());

describe('live links', () => {
  it('redirects to the current target and counts each scan, storing nothing else', async () => {
    const created = await send('POST', '/api/links', { title: 'Poster', target: '/activities' });
    expect(created.status).toBe(201);
    const { link } = await created.json();
    expect(link.code).toMatch(/^[23456789ABCDEFGHJKMNPQRSTUVWXYZ]{6}$/);
    const first = await api(`/go/${link.code}`);
    expect(first.status).toBe(302);
    expect(first.headers.get('location')).toBe('/activities');
    expect((await send('PATCH', `/api/links/${link.id}`, { target: 'https://example.org/mission' })).status).toBe(200);
    const second = await api(`/go/${link.code.toLowerCase()}`);
    expect(second.headers.get('location')).toBe('https://example.org/mission');
    const rows = await knex('live_link_scans').where({ link_id: link.id });
    expect(rows).toHaveLength(1);
    expect(Object.keys(rows[0]!).sort()).toEqual(['count', 'day', 'link_id']);
    expect(Number(rows[0]!.count)).toBe(2);
  });

  it('refuses a target that is not https or a path here', async () => {
    for (const target of ['http://example.org', 'javascript:alert(1)', '//evil.example/x']) {
      expect((await send('POST', '/api/links', { title: 'x', target })).status).toBe(400);
    }
  });

  it('answers an unknown code with a friendly page, not an error', async () => {
    const res = await api('/go/ZZZZZZ');
    expect(res.status).toBe(404);
    const html = await res.text();
    expect(html).toContain('We could not find that code');
    expect(html).toContain('action="/activities"');
  });

  it('prints a QR code that decodes to the /go/ address', async () => {
    const { link } = await (await send('POST', '/api/links', { title: 'Bookmark', target: '/' })).json();
    const png = await api(`/api/links/${link.id}/qr?format=png`, { headers: { cookie } });
    expect(png.headers.get('content-type')).toBe('image/png');
    const { data, info } = await sharp(Buffer.from(await png.arrayBuffer()))
      .ensureAlpha()
      .raw()
      .toBuffer({ resolveWithObject: true });
    const decoded = jsQR(new Uint8ClampedArray(data), info.width, info.height);
    expect(decoded?.data).toBe(`${BASE_URL}/go/${link.code}`);
  });
});
