/** Invitations and password resets: single-use rows found by token hash. */
import { and, asc, eq, gt, isNull } from 'drizzle-orm';
import type { Executor } from '@/db/client';
import { invites, passwordResets, teams, type InviteRow, type Role } from '@/db/schema';

export async function insertInvite(
  db: Executor,
  values: { teamId: string; email: string; role: Role; tokenHash: string; invitedBy: string; expiresAt: Date },
): Promise<InviteRow> {
  const [row] = await db.insert(invites).values(values).returning();
  return row;
}

/** An open invite (not accepted, not expired) with its team's name. */
export async function findOpenInvite(db: Executor, tokenHash: string, now: Date) {
  const [row] = await db
    .select({ invite: invites, teamName: teams.name })
    .from(invites)
    .innerJoin(teams, eq(teams.id, invites.teamId))
    .where(and(eq(invites.tokenHash, tokenHash), isNull(invites.acceptedAt), gt(invites.expiresAt, now)))
    .limit(1);
  return row;
}

/** Marks the invite used; false when someone else used it first (single use under concurrency). */
export async function claimInvite(db: Executor, inviteId: string, userId: string, now: Date): Promise<boolean> {
  const rows = await db
    .update(invites)
    .set({ acceptedAt: now, acceptedBy: userId })
    .where(and(eq(invites.id, inviteId), isNull(invites.acceptedAt)))
    .returning({ id: invites.id });
  return rows.length === 1;
}

export function listOpenInvites(db: Executor, teamId: string, now: Date) {
  return db
    .select({ id: invites.id, email: invites.email, role: invites.role, expiresAt: invites.expiresAt })
    .from(invites)
    .where(and(eq(invites.teamId, teamId), isNull(invites.acceptedAt), gt(invites.expiresAt, now)))
    .orderBy(asc(invites.createdAt));
}

export async function insertPasswordReset(db: Executor, values: { userId: string; tokenHash: string; expiresAt: Date }) {
  await db.insert(passwordResets).values(values);
}

/** Uses a reset token once: returns the user id, or undefined when unknown, used or expired. */
export async function claimPasswordReset(db: Executor, tokenHash: string, now: Date): Promise<string | undefined> {
  const [row] = await db
    .update(passwordResets)
    .set({ usedAt: now })
    .where(and(eq(passwordResets.tokenHash, tokenHash), isNull(passwordResets.usedAt), gt(passwordResets.expiresAt, now)))
    .returning({ userId: passwordResets.userId });
  return row?.userId;
}
