/**
 * Sends mail through nodemailer over SMTP_URL (a hosted provider in production; the local SMTP fake on
 * loopback in development and tests, where plain smtp:// without STARTTLS is used). MAIL_FROM names the sender.
 *
 * Requests never wait on SMTP: `mailSend` puts the message on the job queue (in the caller's transaction when
 * one is given) and the worker's `mail-deliver` task calls `mailDeliver`, retrying with backoff and recording a
 * dead letter when the server still refuses after MAIL_MAX_ATTEMPTS.
 */
import type { Knex } from 'knex';
import nodemailer, { type Transporter } from 'nodemailer';
import { jobAdd } from '../jobs/job-add.server';
import type { MailMessage } from './message';
import { serverConfig } from '../server-config';

/** Delivery attempts before a message becomes a dead letter (backoff e^n s between tries: ~1.5 min in all). */
export const MAIL_MAX_ATTEMPTS = 5;

let transport: Transporter | undefined;

function isLoopbackPlain(url: URL): boolean {
  return url.protocol === 'smtp:' && ['127.0.0.1', 'localhost', '[::1]'].includes(url.hostname);
}

/** The shared transport; throws when SMTP_URL is missing. */
export function mailTransport(): Transporter {
  if (!transport) {
    const smtpUrl = serverConfig('SMTP_URL');
    if (!smtpUrl) throw new Error('SMTP_URL is not set; mail cannot be sent.');
    const url = new URL(smtpUrl);
    transport = nodemailer.createTransport(
      isLoopbackPlain(url) ? { url: smtpUrl, secure: false, ignoreTLS: true } : { url: smtpUrl },
    );
  }
  return transport;
}

/** Hands one message to the SMTP server and waits for it to accept it (the worker's job; not for requests). */
export async function mailDeliver(message: MailMessage): Promise<void> {
  await mailTransport().sendMail({
    from: serverConfig('MAIL_FROM'),
    to: message.to,
    subject: message.subject,
    text: message.text,
    html: message.html,
    attachments: message.attachments?.map((a) => ({
      filename: a.filename,
      contentType: a.contentType,
      content: a.content,
    })),
  });
}

/** Queues one message for delivery; resolves once the job is stored (in `trx` when given). */
export async function mailSend(message: MailMessage, options: { trx?: Knex } = {}): Promise<void> {
  await jobAdd('mail-deliver', message, { trx: options.trx, maxAttempts: MAIL_MAX_ATTEMPTS });
}

/**
 * Queues without making the caller wait: for answers that must not reveal, by their timing, whether an
 * address has an account (password reset, sign-up with a taken address). Failures are logged.
 */
export function mailSendLater(message: MailMessage, requestId: string): void {
  mailSend(message).catch((err: unknown) => {
    console.error(`[${requestId}] mail to ${message.to} could not be queued`, err);
  });
}
