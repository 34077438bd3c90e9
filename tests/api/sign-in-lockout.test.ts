/**
 * The escalating per-account sign-in lockout (src/lib/auth/sign-in-lockout.ts) against the server: ten wrong
 * passwords lock the address for a minute, each further one for twice as long, always 429 with Retry-After;
 * an address without an account behaves the same; a completed reset-by-mail ends the lock; wrong current
 * passwords of the account page's password change count toward the same lock (a second door to guess through).
 */
import type { Knex } from 'knex';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { RATE_LIMITS } from '../../src/lib/auth/rate-limit-rules';
import { testKnex } from '../db/database';
import { postJson } from './harness';
import { accountCreate, emailUnique, linkIn, mailWait, TEST_PASSWORD, userSessionCookie } from './auth-helpers';

let knex: Knex;
beforeAll(() => {
  knex = testKnex();
});
afterAll(async () => {
  await knex?.destroy();
});

const signIn = (email: string, password: string) => postJson('/api/auth/sign-in', { email, password });

/** Ends the current lock as if its time had passed, and the flat per-minute window with it. */
async function lockExpire(email: string): Promise<void> {
  await knex('sign_in_lockouts')
    .where({ email })
    .update({ locked_until: new Date(Date.now() - 1000) });
  await knex('rate_limit_counters')
    .where({ key: `${RATE_LIMITS.signInAccount.name}:${email}` })
    .delete();
}

async function tenWrong(email: string): Promise<number[]> {
  const statuses: number[] = [];
  for (let i = 0; i < 10; i += 1) statuses.push((await signIn(email, `wrong password number ${i}`)).status);
  return statuses;
}

describe('escalating sign-in lockout', () => {
  it('locks for 60 s after ten wrong passwords, then 120 s, then 240 s, each a 429 with Retry-After', async () => {
    const teacher = await accountCreate(knex, { role: 'teacher', label: 'lockout' });
    expect(await tenWrong(teacher.email)).toEqual(Array(10).fill(401));
    for (const expected of [60, 120, 240]) {
      const locked = await signIn(teacher.email, TEST_PASSWORD);
      expect(locked.status).toBe(429);
      expect(((await locked.json()) as { error: { code: string } }).error.code).toBe('rate_limited');
      const retry = Number(locked.headers.get('retry-after'));
      expect(retry).toBeGreaterThan(expected - 5);
      expect(retry).toBeLessThanOrEqual(expected);
      await lockExpire(teacher.email);
      // One more wrong password after the lock ends locks again, for twice as long.
      expect((await signIn(teacher.email, 'still the wrong password')).status).toBe(401);
    }
    const row = await knex('sign_in_lockouts').where({ email: teacher.email }).first();
    expect(row.failures).toBe(13);
  });

  it('locks an address that has no account in the same way', async () => {
    const email = emailUnique('lockout-nobody');
    expect(await tenWrong(email)).toEqual(Array(10).fill(401));
    expect((await signIn(email, TEST_PASSWORD)).status).toBe(429);
  });

  it('a correct password before the lock starts the count again', async () => {
    const teacher = await accountCreate(knex, { role: 'teacher', label: 'lockout-typo' });
    for (let i = 0; i < 5; i += 1) expect((await signIn(teacher.email, `typo ${i} of mine`)).status).toBe(401);
    expect((await signIn(teacher.email, TEST_PASSWORD)).status).toBe(200);
    expect(await knex('sign_in_lockouts').where({ email: teacher.email })).toHaveLength(0);
  });

  it('a completed reset-by-mail ends the lock at once', async () => {
    const teacher = await accountCreate(knex, { role: 'teacher', label: 'lockout-reset' });
    await tenWrong(teacher.email);
    expect((await signIn(teacher.email, TEST_PASSWORD)).status).toBe(429);
    expect((await postJson('/api/auth/forgot-password', { email: teacher.email })).status).toBe(202);
    const token = linkIn(await mailWait(teacher.email, /new Kitwright password/), '/reset-password').searchParams.get(
      'token',
    );
    const password = 'a fresh password after the lock';
    expect((await postJson('/api/auth/reset-password', { token, password })).status).toBe(200);
    await knex('rate_limit_counters')
      .where({ key: `${RATE_LIMITS.signInAccount.name}:${teacher.email}` })
      .delete();
    expect((await signIn(teacher.email, password)).status).toBe(200);
  });

  it('counts wrong current passwords of a password change toward the same lock', async () => {
    const teacher = await accountCreate(knex, { role: 'teacher', label: 'lockout-change' });
    const cookie = await userSessionCookie(knex, teacher.id);
    const change = (currentPassword: string) =>
      postJson('/api/auth/password', { currentPassword, newPassword: 'a new password nobody guessed' }, { cookie });
    for (let i = 0; i < 10; i += 1) expect((await change(`a guess number ${i}`)).status).toBe(400);
    // The flat per-minute window is spent too; only the lock may refuse what follows.
    await knex('rate_limit_counters')
      .where({ key: `${RATE_LIMITS.signInAccount.name}:${teacher.email}` })
      .delete();
    const locked = await change(TEST_PASSWORD);
    expect(locked.status).toBe(429);
    expect(Number(locked.headers.get('retry-after'))).toBeGreaterThan(55);
    // The same lock holds at sign-in, for the right password as well.
    expect((await signIn(teacher.email, TEST_PASSWORD)).status).toBe(429);
    expect((await knex('sign_in_lockouts').where({ email: teacher.email }).first()).failures).toBe(10);
  });
});
