import nodemailer, { type SendMailOptions } from 'nodemailer';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { decodeEncodedWords, parseMail } from '@/server/mail/parse-mime';
import { signUp, startTestServer, type TestServer } from './helpers';

/** Builds the raw message nodemailer would send, without sending it. */
async function raw(message: SendMailOptions): Promise<string> {
  const transport = nodemailer.createTransport({ streamTransport: true, buffer: true });
  const info = await transport.sendMail({ from: 'Tubeloom <no-reply@tubeloom.invalid>', ...message });
  return (info.message as Buffer).toString('utf8');
}

describe('reading captured mail', () => {
  it('reads subject, text and html of a multipart message with non-ASCII text and long lines', async () => {
    const text = `Grüße aus der Werkstatt: ${'Rohrbogen '.repeat(20)}\nZweite Zeile – mit Gedankenstrich.`;
    const mail = parseMail(await raw({ to: 'zoë@tubeloom.test', subject: 'Einladung für Zoë Ångström', text, html: '<p>Grüße</p>' }));
    expect(mail.subject).toBe('Einladung für Zoë Ångström');
    expect(mail.text).toBe(text);
    expect(mail.html).toBe('<p>Grüße</p>');
    expect(mail.from).toContain('no-reply@tubeloom.invalid');
  });

  it('reads a base64 text-only message', async () => {
    const mail = parseMail(await raw({ to: 'a@tubeloom.test', subject: 'Plain', text: 'ÆØÅ '.repeat(40), textEncoding: 'base64' }));
    expect(mail.text).toBe('ÆØÅ '.repeat(40));
    expect(mail.html).toBeNull();
  });

  it('decodes RFC 2047 encoded words (Q and B)', () => {
    expect(decodeEncodedWords('=?UTF-8?Q?Zo=C3=AB_A?= =?UTF-8?B?w4VuZ3N0csO2bQ==?=')).toBe('Zoë AÅngström');
  });
});

describe('mail through the SMTP fake into outbox_messages', () => {
  let server: TestServer;
  beforeAll(async () => {
    server = await startTestServer();
  });
  afterAll(async () => {
    await server.close();
  });

  it('captures an invitation from a user with a non-ASCII name intact', async () => {
    const inviter = await signUp(server, 'Zoë Ångström');
    await inviter.agent.post(`/api/teams/${inviter.teamId}/invites`).send({ email: 'guest@tubeloom.test', role: 'viewer' }).expect(201);
    const [mail] = (await server.outbox()).filter((m) => m.to === 'guest@tubeloom.test');
    expect(mail.subject).toBe("Zoë Ångström invited you to Zoë Ångström's team on Tubeloom");
    expect(mail.text).toMatch(/as viewer\./);
    expect(mail.text).toMatch(/http:\/\/tubeloom\.test\/invite\/[\w-]{43}$/);
    expect(mail.html).toContain('&#39;'); // the team name's apostrophe is escaped in HTML
  });
});
