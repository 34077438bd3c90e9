/**
 * Knex configuration. Every environment reads DATABASE_URL; scripts/db.ts sets it to the project's own
 * PostgreSQL (127.0.0.1:54329) for development and tests when it is not given.
 */
import type { Knex } from 'knex';
import { DATABASE_POOL_MAX_DEFAULT, serverConfig } from './src/lib/server-config';

const common: Knex.Config = {
  client: 'pg',
  migrations: { directory: './migrations', extension: 'ts', loadExtensions: ['.ts'], tableName: 'knex_migrations' },
  seeds: { directory: './seeds', loadExtensions: ['.ts'] },
};

function connection(fallbackDatabase: string): string {
  return (
    process.env.DATABASE_URL ?? `postgres://postgres@127.0.0.1:${process.env.KW_PG_PORT ?? 54329}/${fallbackDatabase}`
  );
}

const config: Record<'development' | 'test' | 'production', Knex.Config> = {
  development: { ...common, connection: connection('kitwright'), pool: { min: 0, max: DATABASE_POOL_MAX_DEFAULT } },
  test: { ...common, connection: connection('kitwright_test'), pool: { min: 0, max: DATABASE_POOL_MAX_DEFAULT } },
  production: {
    ...common,
    get connection() {
      if (!process.env.DATABASE_URL) throw new Error('DATABASE_URL must be set in production.');
      return process.env.DATABASE_URL;
    },
    pool: { min: 2, max: serverConfig('DATABASE_POOL_MAX') },
  },
};

export default config;
