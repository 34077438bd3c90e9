/** Runs knex migrations and the demo seed against a database URL (scripts and tests). */
import knexFactory, { type Knex } from 'knex';
import config from '../../knexfile';

/** A Knex instance on the URL with the project's migration and seed settings. */
export function knexFor(url: string): Knex {
  return knexFactory({ ...config.development, connection: url, pool: { min: 0, max: 4 } });
}

/** Brings the schema up to date; returns the names of migrations that ran. */
export async function migrateLatest(url: string): Promise<string[]> {
  const knex = knexFor(url);
  try {
    const [, ran] = (await knex.migrate.latest()) as [number, string[]];
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
