/**
 * E-mail notifications about reviews: a review link was made (to the team's reviewers), a comment was written on a
 * coil (to its creator and last editor), a decision was recorded (to the version's author). Each user can switch
 * each kind off. A mail that fails is logged and never fails the action that caused it; the actor is never mailed.
 */
import {
  findNotificationSettings,
  recipientsWanting,
  saveNotificationSettings,
  teamMemberIdsWithRole,
  type NotificationKind,
  type NotificationSwitches,
} from '@/db/queries/notification-settings';
import type { DecisionStatus } from '@/lib/schema/api-versions';
import type { MailMessage } from '@/server/mail/mailer';
import type { ServiceDeps } from '@/server/services/context';

function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

function mail(to: string, subject: string, paragraphs: string[], link: { label: string; url: string }): MailMessage {
  const footer = 'You can turn this kind of e-mail off in Tubeloom under Settings, Notifications.';
  const text = [...paragraphs, `${link.label}: ${link.url}`, footer].join('\n\n');
  const html = [
    ...paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`),
    `<p><a href="${escapeHtml(link.url)}">${escapeHtml(link.label)}</a></p>`,
    `<p style="color:#666">${escapeHtml(footer)}</p>`,
  ].join('\n');
  return { to, subject, text, html };
}

const quote = (body: string) => (body.length > 400 ? `${body.slice(0, 400)}...` : body);

export interface VersionRef {
  teamId: string;
  coilName: string;
  versionNumber: number;
}

export function notificationService(deps: ServiceDeps) {
  const { db, mailer, logger } = deps;

  async function deliver(teamId: string, userIds: (string | null)[], actorId: string | null, kind: NotificationKind, build: (recipient: { email: string; name: string }) => MailMessage) {
    const ids = [...new Set(userIds.filter((id): id is string => id !== null && id !== actorId))];
    const recipients = await recipientsWanting(db, teamId, ids, kind);
    for (const r of recipients) {
      try {
        await mailer.send(build(r));
      } catch (err) {
        logger.error({ err, kind }, 'notification mail failed');
      }
    }
  }

  return {
    settings: (userId: string): Promise<NotificationSwitches> => findNotificationSettings(db, userId),

    async saveSettings(userId: string, settings: NotificationSwitches): Promise<NotificationSwitches> {
      await saveNotificationSettings(db, userId, settings);
      return settings;
    },

    async reviewRequested(ref: VersionRef, input: { actorId: string; actorName: string; message: string; url: string; expiresAt: Date | null }) {
      const reviewers = await teamMemberIdsWithRole(db, ref.teamId, 'reviewer');
      await deliver(ref.teamId, reviewers, input.actorId, 'reviewRequested', (r) =>
        mail(r.email, `Review requested: ${ref.coilName}, version ${ref.versionNumber}`, [
          `Hello ${r.name},`,
          `${input.actorName} asks for a review of version ${ref.versionNumber} of the coil "${ref.coilName}": ${input.message}`,
          input.expiresAt ? `The review link works until ${input.expiresAt.toUTCString()}.` : 'The review link works until it is revoked.',
        ], { label: 'Open the review', url: input.url }),
      );
    },

    async newComment(ref: VersionRef, input: { recipients: (string | null)[]; actorId: string | null; authorName: string; body: string; url: string }) {
      await deliver(ref.teamId, input.recipients, input.actorId, 'newComment', (r) =>
        mail(r.email, `New comment on ${ref.coilName}, version ${ref.versionNumber}`, [
          `Hello ${r.name},`,
          `${input.authorName} commented on version ${ref.versionNumber} of the coil "${ref.coilName}":`,
          quote(input.body),
        ], { label: 'Open the coil', url: input.url }),
      );
    },

    async decisionRecorded(ref: VersionRef, input: { authorId: string | null; actorId: string; actorName: string; status: DecisionStatus; note: string; url: string }) {
      const verdict = input.status === 'approved' ? 'approved' : 'asked for changes to';
      await deliver(ref.teamId, [input.authorId], input.actorId, 'decision', (r) =>
        mail(r.email, `${input.status === 'approved' ? 'Approved' : 'Changes requested'}: ${ref.coilName}, version ${ref.versionNumber}`, [
          `Hello ${r.name},`,
          `${input.actorName} ${verdict} version ${ref.versionNumber} of the coil "${ref.coilName}".`,
          ...(input.note ? [`Note: ${quote(input.note)}`] : []),
        ], { label: 'Open the coil', url: input.url }),
      );
    },
  };
}

export type NotificationService = ReturnType<typeof notificationService>;
