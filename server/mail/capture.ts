import type { AddressInfo } from 'node:net';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { Db } from '../db/client';
import { capturedMail } from '../db/schema';

/**
 * Local fake mail server for demo, development and tests: accepts SMTP on loopback and stores every
 * message in `captured_mail`, which site admins read on the outbox page. Never used when SMTP_URL is set.
 */
export async function startMailCapture(db: Db, port = 0): Promise<{ url: string; close(): Promise<void> }> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    size: 5 * 1024 * 1024,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then(async (parsed) => {
          const to = Array.isArray(parsed.to)
            ? parsed.to.map((a) => a.text).join(', ')
            : (parsed.to?.text ?? '');
          await db.insert(capturedMail).values({
            from: parsed.from?.text ?? '',
            to,
            subject: parsed.subject ?? '(no subject)',
            text: parsed.text ?? '',
            html: typeof parsed.html === 'string' ? parsed.html : null,
          });
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });
  await new Promise<void>((resolve) => server.listen(port, '127.0.0.1', resolve));
  const { port: actual } = server.server.address() as AddressInfo;
  return {
    url: `smtp://127.0.0.1:${actual}?ignoreTLS=true`,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
