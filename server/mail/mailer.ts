/** Outgoing mail through nodemailer to SMTP_URL (in development and tests, the in-process fake). */
import nodemailer from 'nodemailer';

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html?: string;
}

export interface Mailer {
  send(message: MailMessage): Promise<void>;
  close(): void;
}

export function createSmtpMailer(smtpUrl: string, from: string): Mailer {
  const transport = nodemailer.createTransport(smtpUrl);
  return {
    async send(message) {
      await transport.sendMail({ from, ...message });
    },
    close: () => transport.close(),
  };
}

/** For a server with no SMTP_URL and no fakes: mail is logged as skipped, never sent. */
export function createDisabledMailer(onSkip: (message: MailMessage) => void): Mailer {
  return {
    async send(message) {
      onSkip(message);
    },
    close: () => undefined,
  };
}
