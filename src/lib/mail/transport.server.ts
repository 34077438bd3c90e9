/**
 * Sends mail through nodemailer over SMTP_URL (a hosted provider in production; the local SMTP fake on
 * loopback in development and tests, where plain smtp:// without STARTTLS is used). MAIL_FROM names the sender.
 */
import nodemailer, { type Transporter } from 'nodemailer';
import type { MailMessage } from './message';

let transport: Transporter | undefined;

function isLoopbackPlain(url: URL): boolean {
  return url.protocol === 'smtp:' && ['127.0.0.1', 'localhost', '[::1]'].includes(url.hostname);
}

/** The shared transport; throws when SMTP_URL is missing. */
export function mailTransport(): Transporter {
  if (!transport) {
    const smtpUrl = process.env.SMTP_URL;
    if (!smtpUrl) throw new Error('SMTP_URL is not set; mail cannot be sent.');
    const url = new URL(smtpUrl);
    transport = nodemailer.createTransport(
      isLoopbackPlain(url) ? { url: smtpUrl, secure: false, ignoreTLS: true } : { url: smtpUrl },
    );
  }
  return transport;
}

/** Sends one message and waits for the server to accept it. */
export async function mailSend(message: MailMessage): Promise<void> {
  await mailTransport().sendMail({
    from: process.env.MAIL_FROM ?? 'Kitwright <no-reply@kitwright.example>',
    to: message.to,
    subject: message.subject,
    text: message.text,
    html: message.html,
  });
}

/**
 * Sends without making the caller wait: for answers that must not reveal, by their timing, whether an
 * address has an account (password reset, sign-up with a taken address). Failures are logged.
 */
export function mailSendLater(message: MailMessage, requestId: string): void {
  mailSend(message).catch((err: unknown) => {
    console.error(`[${requestId}] mail to ${message.to} failed`, err);
  });
}
