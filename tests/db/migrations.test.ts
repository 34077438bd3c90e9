import { afterAll, describe, expect, it } from 'vitest';
import { readdirSync } from 'node:fs';
import { knexFor } from '../../scripts/lib/migrate';
import { scratchDatabaseCreate } from './database';

const MIGRATIONS = readdirSync(new URL('../../migrations', import.meta.url)).filter((f) => f.endsWith('.ts'));

describe('migrations', () => {
  let knex: ReturnType<typeof knexFor> | undefined;
  afterAll(async () => {
    await knex?.destroy();
  });

  it('run every migration up, down and up again on an empty database', async () => {
    knex = knexFor(await scratchDatabaseCreate('kitwright_migration_check'));
    const tables = async () =>
      (
        await knex!.raw<{ rows: { tablename: string }[] }>(
          "SELECT tablename FROM pg_tables WHERE schemaname = 'public' AND tablename NOT LIKE 'knex_%' ORDER BY 1",
        )
      ).rows.map((r) => r.tablename);

    const [, first] = (await knex.migrate.latest()) as [number, string[]];
    expect(first).toHaveLength(MIGRATIONS.length);
    const afterUp = await tables();
    expect(afterUp).toContain('users');
    expect(afterUp).toContain('entries');

    await knex.migrate.rollback(undefined, true);
    expect(await tables()).toEqual([]);
    const types = await knex.raw<{ rows: unknown[] }>(
      "SELECT typname FROM pg_type t JOIN pg_namespace n ON n.oid = t.typnamespace WHERE n.nspname = 'public' AND t.typtype = 'e'",
    );
    expect(types.rows).toEqual([]);

    await knex.migrate.latest();
    expect(await tables()).toEqual(afterUp);
  });
});
