/** Per-user e-mail notification switches; a user without a row gets every kind. */
import { and, eq, inArray } from 'drizzle-orm';
import type { Executor } from '@/db/client';
import { memberships, notificationSettings, users, type Role } from '@/db/schema';

export interface NotificationSwitches {
  reviewRequested: boolean;
  newComment: boolean;
  decision: boolean;
}
export type NotificationKind = keyof NotificationSwitches;

export const ALL_ON: NotificationSwitches = { reviewRequested: true, newComment: true, decision: true };

export async function findNotificationSettings(db: Executor, userId: string): Promise<NotificationSwitches> {
  const [row] = await db
    .select({
      reviewRequested: notificationSettings.reviewRequested,
      newComment: notificationSettings.newComment,
      decision: notificationSettings.decision,
    })
    .from(notificationSettings)
    .where(eq(notificationSettings.userId, userId))
    .limit(1);
  return row ?? ALL_ON;
}

export async function saveNotificationSettings(db: Executor, userId: string, settings: NotificationSwitches): Promise<void> {
  await db
    .insert(notificationSettings)
    .values({ userId, ...settings })
    .onConflictDoUpdate({ target: notificationSettings.userId, set: { ...settings, updatedAt: new Date() } });
}

/** Name and address of each given user who is still in the team and has not switched `kind` off. */
export async function recipientsWanting(db: Executor, teamId: string, userIds: string[], kind: NotificationKind) {
  if (userIds.length === 0) return [];
  const rows = await db
    .select({ id: users.id, email: users.email, name: users.name, settings: notificationSettings })
    .from(users)
    .innerJoin(memberships, and(eq(memberships.userId, users.id), eq(memberships.teamId, teamId)))
    .leftJoin(notificationSettings, eq(notificationSettings.userId, users.id))
    .where(inArray(users.id, userIds));
  return rows.filter((r) => r.settings === null || r.settings[kind]).map(({ id, email, name }) => ({ id, email, name }));
}

export async function teamMemberIdsWithRole(db: Executor, teamId: string, role: Role): Promise<string[]> {
  const rows = await db
    .select({ userId: memberships.userId })
    .from(memberships)
    .where(and(eq(memberships.teamId, teamId), eq(memberships.role, role)));
  return rows.map((r) => r.userId);
}
