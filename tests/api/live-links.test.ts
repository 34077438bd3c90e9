/**
 * Live links through the running server: a new link redirects /go/CODE to its target and counts the scan;
 * changing the target sends the next scan there; a scan row holds the link id, the day, its counter shard and
 * the count only; concurrent scans are counted exactly and the chart sums each day's rows;
 * an unknown code answers a friendly page; the QR code decodes (jsQR) to the /go/ address.
 */
import type { Knex } from 'knex';
import jsQR from 'jsqr';
import { PDFDocument } from 'pdf-lib';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { testKnex } from '../db/database';
import { pdfPageTexts } from '../fixtures/pdf-text';
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

/**
 * The link's scan rows, checked to hold the link id, the UTC day, the counter row's shard and the count only
 * (nothing about who scanned: the shard is a number 0–15 the database draws), their counts summing to `total`.
 */
async function scanRowsExpect(linkId: string, total: number) {
  const rows = await knex('live_link_scans')
    .where({ link_id: linkId })
    .select('*', knex.raw("to_char(day, 'YYYY-MM-DD') AS day"));
  for (const row of rows) {
    expect(Object.keys(row).sort()).toEqual(['count', 'day', 'link_id', 'shard']);
    expect(row.shard).toBeGreaterThanOrEqual(0);
    expect(row.shard).toBeLessThan(16);
  }
  expect(rows.reduce((sum, r) => sum + Number(r.count), 0)).toBe(total);
  return rows as { day: string; shard: number; count: string }[];
}

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
    await scanRowsExpect(link.id, 2);
  });

  it('counts concurrent scans exactly, spread over the day’s counter rows, and charts their sum', async () => {
    const { link } = await (await send('POST', '/api/links', { title: 'Busy poster', target: '/activities' })).json();
    const SCANS = 200;
    const answers = await Promise.all(Array.from({ length: SCANS }, () => api(`/go/${link.code}`)));
    expect(answers.map((r) => r.status)).toEqual(Array(SCANS).fill(302));
    const rows = await scanRowsExpect(link.id, SCANS);
    // 200 scans on one of 16 rows each at random: all on one row has probability 16^-199.
    expect(rows.length).toBeGreaterThan(1);
    const { link: read, scansByDay } = await (await api(`/api/links/${link.id}`, { headers: { cookie } })).json();
    expect(read.scans).toBe(SCANS);
    expect(scansByDay).toEqual([{ day: rows[0]!.day, count: SCANS }]);
  });

  it('charts each day as the sum of its counter rows, oldest first', async () => {
    const { link } = await (await send('POST', '/api/links', { title: 'Old bookmark', target: '/' })).json();
    await knex('live_link_scans').insert([
      { link_id: link.id, day: '2026-03-01', shard: 0, count: 2 },
      { link_id: link.id, day: '2026-03-01', shard: 5, count: 3 },
      { link_id: link.id, day: '2026-03-01', shard: 15, count: 4 },
      { link_id: link.id, day: '2026-02-27', shard: 9, count: 6 },
    ]);
    const { link: read, scansByDay } = await (await api(`/api/links/${link.id}`, { headers: { cookie } })).json();
    expect(scansByDay).toEqual([
      { day: '2026-02-27', count: 6 },
      { day: '2026-03-01', count: 9 },
    ]);
    expect(read.scans).toBe(15);
  });

  it('answers a scan with the security headers and a request id, and a target with spaces or accents encoded', async () => {
    const target = 'https://example.org/día del cohete';
    const { link } = await (await send('POST', '/api/links', { title: 'Accents', target })).json();
    const res = await api(`/go/${link.code}/?from=poster`);
    expect(res.status).toBe(302);
    // WHATWG URL parser's percent-encoding of the same target (Node's URL).
    expect(res.headers.get('location')).toBe(new URL(target).toString());
    expect(res.headers.get('cache-control')).toBe('no-store');
    expect(res.headers.get('x-content-type-options')).toBe('nosniff');
    expect(res.headers.get('x-request-id')).toMatch(/^[0-9a-f]{12}$/);
    const head = await api(`/go/${link.code}`, { method: 'HEAD' });
    expect(head.status).toBe(302);
    await scanRowsExpect(link.id, 2);
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

  // ISO 32000-1:2008, 8.3.2.3: 1/72 in per point; Tabloid is 11 × 17 in (ASME Y14.1, ANSI B), so 792 × 1224 pt.
  it('prints a poster on Tabloid with the /go/ address and the code, and refuses an unknown size', async () => {
    const { link } = await (await send('POST', '/api/links', { title: 'Hall poster', target: '/activities' })).json();
    const res = await api(`/api/links/${link.id}/poster.pdf?format=poster&paper=tabloid`, { headers: { cookie } });
    expect(res.status).toBe(200);
    expect(res.headers.get('content-disposition')).toContain(`${link.code}-poster-tabloid.pdf`);
    const bytes = new Uint8Array(await res.arrayBuffer());
    const size = (await PDFDocument.load(bytes)).getPage(0).getSize();
    expect(size.width).toBeCloseTo(792, 2);
    expect(size.height).toBeCloseTo(1224, 2);
    const text = (await pdfPageTexts(bytes))[0]!;
    expect(text).toContain(`${BASE_URL}/go/${link.code}`);
    expect(text).toContain(`Code ${link.code}`);
    const bad = await api(`/api/links/${link.id}/poster.pdf?format=poster&paper=b5`, { headers: { cookie } });
    expect(bad.status).toBe(400);
    const { error } = await bad.json();
    expect(error.fields.paper[0]).toContain('letter, a4, tabloid, a3');
  });

  it('filters the /links page by code, title or target, by whose links and by state', async () => {
    const tag = `filter${Date.now().toString(36)}`;
    type Made = { id: string; code: string; title: string };
    const made: Made[] = [];
    for (const [title, target] of [
      [`${tag} hall poster`, '/activities'],
      [`${tag} bookmark`, `https://example.org/${tag}`],
      [`${tag} 100% done`, '/'],
    ] as const) {
      made.push((await (await send('POST', '/api/links', { title, target })).json()).link);
    }
    const [hall, bookmark, percent] = made as [Made, Made, Made];
    expect((await send('PATCH', `/api/links/${hall.id}`, { retired: true })).status).toBe(200);
    const codes = async (query: string) => {
      const html = await (await api(`/links?${query}`, { headers: { cookie } })).text();
      return made.filter((l) => html.includes(l.title)).map((l) => l.code);
    };
    expect(await codes(`q=${tag}`)).toEqual(made.map((l) => l.code));
    expect(await codes(`q=${tag}&state=live`)).toEqual([bookmark.code, percent.code]);
    expect(await codes(`q=${tag}&state=retired`)).toEqual([hall.code]);
    expect(await codes(`q=${bookmark.code.toLowerCase()}`)).toEqual([bookmark.code]);
    expect(await codes(`q=example.org/${tag}`)).toEqual([bookmark.code]);
    // "%" is a literal percent sign here, not a wildcard.
    expect(await codes(`q=${encodeURIComponent(`${tag} 100%`)}`)).toEqual([percent.code]);
    // None of these links belongs to a kit.
    expect(await codes(`q=${tag}&owner=kit`)).toEqual([]);
    expect(await codes(`q=${tag}&owner=other`)).toEqual(made.map((l) => l.code));
    const html = await (await api(`/links?q=${tag}&state=retired`, { headers: { cookie } })).text();
    expect(html).toContain('1 link matches your filters.');
    // A demo kit's own link is found under the kits' links only.
    const kitLink = await knex('live_links').whereNotNull('kit_id').first('code');
    const kitPage = (owner: string) => api(`/links?q=${kitLink.code}&owner=${owner}`, { headers: { cookie } });
    expect(await (await kitPage('kit')).text()).toContain('1 link matches your filters.');
    expect(await (await kitPage('other')).text()).toContain('No link matches these filters.');
  });

  it('offers the poster and the bookmarks on every print size on the /links page, each a PDF', async () => {
    await send('POST', '/api/links', { title: 'Listed', target: '/activities' });
    const html = await (await api('/links', { headers: { cookie } })).text();
    const hrefs = [...html.matchAll(/href="(\/api\/links\/[0-9a-f-]{36}\/poster\.pdf\?[^"]+)"/g)].map((m) =>
      m[1]!.replaceAll('&amp;', '&'),
    );
    const first = hrefs.filter((h) => h.startsWith(hrefs[0]!.split('?')[0]!));
    expect(first.map((h) => h.split('?')[1]).sort()).toEqual(
      ['a3', 'a4', 'letter', 'tabloid']
        .flatMap((p) => [`format=bookmark&paper=${p}`, `format=poster&paper=${p}`])
        .sort(),
    );
    for (const href of first) {
      const res = await api(href, { headers: { cookie } });
      expect(res.status).toBe(200);
      expect(res.headers.get('content-type')).toBe('application/pdf');
    }
  });
});
