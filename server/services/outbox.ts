/** The captured-mail page: owners of any team, or anyone outside production. */
import { listOutboxMessages } from '@/db/queries/outbox';
import { isOwnerOfAnyTeam } from '@/db/queries/teams';
import { forbidden } from '@/server/errors';
import type { ServiceDeps } from '@/server/services/context';

export function outboxService(deps: ServiceDeps) {
  const { db, config } = deps;
  return {
    async list(userId: string) {
      if (config.isProduction && !(await isOwnerOfAnyTeam(db, userId))) {
        throw forbidden('Only team owners can read the captured mail.');
      }
      const rows = await listOutboxMessages(db);
      return rows.map((m) => ({ id: m.id, from: m.from, to: m.to, subject: m.subject, text: m.text, html: m.html ?? undefined, sentAt: m.sentAt }));
    },
  };
}
