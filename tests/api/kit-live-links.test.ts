/**
 * Each saved kit's own live link, through the running server: saving or duplicating a kit creates a link titled
 * after it that sends /go/CODE to the kit's page; the kit's PDF prints that address in its QR code (read back by
 * poppler and jsQR) and is served under the content hash the kit stored; a retired link gives the kit page back
 * to the paper; renaming the kit renames its link; every demo kit has one.
 */
import type { Knex } from 'knex';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_ACCOUNTS } from '../../seeds/data/demo-accounts';
import { testKnex } from '../db/database';
import { SKEIN_KIT_INPUTS } from '../fixtures/kit-settings';
import { pdfQrCodes } from '../fixtures/pdf-qr';
import { accountCreate, classCreateDirect, userSessionCookie } from './auth-helpers';
import { api, BASE_URL, postJson } from './harness';

let knex: Knex;
let cookie: string;
let classId: string;

const kitLink = (kitId: string) => knex('live_links').where({ kit_id: kitId }).first();

async function kitSaved(title: string) {
  const res = await postJson('/api/kits', { classId, inputs: { ...SKEIN_KIT_INPUTS, title } }, { cookie });
  expect(res.status).toBe(201);
  return (await res.json()).kit as { id: string; title: string; contentHash: string };
}

/**
 * The QR code on a kit's first sheet, from its PDF (poppler renders, jsQR decodes). Kept to one short decode:
 * a test that blocks its event loop past the server's 5 s keep-alive finds its next request on a closed socket.
 */
async function kitSheetQr(kitId: string): Promise<string[]> {
  const pdf = await api(`/api/kits/${kitId}.pdf`, { headers: { cookie } });
  expect(pdf.status).toBe(200);
  return pdfQrCodes(new Uint8Array(await pdf.arrayBuffer()), { dpi: 200 });
}

beforeAll(async () => {
  knex = testKnex();
  const teacher = await accountCreate(knex, { role: 'teacher', label: 'kit-links' });
  cookie = await userSessionCookie(knex, teacher.id);
  classId = (await classCreateDirect(knex, teacher, 'Kit links')).id;
});
afterAll(async () => knex.destroy());

describe('a saved kit’s own live link', () => {
  it('prints /go/CODE in the PDF’s QR code, which sends a scan to the kit’s page', async () => {
    const kit = await kitSaved('Comet club probe');
    const link = await kitLink(kit.id);
    expect(link).toMatchObject({ title: 'Comet club probe', target_url: `/kits/${kit.id}`, retired_at: null });
    expect(await kitSheetQr(kit.id)).toEqual([`${BASE_URL}/go/${link.code}`]);
    const scan = await api(`/go/${link.code}`);
    expect(scan.status).toBe(302);
    expect(scan.headers.get('location')).toBe(`/kits/${kit.id}`);
  });

  it('serves the files under the content hash the kit stored', async () => {
    const kit = await kitSaved('Hash check');
    const stored = await knex('kits').where({ id: kit.id }).first('content_hash', 'inputs');
    expect(stored.inputs.qrUrl).toBe(`${BASE_URL}/go/${(await kitLink(kit.id)).code}`);
    const pdf = await api(`/api/kits/${kit.id}.pdf`, { headers: { cookie } });
    expect(pdf.headers.get('etag')).toBe(`"${stored.content_hash.slice(0, 32)}-pdf"`);
    expect(kit.contentHash).toBe(stored.content_hash);
  });

  it('gives a duplicate a link of its own', async () => {
    const kit = await kitSaved('Original');
    const res = await api(`/api/kits/${kit.id}/duplicate`, { method: 'POST', headers: { cookie, origin: BASE_URL } });
    expect(res.status).toBe(201);
    const copy = (await res.json()).kit;
    const [a, b] = [await kitLink(kit.id), await kitLink(copy.id)];
    expect(b).toMatchObject({ title: 'Original (copy)', target_url: `/kits/${copy.id}` });
    expect(b.code).not.toBe(a.code);
    expect(await kitSheetQr(copy.id)).toEqual([`${BASE_URL}/go/${b.code}`]);
  });

  it('renames the link with the kit', async () => {
    const kit = await kitSaved('Before');
    const res = await api(`/api/kits/${kit.id}`, {
      method: 'PATCH',
      headers: { cookie, origin: BASE_URL, 'content-type': 'application/json' },
      body: JSON.stringify({ title: 'After' }),
    });
    expect(res.status).toBe(200);
    expect((await kitLink(kit.id)).title).toBe('After');
  });

  it('prints the kit page again once its link is retired', async () => {
    const kit = await kitSaved('Retired link');
    await knex('live_links').where({ kit_id: kit.id }).update({ retired_at: knex.fn.now() });
    expect(await kitSheetQr(kit.id)).toEqual([`${BASE_URL}/kits/${kit.id}`]);
  });

  it('goes with its kit when the kit is deleted', async () => {
    const kit = await kitSaved('Short-lived');
    const { code } = await kitLink(kit.id);
    expect((await api(`/api/kits/${kit.id}`, { method: 'DELETE', headers: { cookie, origin: BASE_URL } })).status).toBe(
      200,
    );
    expect(await knex('live_links').where({ code }).first()).toBeUndefined();
    expect((await api(`/go/${code}`)).status).toBe(404);
  });

  it('exists for every demo kit, titled after it and aimed at its page', async () => {
    const rows = await knex('kits as k')
      .join('classes as c', 'c.id', 'k.class_id')
      .whereIn(
        'c.teacher_id',
        knex('users')
          .whereIn(
            'email',
            DEMO_ACCOUNTS.map((a) => a.email),
          )
          .select('id'),
      )
      .leftJoin('live_links as l', 'l.kit_id', 'k.id')
      .select('k.id', 'k.title', 'l.title as link_title', 'l.target_url');
    expect(rows.length).toBeGreaterThan(0);
    for (const row of rows) expect(row).toMatchObject({ link_title: row.title, target_url: `/kits/${row.id}` });
  });
});
