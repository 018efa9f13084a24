/** Review links: found by token hash, alive while neither revoked nor expired. */
import { and, desc, eq, gt, isNull, or, sql } from 'drizzle-orm';
import type { Executor } from '@/db/client';
import { coilVersions, coils, projects, shareLinks, users, type ShareLinkRow } from '@/db/schema';

export async function insertShareLink(
  db: Executor,
  values: { versionId: string; tokenHash: string; allowComments: boolean; expiresAt: Date | null; createdBy: string },
): Promise<ShareLinkRow> {
  const [row] = await db.insert(shareLinks).values(values).returning();
  return row;
}

const listColumns = {
  link: shareLinks,
  versionNumber: coilVersions.number,
  createdByName: users.name,
};

export function listShareLinksOfCoil(db: Executor, coilId: string) {
  return db
    .select(listColumns)
    .from(shareLinks)
    .innerJoin(coilVersions, eq(coilVersions.id, shareLinks.versionId))
    .leftJoin(users, eq(users.id, shareLinks.createdBy))
    .where(eq(coilVersions.coilId, coilId))
    .orderBy(desc(shareLinks.createdAt));
}
export type ShareLinkListRow = Awaited<ReturnType<typeof listShareLinksOfCoil>>[number];

export async function findShareLink(db: Executor, id: string) {
  const [row] = await db
    .select({ ...listColumns, coilId: coilVersions.coilId, teamId: projects.teamId })
    .from(shareLinks)
    .innerJoin(coilVersions, eq(coilVersions.id, shareLinks.versionId))
    .innerJoin(coils, eq(coils.id, coilVersions.coilId))
    .innerJoin(projects, eq(projects.id, coils.projectId))
    .leftJoin(users, eq(users.id, shareLinks.createdBy))
    .where(eq(shareLinks.id, id))
    .limit(1);
  return row;
}

export async function revokeShareLink(db: Executor, id: string, now: Date): Promise<void> {
  await db
    .update(shareLinks)
    .set({ revokedAt: now })
    .where(and(eq(shareLinks.id, id), isNull(shareLinks.revokedAt)));
}

const alive = (tokenHash: string, now: Date) =>
  and(eq(shareLinks.tokenHash, tokenHash), isNull(shareLinks.revokedAt), or(isNull(shareLinks.expiresAt), gt(shareLinks.expiresAt, now)));

/** A live link (not revoked, not expired). */
export async function findLiveShareLink(db: Executor, tokenHash: string, now: Date): Promise<ShareLinkRow | undefined> {
  const [row] = await db.select().from(shareLinks).where(alive(tokenHash, now)).limit(1);
  return row;
}

/** Records one opening of a live link in one statement (so concurrent opens all count); undefined when dead. */
export async function recordShareLinkOpen(db: Executor, tokenHash: string, now: Date): Promise<ShareLinkRow | undefined> {
  const [row] = await db
    .update(shareLinks)
    .set({
      openCount: sql`${shareLinks.openCount} + 1`,
      lastOpenedAt: now,
      firstOpenedAt: sql`coalesce(${shareLinks.firstOpenedAt}, ${now.toISOString()}::timestamptz)`,
    })
    .where(alive(tokenHash, now))
    .returning();
  return row;
}
