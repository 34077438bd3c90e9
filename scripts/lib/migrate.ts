/** Runs knex migrations and the demo seed against a database URL (scripts and tests). */
import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import knexFactory, { type Knex } from 'knex';
import config from '../../knexfile';
import { jobSchemaMigrate } from '../../src/lib/jobs/worker.server';
import { PROJECT_ROOT } from './postgres';

const MIGRATIONS_DIR = join(PROJECT_ROOT, 'migrations');

/**
 * Loads migrations with this module's own dynamic import, so the same TypeScript files load under tsx
 * (scripts) and under vitest (tests), where knex's built-in loader cannot import .ts files.
 */
const migrationSource: Knex.MigrationSource<string> = {
  getMigrations: async () =>
    readdirSync(MIGRATIONS_DIR)
      .filter((f) => /^\d{14}_.+\.ts$/.test(f))
      .sort(),
  getMigrationName: (name) => name,
  getMigration: async (name) => (await import(pathToFileURL(join(MIGRATIONS_DIR, name)).href)) as Knex.Migration,
};

/** A Knex instance on the URL with the project's migration and seed settings. */
export function knexFor(url: string): Knex {
  return knexFactory({
    ...config.development,
    migrations: { tableName: config.development.migrations?.tableName, migrationSource },
    connection: url,
    pool: { min: 0, max: 4 },
  });
}

/** Brings the schema and the job queue's schema up to date; returns the names of our migrations that ran. */
export async function migrateLatest(url: string): Promise<string[]> {
  const knex = knexFor(url);
  try {
    const [, ran] = (await knex.migrate.latest()) as [number, string[]];
    await jobSchemaMigrate(url);
    return ran;
  } finally {
    await knex.destroy();
  }
}

/** Seeds the demo scenario when the database has no accounts yet; true when it seeded. */
export async function seedDemoIfEmpty(url: string): Promise<boolean> {
  const knex = knexFor(url);
  try {
    const [{ count }] = (await knex('users').count({ count: '*' })) as [{ count: string }];
    if (Number(count) > 0) return false;
    await knex.seed.run();
    return true;
  } finally {
    await knex.destroy();
  }
}
