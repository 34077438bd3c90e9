/** Database helpers for tests: the test database (scripts/test.ts migrates and seeds it) and scratch databases. */
import knexFactory, { type Knex } from 'knex';
import pg from 'pg';

export const TEST_DATABASE_URL =
  process.env.KW_TEST_DATABASE_URL ?? 'postgres://postgres@127.0.0.1:54329/kitwright_test';
export const ADMIN_DATABASE_URL = process.env.KW_ADMIN_DATABASE_URL ?? 'postgres://postgres@127.0.0.1:54329/postgres';

/** A Knex instance on the test database; destroy it in afterAll. */
export function testKnex(): Knex {
  return knexFactory({ client: 'pg', connection: TEST_DATABASE_URL, pool: { min: 0, max: 2 } });
}

/** Creates an empty scratch database and returns its URL. */
export async function scratchDatabaseCreate(name: string): Promise<string> {
  const admin = new pg.Client({ connectionString: ADMIN_DATABASE_URL });
  await admin.connect();
  try {
    await admin.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`);
    await admin.query(`CREATE DATABASE "${name}"`);
  } finally {
    await admin.end();
  }
  const url = new URL(ADMIN_DATABASE_URL);
  url.pathname = `/${name}`;
  return url.toString();
}
