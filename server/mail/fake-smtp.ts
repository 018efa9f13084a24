/**
 * The in-process SMTP fake for development and tests (FAKE_SERVICES=1): accepts any message on a loopback port and
 * stores it in `outbox_messages`, so the outbox page shows it across restarts. Never started in production use.
 */
import type { AddressInfo } from 'node:net';
import { SMTPServer } from 'smtp-server';
import type { Database } from '@/db/client';
import { insertOutboxMessage } from '@/db/queries/outbox';
import { parseMail } from '@/server/mail/parse-mime';

export interface FakeSmtp {
  url: string;
  close(): Promise<void>;
}

export async function startFakeSmtp(db: Database, onError: (err: unknown) => void): Promise<FakeSmtp> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    size: 5 * 1024 * 1024,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (c: Buffer) => chunks.push(c));
      stream.on('end', () => {
        const mail = parseMail(Buffer.concat(chunks).toString('utf8'));
        const envelopeTo = session.envelope.rcptTo.map((r) => r.address).join(', ');
        insertOutboxMessage(db, {
          from: mail.from,
          to: envelopeTo || mail.to,
          subject: mail.subject,
          text: mail.text,
          html: mail.html,
        }).then(
          () => callback(),
          (err: unknown) => {
            onError(err);
            callback(new Error('could not store the message'));
          },
        );
      });
    },
  });
  server.on('error', onError);
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.server.address() as AddressInfo;
  return {
    url: `smtp://127.0.0.1:${port}`,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
