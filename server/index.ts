/**
 * Starts Tubeloom: config, database (migrated when MIGRATE_ON_START=1), mail (the in-process fake when
 * FAKE_SERVICES=1), then listens. SIGINT/SIGTERM close the server, the fakes and the pool, in that order.
 */
import type { Server } from 'node:http';
import { createDatabase } from '@/db/client';
import { migrateDatabase } from '@/db/migrate';
import { createApp } from '@/server/app';
import { createSessionAuth } from '@/server/auth/sessions';
import { loadConfig } from '@/server/config';
import { createLogger } from '@/server/logger';
import { createDisabledMailer, createSmtpMailer, type Mailer } from '@/server/mail/mailer';

async function main(): Promise<void> {
  const config = loadConfig();
  const logger = createLogger(config.logLevel);
  const database = createDatabase(config.databaseUrl);
  const stops: (() => Promise<void> | void)[] = [() => database.close()];

  if (config.migrateOnStart) {
    await migrateDatabase(database.db);
    logger.info('migrations applied');
  }

  let mailer: Mailer;
  if (config.fakeServices) {
    // Loaded only when asked for, so a production start never touches the fake.
    const { startFakeSmtp } = await import('@/server/mail/fake-smtp');
    const smtp = await startFakeSmtp(database.db, (err) => logger.error({ err }, 'fake SMTP error'));
    stops.unshift(() => smtp.close());
    mailer = createSmtpMailer(smtp.url, config.mailFrom);
    logger.info({ smtp: smtp.url }, 'fake SMTP capturing mail into outbox_messages');
    // Attachments go to an in-process S3 fake (s3rver, data in .tmp/fake-s3) on a random loopback port.
    const { startFakeS3 } = await import('@/server/storage/fake-s3');
    const s3 = await startFakeS3(config.s3);
    config.s3 = s3.settings;
    stops.unshift(() => s3.close());
    logger.info({ s3: s3.settings.endpoint }, 'fake S3 storing attachments');
  } else if (config.smtpUrl) {
    mailer = createSmtpMailer(config.smtpUrl, config.mailFrom);
  } else {
    mailer = createDisabledMailer((m) => logger.warn({ to: m.to, subject: m.subject }, 'no SMTP_URL: mail not sent'));
  }
  stops.unshift(() => mailer.close());

  // Housekeeping: expired sessions are dropped at start and every six hours.
  const sessions = createSessionAuth(database.db, { secureCookie: false });
  const sweep = () => sessions.deleteExpired().catch((err: unknown) => logger.warn({ err }, 'expired-session sweep failed'));
  void sweep();
  const sweeper = setInterval(sweep, 6 * 60 * 60 * 1000);
  sweeper.unref();
  stops.unshift(() => clearInterval(sweeper));

  const app = createApp({ config, db: database.db, mailer, logger });
  const server: Server = await new Promise((resolve, reject) => {
    const s = app.listen(config.port, config.host, (err?: Error) => (err ? reject(err) : resolve(s)));
  });
  const address = server.address();
  const port = typeof address === 'object' && address ? address.port : config.port;
  // Plain stdout line (not only the JSON log) so scripts and tests can find the bound port, PORT=0 included.
  console.log(`Tubeloom listening on http://${config.host}:${port}`);

  let stopping = false;
  const shutdown = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    logger.info({ signal }, 'shutting down');
    server.closeIdleConnections();
    await new Promise<void>((resolve) => server.close(() => resolve()));
    for (const stop of stops) await stop();
    process.exit(0);
  };
  process.on('SIGINT', () => void shutdown('SIGINT'));
  process.on('SIGTERM', () => void shutdown('SIGTERM'));
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
