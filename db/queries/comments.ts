/** Comments on versions, by members and by guests of a review link. */
import { asc, eq } from 'drizzle-orm';
import type { Executor } from '@/db/client';
import { users, versionComments, type VersionCommentRow } from '@/db/schema';
import type { CommentPin } from '@/lib/schema/api-versions';

export async function insertComment(
  db: Executor,
  values: {
    versionId: string;
    parentId: string | null;
    authorId: string | null;
    guestName: string | null;
    shareLinkId: string | null;
    body: string;
    pin: CommentPin | null;
  },
): Promise<VersionCommentRow> {
  const [row] = await db.insert(versionComments).values(values).returning();
  return row;
}

const columns = { comment: versionComments, authorName: users.name };

export function listComments(db: Executor, versionId: string) {
  return db
    .select(columns)
    .from(versionComments)
    .leftJoin(users, eq(users.id, versionComments.authorId))
    .where(eq(versionComments.versionId, versionId))
    .orderBy(asc(versionComments.createdAt), asc(versionComments.id));
}
export type CommentListRow = Awaited<ReturnType<typeof listComments>>[number];

export async function findComment(db: Executor, id: string): Promise<CommentListRow | undefined> {
  const [row] = await db
    .select(columns)
    .from(versionComments)
    .leftJoin(users, eq(users.id, versionComments.authorId))
    .where(eq(versionComments.id, id))
    .limit(1);
  return row;
}

export async function setCommentResolved(db: Executor, id: string, resolved: boolean, userId: string, now: Date): Promise<void> {
  await db
    .update(versionComments)
    .set(resolved ? { resolvedAt: now, resolvedBy: userId } : { resolvedAt: null, resolvedBy: null })
    .where(eq(versionComments.id, id));
}
