/** A message the local SMTP fake (scripts/lib/smtp-fake.ts) captured, as it serves it over HTTP. */
export interface CapturedMail {
  id: number;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
}
