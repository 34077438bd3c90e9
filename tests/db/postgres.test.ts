import { afterAll, describe, expect, it } from 'vitest';
import { networkInterfaces } from 'node:os';
import net from 'node:net';
import { testKnex, TEST_DATABASE_URL } from './database';

const knex = testKnex();
afterAll(async () => {
  await knex.destroy();
});

describe('the project PostgreSQL', () => {
  it('writes and reads a row through knex', async () => {
    const name = `Write-read check ${Date.now()}`;
    const [row] = await knex('schools')
      .insert({ name, city: 'Testville', setting: 'rural', high_need: true })
      .returning(['id']);
    const read = await knex('schools').where({ id: row!.id }).first();
    expect(read).toMatchObject({ name, city: 'Testville', setting: 'rural', high_need: true, status: 'approved' });
    await knex('schools').where({ id: row!.id }).delete();
    expect(await knex('schools').where({ id: row!.id }).first()).toBeUndefined();
  });

  it('listens on loopback only', async () => {
    const { rows } = await knex.raw<{ rows: { listen_addresses: string }[] }>('SHOW listen_addresses');
    expect(rows[0]!.listen_addresses).toBe('127.0.0.1');
    const port = Number(new URL(TEST_DATABASE_URL).port);
    const outside = Object.values(networkInterfaces())
      .flat()
      .filter((i) => i && i.family === 'IPv4' && !i.internal)
      .map((i) => i!.address);
    for (const address of outside) {
      const refused = await new Promise<boolean>((resolve) => {
        const socket = net.connect({ host: address, port, timeout: 2000 });
        socket.once('connect', () => {
          socket.destroy();
          resolve(false);
        });
        socket.once('error', () => resolve(true));
        socket.once('timeout', () => {
          socket.destroy();
          resolve(true);
        });
      });
      expect(refused, `PostgreSQL answered on ${address}:${port}`).toBe(true);
    }
  });
});
