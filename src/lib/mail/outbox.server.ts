/**
 * Reads the messages captured by the local SMTP fake (development only: MAIL_OUTBOX_URL is set by npm start and
 * npm test, and empty when a real SMTP_URL is configured).
 */
import type { CapturedMail } from './captured-mail';
import { serverConfig } from '../server-config';

/** A captured message, as the SMTP fake serves it. */
export type OutboxMessage = CapturedMail;

/** True when an outbox exists to read (development and tests). */
export function outboxAvailable(): boolean {
  return serverConfig('MAIL_OUTBOX_URL') !== undefined;
}

/** The captured messages, newest first; null when there is no outbox or it cannot be reached. */
export async function outboxMessages(): Promise<OutboxMessage[] | null> {
  const url = serverConfig('MAIL_OUTBOX_URL');
  if (!url) return null;
  try {
    const res = await fetch(url, { signal: AbortSignal.timeout(3000) });
    if (!res.ok) return null;
    const messages = (await res.json()) as OutboxMessage[];
    return messages.slice().reverse();
  } catch {
    return null;
  }
}
