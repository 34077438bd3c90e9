/**
 * `npm start`: the app on the demo data. Ensures PostgreSQL, migrates, seeds the demo on an empty database,
 * starts the SMTP fake (unless SMTP_URL is set), builds, and serves on http://127.0.0.1:4321.
 */
import { APP_DATABASE, databaseUrl } from './lib/postgres';
import { databaseUp } from './db';
import { migrateLatest, seedDemoIfEmpty } from './lib/migrate';
import { smtpFakeStart } from './lib/smtp-fake';
import { appBuild } from './lib/build';
import { appEnv } from './lib/app-env';
import { serverStart } from './lib/server';
import { DEMO_ACCOUNTS } from '../seeds/data/demo-accounts';

const host = process.env.HOST ?? '127.0.0.1';
const port = Number(process.env.PORT ?? 4321);
const smtpPort = Number(process.env.KW_SMTP_PORT ?? 2525);
const mailHttpPort = Number(process.env.KW_MAIL_HTTP_PORT ?? 2580);

await databaseUp();
const url = databaseUrl(APP_DATABASE);
await migrateLatest(url);
const seeded = await seedDemoIfEmpty(url);
if (!process.env.SMTP_URL) await smtpFakeStart(smtpPort, mailHttpPort);
appBuild();
const server = await serverStart(appEnv({ databaseUrl: url, host, port, smtpPort, mailHttpPort }));

console.log(`\nKitwright is running at ${server.url}${seeded ? ' (demo data seeded)' : ''}`);
console.log('Demo accounts (invented, for the demo only):');
for (const a of DEMO_ACCOUNTS) console.log(`  ${a.role.padEnd(12)} ${a.email.padEnd(38)} ${a.password}`);
console.log('Students: open /join and enter a class code, e.g. JFMS3K7Q.');
if (!process.env.SMTP_URL)
  console.log(`Mail is caught by the local SMTP fake: sign in as admin and open /admin/outbox.`);
console.log('Press Ctrl+C to stop.');

for (const signal of ['SIGINT', 'SIGTERM'] as const) {
  process.on(signal, () => {
    void server.stop().then(() => process.exit(0));
  });
}
server.child.on('exit', (code) => process.exit(code ?? 0));
