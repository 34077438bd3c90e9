/**
 * Registration for an event without an account sends a mail each time, so it is rate-limited per address and per
 * e-mail (RATE_LIMITS.eventRegistrationIp and eventRegistrationEmail): past the limit, 429 with Retry-After
 * (RFC 6585 §4) in the shared JSON error shape. A signed-in teacher registers as themselves and is not counted.
 */
import { request } from 'node:http';
import type { Knex } from 'knex';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { RATE_LIMITS } from '../../src/lib/auth/rate-limit-rules';
import { testKnex } from '../db/database';
import { accountCreate, emailUnique, userSessionCookie } from './auth-helpers';
import { BASE_URL } from './harness';

/** A loopback address of this file's own, so its per-address bucket is no other test file's (127.0.0.0/8). */
const LOCAL_ADDRESS = '127.0.0.75';
const target = new URL(BASE_URL);

let knex: Knex;
let eventId: string;

interface Answer {
  status: number;
  retryAfter: string | undefined;
  body: { error?: { code: string; message: string } };
}

/** Sends JSON from LOCAL_ADDRESS. */
function send(method: string, path: string, body: unknown, cookie?: string): Promise<Answer> {
  const text = JSON.stringify(body);
  return new Promise((resolve, reject) => {
    const req = request(
      {
        host: target.hostname,
        port: target.port,
        method,
        path,
        localAddress: LOCAL_ADDRESS,
        headers: {
          'content-type': 'application/json',
          'content-length': String(Buffer.byteLength(text)),
          origin: BASE_URL,
          ...(cookie ? { cookie } : {}),
        },
      },
      (res) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () =>
          resolve({
            status: res.statusCode ?? 0,
            retryAfter: res.headers['retry-after'] as string | undefined,
            body: JSON.parse(Buffer.concat(chunks).toString('utf8')) as Answer['body'],
          }),
        );
      },
    );
    req.on('error', reject);
    req.end(text);
  });
}

const post = (path: string, body: unknown, cookie?: string) => send('POST', path, body, cookie);

beforeAll(async () => {
  knex = testKnex();
  const coordinator = await accountCreate(knex, { role: 'coordinator', label: 'eventreg-limit' });
  const cookie = await userSessionCookie(knex, coordinator.id);
  const created = await post(
    '/api/events',
    {
      title: 'Solar sail folding evening',
      kind: 'big_build',
      venue: 'Library hall',
      startsLocal: '2027-05-20T18:00',
      timeZone: 'Europe/Lisbon',
      capacity: 40,
    },
    cookie,
  );
  expect(created.status).toBe(201);
  eventId = (created.body as unknown as { event: { id: string } }).event.id;
  expect((await send('PATCH', `/api/events/${eventId}`, { state: 'published' }, cookie)).status).toBe(200);
});

afterAll(async () => {
  await knex?.destroy();
});

function expectLimited(answer: Answer, rule: { windowSeconds: number }): void {
  expect(answer.status).toBe(429);
  const retryAfter = Number(answer.retryAfter);
  expect(retryAfter).toBeGreaterThanOrEqual(1);
  expect(retryAfter).toBeLessThanOrEqual(rule.windowSeconds);
  expect(answer.body.error).toMatchObject({ code: 'rate_limited', message: expect.stringMatching(/try again/) });
}

describe('event registration rate limit', () => {
  it('answers the sixth registration of one e-mail address within the hour with 429 and Retry-After', async () => {
    const email = emailUnique('eventreg-limit');
    const statuses: number[] = [];
    for (let i = 0; i < RATE_LIMITS.eventRegistrationEmail.max; i += 1) {
      statuses.push((await post(`/api/events/${eventId}/registrations`, { name: 'Ines Varela', email })).status);
    }
    // The first is pending its mailed confirmation; the same address again is refused as a duplicate or accepted.
    expect(statuses[0]).toBe(201);
    expect(statuses.every((s) => s < 429)).toBe(true);
    const limited = await post(`/api/events/${eventId}/registrations`, { name: 'Ines Varela', email });
    expectLimited(limited, RATE_LIMITS.eventRegistrationEmail);
  });

  it('answers registrations from one address past its hourly limit with 429, invalid ones counted too', async () => {
    const key = `${RATE_LIMITS.eventRegistrationIp.name}:${LOCAL_ADDRESS}`;
    const used = (await knex('rate_limit_counters').where({ key }).first())?.attempts ?? 0;
    const left = RATE_LIMITS.eventRegistrationIp.max - used;
    for (let i = 0; i < left; i += 1) {
      expect((await post(`/api/events/${eventId}/registrations`, { name: '' })).status).toBe(400);
    }
    const limited = await post(`/api/events/${eventId}/registrations`, {
      name: 'Tomas Reyes',
      email: emailUnique('x'),
    });
    expectLimited(limited, RATE_LIMITS.eventRegistrationIp);
  });

  it('does not count a signed-in teacher, who registers as themselves', async () => {
    const teacher = await accountCreate(knex, { role: 'teacher', label: 'eventreg-limit-teacher' });
    const answer = await post(`/api/events/${eventId}/registrations`, {}, await userSessionCookie(knex, teacher.id));
    expect(answer.status).toBe(201);
  });

  it('answers 404, not 500, for an event address that is no UUID (found by the fuzz suite)', async () => {
    const teacher = await accountCreate(knex, { role: 'teacher', label: 'eventreg-limit-bad-id' });
    const answer = await post(
      `/api/events/${'x'.repeat(300)}/registrations`,
      {},
      await userSessionCookie(knex, teacher.id),
    );
    expect(answer.status).toBe(404);
    expect(answer.body.error?.code).toBeTruthy();
  });
});
