import { and, asc, eq, sql } from 'drizzle-orm';
import type { Executor } from '@/db/client';
import { coils, projects, type CoilRow, type CoilSummary } from '@/db/schema';
import type { CoilDocument } from '@/lib/engine/types';

/** Coil list columns: everything but the (large) document. */
const listColumns = {
  id: coils.id,
  projectId: coils.projectId,
  name: coils.name,
  revision: coils.revision,
  summary: coils.summary,
  rows: sql<number>`(${coils.document} -> 'geometry' ->> 'rows')::int`,
  tubesPerRow: sql<number>`(${coils.document} -> 'geometry' ->> 'tubesPerRow')::int`,
  createdAt: coils.createdAt,
  updatedAt: coils.updatedAt,
};

export function listCoils(db: Executor, projectId: string) {
  return db.select(listColumns).from(coils).where(eq(coils.projectId, projectId)).orderBy(asc(coils.name), asc(coils.createdAt));
}

/** A coil with its project's team, for access checks. */
export async function findCoil(db: Executor, id: string): Promise<{ coil: CoilRow; teamId: string } | undefined> {
  const [row] = await db
    .select({ coil: coils, teamId: projects.teamId })
    .from(coils)
    .innerJoin(projects, eq(projects.id, coils.projectId))
    .where(eq(coils.id, id))
    .limit(1);
  return row;
}

export async function findCoilTeam(db: Executor, id: string) {
  const [row] = await db
    .select({ teamId: projects.teamId, projectId: coils.projectId, revision: coils.revision })
    .from(coils)
    .innerJoin(projects, eq(projects.id, coils.projectId))
    .where(eq(coils.id, id))
    .limit(1);
  return row;
}

export async function insertCoil(db: Executor, values: typeof coils.$inferInsert): Promise<CoilRow> {
  const [row] = await db.insert(coils).values(values).returning();
  return row;
}

/**
 * Saves a draft only if nobody saved since `revision` (compare-and-set in one statement, so concurrent saves
 * cannot both win). Undefined = stale.
 */
export async function saveCoilDraft(
  db: Executor,
  id: string,
  expectedRevision: number,
  values: { document: CoilDocument; summary: CoilSummary | null; updatedBy: string },
): Promise<{ revision: number; updatedAt: Date } | undefined> {
  const [row] = await db
    .update(coils)
    .set({ ...values, revision: sql`${coils.revision} + 1`, updatedAt: new Date() })
    .where(and(eq(coils.id, id), eq(coils.revision, expectedRevision)))
    .returning({ revision: coils.revision, updatedAt: coils.updatedAt });
  return row;
}

export async function renameCoil(db: Executor, id: string, name: string, userId: string): Promise<CoilRow | undefined> {
  const [row] = await db
    .update(coils)
    .set({ name, updatedBy: userId, updatedAt: new Date() })
    .where(eq(coils.id, id))
    .returning();
  return row;
}

export async function deleteCoil(db: Executor, id: string): Promise<void> {
  await db.delete(coils).where(eq(coils.id, id));
}

/** Every coil's id, document and stored summary (for refreshing derived summaries after a solver change). */
export function listAllCoilSummaries(db: Executor) {
  return db.select({ id: coils.id, document: coils.document, summary: coils.summary }).from(coils);
}

/** Replaces the derived summary only; revision and updatedAt stay (the design did not change). */
export async function setCoilSummary(db: Executor, id: string, summary: CoilSummary | null): Promise<void> {
  await db.update(coils).set({ summary }).where(eq(coils.id, id));
}
