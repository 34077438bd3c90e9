/**
 * A local SMTP fake for development and tests: accepts every message on 127.0.0.1, keeps it in memory and
 * serves the kept messages as JSON over HTTP (GET /messages, GET /messages/latest?to=…, DELETE /messages),
 * so tests can follow the links in a mail and an admin can read the outbox page in development.
 */
import { createServer, type Server } from 'node:http';
import { SMTPServer } from 'smtp-server';
import { simpleParser } from 'mailparser';
import type { CapturedMail } from '../../src/lib/mail/captured-mail';

export interface SmtpFake {
  smtpPort: number;
  httpPort: number;
  close(): Promise<void>;
}

/** Starts the fake on the two loopback ports. */
export async function smtpFakeStart(smtpPort: number, httpPort: number): Promise<SmtpFake> {
  const messages: CapturedMail[] = [];
  let nextId = 1;
  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    size: 5 * 1024 * 1024,
    async onData(stream, session, callback) {
      try {
        const parsed = await simpleParser(stream);
        messages.push({
          id: nextId++,
          receivedAt: new Date().toISOString(),
          from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
          to: session.envelope.rcptTo.map((r) => r.address.toLowerCase()),
          subject: parsed.subject ?? '',
          text: parsed.text ?? '',
          html: typeof parsed.html === 'string' ? parsed.html : '',
        });
        if (messages.length > 1000) messages.shift();
        callback();
      } catch (err) {
        callback(err as Error);
      }
    },
  });
  await new Promise<void>((resolve, reject) => {
    smtp.once('error', reject);
    smtp.listen(smtpPort, '127.0.0.1', () => resolve());
  });

  const http: Server = createServer((req, res) => {
    const url = new URL(req.url ?? '/', 'http://127.0.0.1');
    res.setHeader('content-type', 'application/json');
    if (req.method === 'DELETE' && url.pathname === '/messages') {
      messages.length = 0;
      res.end('{"ok":true}');
      return;
    }
    if (req.method === 'GET' && url.pathname === '/messages') {
      const to = url.searchParams.get('to')?.toLowerCase();
      res.end(JSON.stringify(to ? messages.filter((m) => m.to.includes(to)) : messages));
      return;
    }
    res.statusCode = 404;
    res.end('{"error":"not found"}');
  });
  await new Promise<void>((resolve, reject) => {
    http.once('error', reject);
    http.listen(httpPort, '127.0.0.1', () => resolve());
  });

  return {
    smtpPort,
    httpPort,
    close: () =>
      new Promise<void>((resolve) => {
        http.close(() => smtp.close(() => resolve()));
      }),
  };
}
