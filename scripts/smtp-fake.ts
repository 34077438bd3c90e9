/** Runs the SMTP fake on its own: `tsx scripts/smtp-fake.ts` (ports from KW_SMTP_PORT / KW_MAIL_HTTP_PORT). */
import { smtpFakeStart } from './lib/smtp-fake';

const smtpPort = Number(process.env.KW_SMTP_PORT ?? 2525);
const httpPort = Number(process.env.KW_MAIL_HTTP_PORT ?? 2580);
await smtpFakeStart(smtpPort, httpPort);
console.log(`[mail] SMTP fake on 127.0.0.1:${smtpPort}; captured mail at http://127.0.0.1:${httpPort}/messages`);
