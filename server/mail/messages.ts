/** The words of the mails Tubeloom sends. Plain text first; the HTML part repeats it with a link. */
import type { MailMessage } from '@/server/mail/mailer';

function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

function message(to: string, subject: string, paragraphs: string[], link: { label: string; url: string }): MailMessage {
  const text = [...paragraphs, `${link.label}: ${link.url}`].join('\n\n');
  const html = [
    ...paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`),
    `<p><a href="${escapeHtml(link.url)}">${escapeHtml(link.label)}</a></p>`,
  ].join('\n');
  return { to, subject, text, html };
}

export function passwordResetMail(to: string, name: string, url: string): MailMessage {
  return message(
    to,
    'Reset your Tubeloom password',
    [
      `Hello ${name},`,
      'Someone (hopefully you) asked to reset the password of your Tubeloom account. The link works once, for one hour.',
      'If you did not ask for this, ignore this mail: your password stays as it is.',
    ],
    { label: 'Choose a new password', url },
  );
}

export function inviteMail(to: string, inviterName: string, teamName: string, role: string, url: string): MailMessage {
  return message(
    to,
    `${inviterName} invited you to ${teamName} on Tubeloom`,
    [
      `${inviterName} invited you to join the team "${teamName}" on Tubeloom as ${role}.`,
      'The link works once and expires in 7 days. Sign in or create an account, then accept.',
    ],
    { label: 'Open the invitation', url },
  );
}
