/**
 * The shape of an outgoing message and the one HTML frame every message uses. Framework-free. Every message
 * has a plain-text part and an HTML part with the same words.
 */
export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html: string;
  /** Text files sent with the message (a calendar file); JSON-safe so the message can wait on the job queue. */
  attachments?: MailAttachment[];
}

export interface MailAttachment {
  filename: string;
  contentType: string;
  content: string;
}

/** Escapes text for HTML element content and attribute values. */
export function htmlEscape(value: string): string {
  return value
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&#39;');
}

export interface MailBody {
  to: string;
  subject: string;
  greeting: string;
  paragraphs: string[];
  action?: { label: string; url: string };
  footnote: string;
}

/** Builds both parts of a message from paragraphs, an optional link button and a footnote. */
export function mailCompose(body: MailBody): MailMessage {
  const text = [
    body.greeting,
    '',
    ...body.paragraphs.flatMap((p) => [p, '']),
    ...(body.action ? [`${body.action.label}:`, body.action.url, ''] : []),
    body.footnote,
    '',
    '— Kitwright',
  ].join('\n');
  const para = (p: string) => `<p style="margin:0 0 16px">${htmlEscape(p)}</p>`;
  const action = body.action
    ? `<p style="margin:0 0 16px"><a href="${htmlEscape(body.action.url)}" style="display:inline-block;background:#0d6b62;color:#ffffff;padding:10px 18px;border-radius:8px;text-decoration:none;font-weight:bold">${htmlEscape(body.action.label)}</a></p>` +
      `<p style="margin:0 0 16px;font-size:13px;color:#46505f">If the button does not work, copy this address into your browser:<br>${htmlEscape(body.action.url)}</p>`
    : '';
  const html = `<!doctype html><html lang="en"><body style="margin:0;padding:24px;background:#fbf9f4;color:#1b2330;font-family:system-ui,sans-serif;font-size:16px;line-height:1.5"><div style="max-width:560px;margin:0 auto;background:#ffffff;border:1px solid #e3e0d8;border-radius:14px;padding:24px"><p style="margin:0 0 16px;font-weight:bold;font-size:18px">Kitwright</p>${para(body.greeting)}${body.paragraphs.map(para).join('')}${action}<p style="margin:0;font-size:13px;color:#46505f">${htmlEscape(body.footnote)}</p></div></body></html>`;
  return { to: body.to, subject: body.subject, text, html };
}
