/**
 * The big-build plan and the printed live link through the running server: the demo's life-size build plan for
 * a coordinator and for a teacher with a confirmed place (not for one without), another venue by preset or
 * typed size, JSON 400s for a bad query and 409 for an event without a kit; a link's bookmark sheet.
 */
import { randomBytes } from 'node:crypto';
import type { Knex } from 'knex';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { testKnex } from '../db/database';
import { pdfPageTexts } from '../fixtures/pdf-text';
import { accountCreate, userSessionCookie } from './auth-helpers';
import { api, BASE_URL } from './harness';

let knex: Knex;
let staffCookie: string;
let eventId: string;

const text = async (res: Response) =>
  (await pdfPageTexts(new Uint8Array(await res.arrayBuffer()))).join('\n').replace(/\s+/g, ' ');

beforeAll(async () => {
  knex = testKnex();
  staffCookie = await userSessionCookie(knex, (await accountCreate(knex, { role: 'coordinator' })).id);
  eventId = (await knex('events').where({ title: 'Skein probe life-size build' }).first('id')).id;
});
afterAll(async () => knex.destroy());

describe('GET /api/events/[id]/plan.pdf', () => {
  it('gives a coordinator the demo build plan, saying life size does not fit the football field', async () => {
    const res = await api(`/api/events/${eventId}/plan.pdf`, { headers: { cookie: staffCookie } });
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('application/pdf');
    const body = await text(res);
    expect(body).toContain('It does not fit at 1:1.');
    expect(body).toContain('Stake-out table');
    expect(body).toContain('Cut list on sheet stock');
  });

  it('regenerates the plan for a gym preset or a typed size at a scale that fits', async () => {
    const gym = await api(`/api/events/${eventId}/plan.pdf?venue=gym-fiba&scale=10`, {
      headers: { cookie: staffCookie },
    });
    expect(gym.status).toBe(200);
    const body = await text(gym);
    expect(body).toContain('at 1:10 on the gym with a FIBA basketball court');
    expect(body).toContain('It fits inside');
    const typed = await api(`/api/events/${eventId}/plan.pdf?lengthM=200&widthM=150`, {
      headers: { cookie: staffCookie },
    });
    expect(typed.status).toBe(200);
  });

  it('answers a bad query with a JSON 400 naming the field', async () => {
    for (const query of ['scale=0', 'lengthM=50', 'venue=moon', 'venue=classroom&lengthM=5&widthM=5', 'scale=x']) {
      const res = await api(`/api/events/${eventId}/plan.pdf?${query}`, { headers: { cookie: staffCookie } });
      expect(res.status).toBe(400);
      const { error } = await res.json();
      expect(error.code).toBe('invalid_input');
    }
  });

  it('opens the plan to a teacher with a confirmed place only', async () => {
    const teacher = await accountCreate(knex, { role: 'teacher' });
    const cookie = await userSessionCookie(knex, teacher.id);
    expect((await api(`/api/events/${eventId}/plan.pdf`, { headers: { cookie } })).status).toBe(404);
    await knex('event_registrations').insert({
      event_id: eventId,
      user_id: teacher.id,
      name: 'Test teacher',
      email: teacher.email,
      state: 'confirmed',
      confirmed_at: new Date(),
      manage_token_hash: randomBytes(32).toString('hex'),
    });
    expect((await api(`/api/events/${eventId}/plan.pdf`, { headers: { cookie } })).status).toBe(200);
  });

  it('answers 409 for an event without a kit', async () => {
    const created = await api('/api/events', {
      method: 'POST',
      headers: { 'content-type': 'application/json', origin: BASE_URL, cookie: staffCookie },
      body: JSON.stringify({
        title: 'Kitless build',
        kind: 'big_build',
        startsLocal: '2027-05-01T10:00',
        timeZone: 'Europe/Berlin',
        venuePreset: 'gym-fiba',
      }),
    });
    const { event } = await created.json();
    const res = await api(`/api/events/${event.id}/plan.pdf`, { headers: { cookie: staffCookie } });
    expect(res.status).toBe(409);
    expect((await res.json()).error.message).toContain('no kit');
  });
});

describe('GET /api/links/[id]/poster.pdf', () => {
  it('prints a bookmark sheet with the /go/ address and refuses an unknown format', async () => {
    const link = await knex('live_links').where({ code: 'SKEN42' }).first('id');
    const res = await api(`/api/links/${link.id}/poster.pdf?format=bookmark`, { headers: { cookie: staffCookie } });
    expect(res.status).toBe(200);
    expect(await text(res)).toContain(`${BASE_URL}/go/SKEN42`);
    const bad = await api(`/api/links/${link.id}/poster.pdf?format=flyer`, { headers: { cookie: staffCookie } });
    expect(bad.status).toBe(400);
  });
});
