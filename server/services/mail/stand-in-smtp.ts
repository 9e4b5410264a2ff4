// The local stand-in for a mail service: an SMTP server that files every message it receives as
// JSON in a folder (the Outbox page lists the app's own record of what it sent, in sent_mail).
import { SMTPServer } from 'smtp-server';
import { simpleParser } from 'mailparser';
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { randomUUID } from 'node:crypto';

/** One message as the stand-in files it: DIR/<id>.json. */
export interface FiledMessage {
  id: string;
  from: string;
  to: string;
  subject: string;
  text: string;
  html: string | null;
  receivedAt: string;
}

export interface StandInSmtp {
  port: number;
  close(): Promise<void>;
}

const MAX_MESSAGE_BYTES = 5 * 1024 * 1024;

export function startStandInSmtp(opts: { port: number; dir: string; host?: string }): Promise<StandInSmtp> {
  mkdirSync(opts.dir, { recursive: true });
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    size: MAX_MESSAGE_BYTES,
    logger: false,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((mail) => {
          const to = Array.isArray(mail.to) ? mail.to.map((a) => a.text).join(', ') : (mail.to?.text ?? '');
          const message: FiledMessage = {
            id: `${Date.now().toString(36)}-${randomUUID().slice(0, 8)}`,
            from: mail.from?.text ?? '',
            to,
            subject: mail.subject ?? '(no subject)',
            text: mail.text ?? '',
            html: typeof mail.html === 'string' ? mail.html : null,
            receivedAt: new Date().toISOString(),
          };
          writeFileSync(join(opts.dir, `${message.id}.json`), JSON.stringify(message));
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });
  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(opts.port, opts.host ?? '127.0.0.1', () => {
      const address = server.server.address();
      const port = typeof address === 'object' && address ? address.port : opts.port;
      resolve({ port, close: () => new Promise<void>((r) => server.close(() => r())) });
    });
  });
}
