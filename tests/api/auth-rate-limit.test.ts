/** Sign-in abuse limits: counters in PostgreSQL, per account and per socket address, answered 429 + Retry-After. */
import type { Knex } from 'knex';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { RATE_LIMITS } from '../../src/lib/auth/rate-limit-rules';
import { testKnex } from '../db/database';
import { postJson } from './harness';
import { accountCreate, TEST_PASSWORD } from './auth-helpers';

let knex: Knex;
beforeAll(() => {
  knex = testKnex();
});
afterAll(async () => {
  await knex?.destroy();
});

describe('sign-in rate limit', () => {
  it('answers the 11th wrong password within a minute with 429 and a Retry-After of at most 60 s', async () => {
    const teacher = await accountCreate(knex, { role: 'teacher', label: 'ratelimit' });
    const socketBucket = { key: `${RATE_LIMITS.signInIp.name}:127.0.0.1` };
    const before = (await knex('rate_limit_counters').where(socketBucket).first())?.attempts ?? 0;
    const statuses: number[] = [];
    let last: Response | undefined;
    for (let i = 0; i < 11; i += 1) {
      // A different forged X-Forwarded-For each time: without TRUST_PROXY it must not matter.
      last = await postJson(
        '/api/auth/sign-in',
        { email: teacher.email, password: `wrong password number ${i}` },
        { 'x-forwarded-for': `203.0.113.${i + 1}` },
      );
      statuses.push(last.status);
    }
    expect(statuses.slice(0, 10)).toEqual(Array(10).fill(401));
    expect(statuses[10]).toBe(429);
    const retryAfter = Number(last!.headers.get('retry-after'));
    expect(retryAfter).toBeGreaterThanOrEqual(1);
    expect(retryAfter).toBeLessThanOrEqual(60);
    expect(((await last!.json()) as { error: { code: string } }).error.code).toBe('rate_limited');

    // Even the right password waits out the window now.
    expect((await postJson('/api/auth/sign-in', { email: teacher.email, password: TEST_PASSWORD })).status).toBe(429);

    const counter = await knex('rate_limit_counters')
      .where({ key: `${RATE_LIMITS.signInAccount.name}:${teacher.email}` })
      .first();
    expect(counter.attempts).toBe(12);
    // A forged header never moves the caller into another bucket: every try counted against the socket's address
    // (the server entry drops the header without TRUST_PROXY; other test files may add to the same bucket).
    expect(await knex('rate_limit_counters').where('key', 'like', '%203.0.113.%')).toHaveLength(0);
    expect(await knex('rate_limit_counters').where('key', 'like', '%untrusted%')).toHaveLength(0);
    const after = (await knex('rate_limit_counters').where(socketBucket).first())?.attempts ?? 0;
    expect(after - before).toBeGreaterThanOrEqual(12);
  });

  it('starts a new window once the old one has passed', async () => {
    const teacher = await accountCreate(knex, { role: 'teacher', label: 'ratelimit-window' });
    const key = `${RATE_LIMITS.signInAccount.name}:${teacher.email}`;
    await knex('rate_limit_counters').insert({ key, window_started_at: new Date(Date.now() - 61_000), attempts: 50 });
    const res = await postJson('/api/auth/sign-in', { email: teacher.email, password: TEST_PASSWORD });
    expect(res.status).toBe(200);
  });
});
