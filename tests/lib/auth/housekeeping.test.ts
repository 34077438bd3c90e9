import { randomBytes } from 'node:crypto';
import { afterAll, describe, expect, it } from 'vitest';
import { housekeepingMaybe } from '../../../src/lib/auth/housekeeping.server';
import { SIGN_IN_LOCKOUT_FORGET_SECONDS } from '../../../src/lib/auth/sign-in-lockout';
import { dbClose } from '../../../src/lib/db/knex';
import { testKnex } from '../../db/database';

const knex = testKnex();
afterAll(async () => {
  await knex.destroy();
  await dbClose();
});

describe('housekeepingMaybe', () => {
  it('deletes expired sessions, day-old counters and week-idle unlocked lockout rows, and keeps live ones', async () => {
    process.env.DATABASE_URL ??= process.env.KW_TEST_DATABASE_URL;
    const user = await knex('users').first('id');
    const klass = await knex('classes').first('id');
    const id = () => randomBytes(16).toString('hex');
    const [expired, live, expiredClass, liveClass] = [id(), id(), id(), id()];
    await knex('user_sessions').insert([
      { id: expired, user_id: user.id, expires_at: new Date(Date.now() - 1000) },
      { id: live, user_id: user.id, expires_at: new Date(Date.now() + 3_600_000) },
    ]);
    await knex('class_sessions').insert([
      { id: expiredClass, class_id: klass.id, expires_at: new Date(Date.now() - 1000) },
      { id: liveClass, class_id: klass.id, expires_at: new Date(Date.now() + 3_600_000) },
    ]);
    const oldKey = `test:old:${id()}`;
    const newKey = `test:new:${id()}`;
    await knex('rate_limit_counters').insert([
      { key: oldKey, window_started_at: new Date(Date.now() - 2 * 86_400_000), attempts: 3 },
      { key: newKey, window_started_at: new Date(), attempts: 3 },
    ]);

    // Lockout rows: idle past the forget age and unlocked (goes); idle but still locked, and recent (both stay).
    const ago = (s: number) => new Date(Date.now() - s * 1000);
    const forget = SIGN_IN_LOCKOUT_FORGET_SECONDS;
    const [idle, idleLocked, recent] = [
      `idle-${id()}@t.invalid`,
      `locked-${id()}@t.invalid`,
      `recent-${id()}@t.invalid`,
    ];
    await knex('sign_in_lockouts').insert([
      { email: idle, failures: 12, updated_at: ago(forget + 60), locked_until: ago(forget) },
      { email: idleLocked, failures: 40, updated_at: ago(forget + 60), locked_until: new Date(Date.now() + 3_600_000) },
      { email: recent, failures: 3, updated_at: ago(forget - 3_600), locked_until: null },
    ]);

    expect(housekeepingMaybe('test', () => 0.5)).toBeNull();
    await housekeepingMaybe('test', () => 0);

    expect(await knex('user_sessions').whereIn('id', [expired, live]).pluck('id')).toEqual([live]);
    expect(await knex('class_sessions').whereIn('id', [expiredClass, liveClass]).pluck('id')).toEqual([liveClass]);
    expect(await knex('rate_limit_counters').whereIn('key', [oldKey, newKey]).pluck('key')).toEqual([newKey]);
    expect((await knex('sign_in_lockouts').whereIn('email', [idle, idleLocked, recent]).pluck('email')).sort()).toEqual(
      [idleLocked, recent].sort(),
    );
  });
});
