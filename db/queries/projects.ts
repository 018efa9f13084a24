import { and, asc, desc, eq, ilike, or, sql } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import type { Executor } from '@/db/client';
import { projects, users, type ProjectRow } from '@/db/schema';

export type ProjectSort = 'name' | 'updatedAt' | 'client';

// Written out with table names: inside a sub-select drizzle would render bare column names ("id" = coils.id).
const coilCount = sql<number>`(select count(*)::int from "coils" where "coils"."project_id" = "projects"."id")`;
const creator = alias(users, 'creator');
const updater = alias(users, 'updater');
const withCount = { project: projects, coilCount, createdByName: creator.name, updatedByName: updater.name };

function escapeLike(text: string): string {
  return text.replace(/[\\%_]/g, (c) => `\\${c}`);
}

export async function listProjects(
  db: Executor,
  teamId: string,
  options: { q?: string; sort: ProjectSort; dir: 'asc' | 'desc' },
) {
  const order = options.dir === 'asc' ? asc : desc;
  const column = { name: projects.name, updatedAt: projects.updatedAt, client: projects.client }[options.sort];
  const q = options.q?.trim();
  const pattern = q ? `%${escapeLike(q)}%` : undefined;
  return db
    .select(withCount)
    .from(projects)
    .leftJoin(creator, eq(creator.id, projects.createdBy))
    .leftJoin(updater, eq(updater.id, projects.updatedBy))
    .where(
      and(
        eq(projects.teamId, teamId),
        pattern ? or(ilike(projects.name, pattern), ilike(projects.client, pattern), ilike(projects.site, pattern)) : undefined,
      ),
    )
    .orderBy(order(column), asc(projects.name), asc(projects.id));
}

export async function findProject(db: Executor, id: string) {
  const [row] = await db
    .select(withCount)
    .from(projects)
    .leftJoin(creator, eq(creator.id, projects.createdBy))
    .leftJoin(updater, eq(updater.id, projects.updatedBy))
    .where(eq(projects.id, id))
    .limit(1);
  return row;
}

export async function insertProject(db: Executor, values: typeof projects.$inferInsert): Promise<ProjectRow> {
  const [row] = await db.insert(projects).values(values).returning();
  return row;
}

export async function updateProject(
  db: Executor,
  id: string,
  patch: Partial<Pick<ProjectRow, 'name' | 'client' | 'site' | 'notes'>> & { updatedBy: string },
): Promise<void> {
  await db
    .update(projects)
    .set({ ...patch, updatedAt: new Date() })
    .where(eq(projects.id, id));
}

export async function deleteProject(db: Executor, id: string): Promise<void> {
  await db.delete(projects).where(eq(projects.id, id));
}

/** Marks the project as changed when one of its coils changes, so "recently updated" sorting is honest. */
export async function touchProject(db: Executor, id: string, userId: string): Promise<void> {
  await db.update(projects).set({ updatedAt: new Date(), updatedBy: userId }).where(eq(projects.id, id));
}
