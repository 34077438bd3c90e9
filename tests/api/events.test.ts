/**
 * Events end to end through the running server and its job worker: a coordinator creates and publishes a
 * 20-place event; 20 teachers get places, the 21st goes to the waiting list; a cancellation moves it up and the
 * worker e-mails it (with the calendar file). An e-mail registrant gets a place only after confirming the link.
 * Moving, then cancelling, a published event e-mails those with a place and those on the waiting list.
 */
import type { Knex } from 'knex';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import ICAL from 'ical.js';
import Papa from 'papaparse';
import { testKnex } from '../db/database';
import { accountCreate, emailUnique, linkIn, mailWait, userSessionCookie } from './auth-helpers';
import { api, BASE_URL } from './harness';

let knex: Knex;
let staffCookie: string;

const send = (method: string, path: string, body: unknown, cookie?: string) =>
  api(path, {
    method,
    headers: { 'content-type': 'application/json', origin: BASE_URL, ...(cookie ? { cookie } : {}) },
    body: JSON.stringify(body),
  });

beforeAll(async () => {
  knex = testKnex();
  const staff = await accountCreate(knex, { role: 'coordinator' });
  staffCookie = await userSessionCookie(knex, staff.id);
});
afterAll(async () => knex.destroy());

async function eventPublished(capacity: number): Promise<string> {
  const created = await send(
    'POST',
    '/api/events',
    {
      title: 'Boom stake-out afternoon',
      kind: 'big_build',
      venue: 'Back field',
      startsLocal: '2027-04-14T13:30',
      endsLocal: '2027-04-14T16:00',
      timeZone: 'America/Denver',
      capacity,
    },
    staffCookie,
  );
  expect(created.status).toBe(201);
  const { event } = await created.json();
  expect(event.state).toBe('draft');
  // Denver is on daylight time (UTC−6) in April 2027: 13:30 local is 19:30 UTC.
  expect(event.startsAt).toBe('2027-04-14T19:30:00.000Z');
  expect((await api(`/api/events/${event.id}`)).status).toBe(404);
  const published = await send('PATCH', `/api/events/${event.id}`, { state: 'published' }, staffCookie);
  expect(published.status).toBe(200);
  expect((await api(`/api/events/${event.id}`)).status).toBe(200);
  return event.id;
}

describe('events', () => {
  it('puts the 21st registration on a 20-place event on the waiting list and moves it up on a cancellation', async () => {
    const id = await eventPublished(20);
    const teachers = [];
    for (let i = 0; i < 21; i++) {
      const t = await accountCreate(knex, { role: 'teacher', label: `reg${i}` });
      teachers.push({ ...t, cookie: await userSessionCookie(knex, t.id) });
    }
    const states = [];
    for (const t of teachers) {
      const res = await send('POST', `/api/events/${id}/registrations`, {}, t.cookie);
      expect(res.status).toBe(201);
      states.push((await res.json()).registration);
    }
    expect(states.slice(0, 20).every((s) => s.state === 'confirmed')).toBe(true);
    expect(states[20]).toEqual({ state: 'waitlisted', position: 1 });
    const again = await send('POST', `/api/events/${id}/registrations`, {}, teachers[0]!.cookie);
    expect(again.status).toBe(409);

    const last = teachers[20]!;
    await mailWait(last.email, /On the waiting list/);
    const placeMail = await mailWait(teachers[3]!.email, /You are registered/);
    const cancel = linkIn(placeMail, '/events/registration');
    const cancelled = await send('POST', '/api/events/registrations/cancel', {
      token: cancel.searchParams.get('cancel'),
    });
    expect(cancelled.status).toBe(200);
    expect((await cancelled.json()).registration).toEqual({ state: 'cancelled', promoted: true });

    const promoted = await mailWait(last.email, /A place came free/);
    expect(promoted.text).toContain('Boom stake-out afternoon');
    const rows = await knex('event_registrations').where({ event_id: id });
    expect(rows.filter((r) => r.state === 'confirmed')).toHaveLength(20);
    expect(rows.find((r) => r.email === last.email.toLowerCase())?.state).toBe('confirmed');

    const csv = await api(`/api/events/${id}/registrations.csv`, { headers: { cookie: staffCookie } });
    expect(csv.status).toBe(200);
    const table = Papa.parse<string[]>(await csv.text(), { skipEmptyLines: true }).data;
    expect(table[0]![0]).toBe('Name');
    expect(table).toHaveLength(22);
    expect(table.filter((r) => r[3] === 'cancelled')).toHaveLength(1);
  }, 60_000);

  it('gives an e-mail registrant the place only after the confirmation link', async () => {
    const id = await eventPublished(5);
    const email = emailUnique('guest');
    const res = await send('POST', `/api/events/${id}/registrations`, { name: '=HYPERLINK("x")', email });
    expect(res.status).toBe(201);
    expect((await res.json()).registration).toEqual({ state: 'pending' });
    const confirmMail = await mailWait(email, /Confirm your registration/);
    const token = linkIn(confirmMail, '/events/registration').searchParams.get('confirm');
    const confirmed = await send('POST', '/api/events/registrations/confirm', { token });
    expect((await confirmed.json()).registration).toEqual({ state: 'confirmed' });
    expect((await send('POST', '/api/events/registrations/confirm', { token })).status).toBe(404);
    await mailWait(email, /You are registered/);
    // The CSV neutralises a formula in a name.
    const csv = await (await api(`/api/events/${id}/registrations.csv`, { headers: { cookie: staffCookie } })).text();
    expect(Papa.parse<string[]>(csv).data[1]![0]).toBe(`'=HYPERLINK("x")`);
  }, 30_000);

  it('e-mails those with a place or on the waiting list when the event moves, then when it is cancelled', async () => {
    const id = await eventPublished(1);
    const [holder, waiting] = await Promise.all(
      ['moved-a', 'moved-b'].map(async (label) => {
        const t = await accountCreate(knex, { role: 'teacher', label });
        return { ...t, cookie: await userSessionCookie(knex, t.id) };
      }),
    );
    for (const t of [holder!, waiting!]) {
      expect((await send('POST', `/api/events/${id}/registrations`, {}, t.cookie)).status).toBe(201);
    }
    await knex('event_registrations')
      .where({ event_id: id, state: 'confirmed' })
      .update({ reminder_sent_at: new Date() });

    // A new description is no move: nothing to tell, the calendar file keeps its SEQUENCE.
    expect((await send('PATCH', `/api/events/${id}`, { description: 'Bring string.' }, staffCookie)).status).toBe(200);
    expect((await knex('events').where({ id }).first('revision')).revision).toBe(0);

    const moved = await send(
      'PATCH',
      `/api/events/${id}`,
      { startsLocal: '2027-04-15T13:30', venue: 'Gym' },
      staffCookie,
    );
    expect(moved.status).toBe(200);
    const holderMail = await mailWait(holder!.email, /Changed time or place/);
    expect(holderMail.text).toContain('It is now: Boom stake-out afternoon: ');
    expect(holderMail.text).toContain('Gym.');
    expect(holderMail.text).toContain('It was: Boom stake-out afternoon: ');
    expect(holderMail.text).toContain('Back field.');
    expect(holderMail.text).toContain('Your place stays yours');
    const waitingMail = await mailWait(waiting!.email, /Changed time or place/);
    expect(waitingMail.text).toContain('You keep your turn on the waiting list');
    const rows = await knex('event_registrations').where({ event_id: id, state: 'confirmed' });
    expect(rows.map((r) => r.reminder_sent_at)).toEqual([null]);
    // The move mail's cancel link is the working one: it frees the place for the waiting registrant.
    const token = linkIn(holderMail, '/events/registration').searchParams.get('cancel');
    const cancelled = await send('POST', '/api/events/registrations/cancel', { token });
    expect((await cancelled.json()).registration).toEqual({ state: 'cancelled', promoted: true });

    expect((await send('PATCH', `/api/events/${id}`, { state: 'cancelled' }, staffCookie)).status).toBe(200);
    const cancelMail = await mailWait(waiting!.email, /^Cancelled: Boom stake-out afternoon$/);
    expect(cancelMail.text).toContain('the organisers have cancelled Boom stake-out afternoon');
    expect(cancelMail.text).toContain('Your place is released');
    expect((await knex('events').where({ id }).first('revision')).revision).toBe(2);
    // The calendar file staff download now marks the event cancelled (parsed back with ical.js).
    const ics = await (await api(`/api/events/${id}.ics`, { headers: { cookie: staffCookie } })).text();
    const vevent = new ICAL.Component(ICAL.parse(ics)).getFirstSubcomponent('vevent')!;
    expect(vevent.getFirstPropertyValue('status')).toBe('CANCELLED');
    expect(vevent.getFirstPropertyValue('sequence')).toBe(2);
    // Denver daylight time (UTC−6): 13:30 on 15 April 2027 is 19:30 UTC.
    expect(String(vevent.getFirstPropertyValue('dtstart'))).toBe('2027-04-15T19:30:00Z');
  }, 30_000);

  it('records attendance as a count per school', async () => {
    const id = await eventPublished(10);
    const school = await knex('schools').where({ status: 'approved' }).first('id');
    const put = await send(
      'PUT',
      `/api/events/${id}/attendance`,
      { rows: [{ schoolId: school.id, attendeeCount: 17 }] },
      staffCookie,
    );
    expect(put.status).toBe(200);
    const rows = await knex('event_attendance').where({ event_id: id });
    expect(rows).toHaveLength(1);
    expect(rows[0]!.attendee_count).toBe(17);
    const bad = await send(
      'PUT',
      `/api/events/${id}/attendance`,
      { rows: [{ schoolId: school.id, attendeeCount: -1 }] },
      staffCookie,
    );
    expect(bad.status).toBe(400);
  });
});
