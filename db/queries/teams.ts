import { and, asc, eq, sql } from 'drizzle-orm';
import type { Executor } from '@/db/client';
import { memberships, teams, users, type Role, type TeamRow } from '@/db/schema';

export async function insertTeam(db: Executor, name: string): Promise<TeamRow> {
  const [row] = await db.insert(teams).values({ name }).returning();
  return row;
}

export async function findTeam(db: Executor, id: string): Promise<TeamRow | undefined> {
  const [row] = await db.select().from(teams).where(eq(teams.id, id)).limit(1);
  return row;
}

export async function insertMembership(db: Executor, teamId: string, userId: string, role: Role): Promise<void> {
  await db.insert(memberships).values({ teamId, userId, role });
}

export async function findRole(db: Executor, teamId: string, userId: string): Promise<Role | undefined> {
  const [row] = await db
    .select({ role: memberships.role })
    .from(memberships)
    .where(and(eq(memberships.teamId, teamId), eq(memberships.userId, userId)))
    .limit(1);
  return row?.role;
}

export function listTeamsOfUser(db: Executor, userId: string) {
  return db
    .select({ id: teams.id, name: teams.name, role: memberships.role })
    .from(memberships)
    .innerJoin(teams, eq(teams.id, memberships.teamId))
    .where(eq(memberships.userId, userId))
    .orderBy(asc(teams.name), asc(teams.createdAt));
}

export function listMembers(db: Executor, teamId: string) {
  return db
    .select({ userId: users.id, email: users.email, name: users.name, role: memberships.role })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.teamId, teamId))
    .orderBy(asc(users.name), asc(users.email));
}

/** Locks the team's membership rows (FOR UPDATE) so concurrent role changes cannot both remove the last owner. */
export async function lockMemberships(db: Executor, teamId: string): Promise<{ userId: string; role: Role }[]> {
  return db
    .select({ userId: memberships.userId, role: memberships.role })
    .from(memberships)
    .where(eq(memberships.teamId, teamId))
    .for('update');
}

export async function updateMembershipRole(db: Executor, teamId: string, userId: string, role: Role): Promise<void> {
  await db
    .update(memberships)
    .set({ role })
    .where(and(eq(memberships.teamId, teamId), eq(memberships.userId, userId)));
}

export async function deleteMembership(db: Executor, teamId: string, userId: string): Promise<void> {
  await db.delete(memberships).where(and(eq(memberships.teamId, teamId), eq(memberships.userId, userId)));
}

export async function isOwnerOfAnyTeam(db: Executor, userId: string): Promise<boolean> {
  const rows = await db
    .select({ one: sql<number>`1` })
    .from(memberships)
    .where(and(eq(memberships.userId, userId), eq(memberships.role, 'owner')))
    .limit(1);
  return rows.length > 0;
}
