/**
 * Database lifecycle: `tsx scripts/db.ts <start|stop|migrate|seed|url>`.
 * start   — install PostgreSQL if missing, create and start the project cluster, create both databases
 * stop    — stop the project cluster
 * migrate — start, then migrate the app database
 * seed    — start, migrate, and seed the demo when the app database is empty
 */
import { APP_DATABASE, TEST_DATABASE, databaseEnsure, databaseUrl, postgresEnsure, postgresStop } from './lib/postgres';
import { migrateLatest, seedDemoIfEmpty } from './lib/migrate';

/** Ensures the server and both databases exist; returns the app database URL. */
export async function databaseUp(): Promise<string> {
  postgresEnsure();
  await databaseEnsure(APP_DATABASE);
  await databaseEnsure(TEST_DATABASE);
  return databaseUrl(APP_DATABASE);
}

async function main(command: string | undefined): Promise<void> {
  switch (command) {
    case 'start':
      console.log(`[db] ready: ${await databaseUp()}`);
      return;
    case 'stop':
      postgresStop();
      return;
    case 'migrate': {
      const ran = await migrateLatest(await databaseUp());
      console.log(ran.length ? `[db] migrated: ${ran.join(', ')}` : '[db] schema already up to date');
      return;
    }
    case 'seed': {
      const url = await databaseUp();
      await migrateLatest(url);
      console.log((await seedDemoIfEmpty(url)) ? '[db] demo data seeded' : '[db] database has data; seed skipped');
      return;
    }
    case 'url':
      console.log(databaseUrl(APP_DATABASE));
      return;
    default:
      console.error('usage: tsx scripts/db.ts <start|stop|migrate|seed|url>');
      process.exitCode = 2;
  }
}

if (import.meta.url === `file://${process.argv[1]}`) {
  main(process.argv[2]).catch((err) => {
    console.error(err instanceof Error ? err.message : err);
    process.exitCode = 1;
  });
}
