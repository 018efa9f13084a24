import { asc, eq } from 'drizzle-orm';
import type { Executor } from '@/db/client';
import { attachments, coils, projects, users, type AttachmentRow } from '@/db/schema';

/** Attachment columns plus the uploader's name, for lists. */
const listColumns = {
  id: attachments.id,
  coilId: attachments.coilId,
  fileName: attachments.fileName,
  contentType: attachments.contentType,
  sizeBytes: attachments.sizeBytes,
  objectKey: attachments.objectKey,
  thumbnailKey: attachments.thumbnailKey,
  uploadedBy: attachments.uploadedBy,
  uploaderName: users.name,
  createdAt: attachments.createdAt,
};

export type AttachmentListRow = AttachmentRow & { uploaderName: string | null };

export function listAttachments(db: Executor, coilId: string): Promise<AttachmentListRow[]> {
  return db
    .select(listColumns)
    .from(attachments)
    .leftJoin(users, eq(users.id, attachments.uploadedBy))
    .where(eq(attachments.coilId, coilId))
    .orderBy(asc(attachments.createdAt), asc(attachments.id));
}

/** One attachment with its uploader's name and the team that owns its coil, for access checks. */
export async function findAttachment(db: Executor, id: string): Promise<{ attachment: AttachmentListRow; teamId: string } | undefined> {
  const [row] = await db
    .select({ attachment: listColumns, teamId: projects.teamId })
    .from(attachments)
    .innerJoin(coils, eq(coils.id, attachments.coilId))
    .innerJoin(projects, eq(projects.id, coils.projectId))
    .leftJoin(users, eq(users.id, attachments.uploadedBy))
    .where(eq(attachments.id, id))
    .limit(1);
  return row;
}

export async function insertAttachment(db: Executor, values: typeof attachments.$inferInsert): Promise<AttachmentRow> {
  const [row] = await db.insert(attachments).values(values).returning();
  return row;
}

/** Deletes the row; returns it (for its object keys) or undefined when it was already gone. */
export async function deleteAttachment(db: Executor, id: string): Promise<AttachmentRow | undefined> {
  const [row] = await db.delete(attachments).where(eq(attachments.id, id)).returning();
  return row;
}
