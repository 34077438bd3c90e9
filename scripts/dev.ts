/** `npm run dev`: Astro's dev server on the same database and SMTP fake as npm start. */
import { spawn } from 'node:child_process';
import { APP_DATABASE, databaseUrl, PROJECT_ROOT } from './lib/postgres';
import { databaseUp } from './db';
import { migrateLatest, seedDemoIfEmpty } from './lib/migrate';
import { smtpFakeStart } from './lib/smtp-fake';
import { appEnv } from './lib/app-env';
import { jobWorkerStart } from '../src/lib/jobs/worker.server';

const host = process.env.HOST ?? '127.0.0.1';
const port = Number(process.env.PORT ?? 4321);
const smtpPort = Number(process.env.KW_SMTP_PORT ?? 2525);
const mailHttpPort = Number(process.env.KW_MAIL_HTTP_PORT ?? 2580);

await databaseUp();
const url = databaseUrl(APP_DATABASE);
await migrateLatest(url);
await seedDemoIfEmpty(url);
if (!process.env.SMTP_URL) await smtpFakeStart(smtpPort, mailHttpPort);
const env = appEnv({ databaseUrl: url, host, port, smtpPort, mailHttpPort });
// The dev server has no entry of ours, so the job worker (mail, reminders) runs here, in this process.
for (const key of ['DATABASE_URL', 'SITE_URL', 'SMTP_URL', 'MAIL_FROM'] as const) process.env[key] = env[key];
await jobWorkerStart({ connectionString: url });
const child = spawn('npx', ['astro', 'dev', '--host', host, '--port', String(port)], {
  cwd: PROJECT_ROOT,
  stdio: 'inherit',
  env,
});
child.on('exit', (code) => process.exit(code ?? 0));
