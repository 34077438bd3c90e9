/**
 * The app's one Knex instance (server only), on DATABASE_URL. Created lazily so importing a store does not
 * open connections at build time.
 */
import knexFactory, { type Knex } from 'knex';
import { serverConfig } from '../server-config';

let instance: Knex | undefined;

/** The shared Knex instance. */
export function db(): Knex {
  if (!instance) {
    const url = serverConfig('DATABASE_URL');
    if (!url) throw new Error('DATABASE_URL is not set; start the app with `npm start` or `npm run dev`.');
    instance = knexFactory({
      client: 'pg',
      connection: url,
      pool: { min: 0, max: serverConfig('DATABASE_POOL_MAX') },
    });
  }
  return instance;
}

/** Closes the pool (tests and scripts). */
export async function dbClose(): Promise<void> {
  await instance?.destroy();
  instance = undefined;
}
