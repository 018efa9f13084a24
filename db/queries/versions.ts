/** Coil versions: numbered immutable snapshots, listed newest first with their latest decision. */
import { desc, eq, inArray, sql } from 'drizzle-orm';
import type { Executor } from '@/db/client';
import { coilVersions, coils, projects, users, versionDecisions, type CoilVersionRow } from '@/db/schema';
import type { CoilDocument } from '@/lib/engine/types';
import type { VersionSummary } from '@/lib/schema/api-versions';

/** Locks the coil row for the rest of the transaction and reads its draft: version numbering queues behind it. */
export async function lockCoilDraft(db: Executor, coilId: string) {
  const [row] = await db
    .select({ document: coils.document, revision: coils.revision })
    .from(coils)
    .where(eq(coils.id, coilId))
    .for('update');
  return row;
}

export async function nextVersionNumber(db: Executor, coilId: string): Promise<number> {
  const [row] = await db
    .select({ next: sql<number>`coalesce(max(${coilVersions.number}), 0)::int + 1` })
    .from(coilVersions)
    .where(eq(coilVersions.coilId, coilId));
  return row.next;
}

export async function insertVersion(
  db: Executor,
  values: {
    coilId: string;
    number: number;
    message: string;
    document: CoilDocument;
    draftRevision: number;
    summary: VersionSummary;
    authorId: string;
  },
): Promise<CoilVersionRow> {
  const [row] = await db.insert(coilVersions).values(values).returning();
  return row;
}

const listColumns = {
  id: coilVersions.id,
  coilId: coilVersions.coilId,
  number: coilVersions.number,
  message: coilVersions.message,
  draftRevision: coilVersions.draftRevision,
  summary: coilVersions.summary,
  createdAt: coilVersions.createdAt,
  authorId: coilVersions.authorId,
  authorName: users.name,
};

export function listVersions(db: Executor, coilId: string) {
  return db
    .select(listColumns)
    .from(coilVersions)
    .leftJoin(users, eq(users.id, coilVersions.authorId))
    .where(eq(coilVersions.coilId, coilId))
    .orderBy(desc(coilVersions.number));
}

/** A version with its coil's name and team, for access checks. */
export async function findVersion(db: Executor, versionId: string) {
  const [row] = await db
    .select({
      ...listColumns,
      document: coilVersions.document,
      coilName: coils.name,
      projectId: coils.projectId,
      coilCreatedBy: coils.createdBy,
      coilUpdatedBy: coils.updatedBy,
      teamId: projects.teamId,
    })
    .from(coilVersions)
    .innerJoin(coils, eq(coils.id, coilVersions.coilId))
    .innerJoin(projects, eq(projects.id, coils.projectId))
    .leftJoin(users, eq(users.id, coilVersions.authorId))
    .where(eq(coilVersions.id, versionId))
    .limit(1);
  return row;
}
export async function findVersionTeam(db: Executor, versionId: string): Promise<string | undefined> {
  const [row] = await db
    .select({ teamId: projects.teamId })
    .from(coilVersions)
    .innerJoin(coils, eq(coils.id, coilVersions.coilId))
    .innerJoin(projects, eq(projects.id, coils.projectId))
    .where(eq(coilVersions.id, versionId))
    .limit(1);
  return row?.teamId;
}

export type FoundVersion = NonNullable<Awaited<ReturnType<typeof findVersion>>>;

/** Makes a version's document the coil's draft again as a new revision (the old draft stays in history via versions). */
export async function restoreDraft(
  db: Executor,
  coilId: string,
  values: { document: CoilDocument; summary: typeof coils.$inferInsert.summary; updatedBy: string },
): Promise<{ revision: number; updatedAt: Date } | undefined> {
  const [row] = await db
    .update(coils)
    .set({ ...values, revision: sql`${coils.revision} + 1`, updatedAt: new Date() })
    .where(eq(coils.id, coilId))
    .returning({ revision: coils.revision, updatedAt: coils.updatedAt });
  return row;
}

/** The newest decision of each of the given versions. */
export async function latestDecisions(db: Executor, versionIds: string[]) {
  if (versionIds.length === 0) return [];
  return db
    .selectDistinctOn([versionDecisions.versionId], {
      id: versionDecisions.id,
      versionId: versionDecisions.versionId,
      status: versionDecisions.status,
      note: versionDecisions.note,
      createdAt: versionDecisions.createdAt,
      decidedById: versionDecisions.decidedBy,
      decidedByName: users.name,
    })
    .from(versionDecisions)
    .leftJoin(users, eq(users.id, versionDecisions.decidedBy))
    .where(inArray(versionDecisions.versionId, versionIds))
    .orderBy(versionDecisions.versionId, desc(versionDecisions.createdAt), desc(versionDecisions.id));
}
export type DecisionListRow = Awaited<ReturnType<typeof latestDecisions>>[number];

export async function insertDecision(
  db: Executor,
  values: { versionId: string; status: 'approved' | 'changes-requested'; note: string; decidedBy: string },
) {
  const [row] = await db.insert(versionDecisions).values(values).returning();
  return row;
}

/** The newest decision recorded on any version of each coil (with that version's number), for the coil list. */
export function latestDecisionPerCoil(db: Executor, coilIds: string[]) {
  if (coilIds.length === 0) return Promise.resolve([]);
  return db
    .selectDistinctOn([coilVersions.coilId], {
      coilId: coilVersions.coilId,
      versionId: coilVersions.id,
      versionNumber: coilVersions.number,
      status: versionDecisions.status,
      createdAt: versionDecisions.createdAt,
    })
    .from(versionDecisions)
    .innerJoin(coilVersions, eq(coilVersions.id, versionDecisions.versionId))
    .where(inArray(coilVersions.coilId, coilIds))
    .orderBy(coilVersions.coilId, desc(versionDecisions.createdAt), desc(versionDecisions.id));
}
