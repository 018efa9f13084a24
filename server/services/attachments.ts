/**
 * Photos and documents attached to a coil. Every team member lists and downloads them (through short-lived
 * presigned links); owners and designers upload and delete. Another team's attachment is "not found" (404).
 * The bytes are checked by content, stored under a random key, and images get a small preview object.
 */
import { randomUUID } from 'node:crypto';
import { deleteAttachment, findAttachment, insertAttachment, listAttachments, type AttachmentListRow } from '@/db/queries/attachments';
import { findRole } from '@/db/queries/teams';
import { ATTACHMENT_MAX_BYTES, ATTACHMENT_MAX_LABEL } from '@/lib/schema/api-attachments';
import { AppError, forbidden, notFound } from '@/server/errors';
import { can, coilAccess } from '@/server/services/access';
import type { ServiceDeps } from '@/server/services/context';
import { ACCEPTED_DESCRIPTION, detectFileType } from '@/server/storage/file-kind';
import { sanitizeFileName, withExtensionFor } from '@/server/storage/file-name';
import { LINK_LIFETIME_S, type ObjectStore } from '@/server/storage/object-store';
import { makeThumbnail, THUMBNAIL_CONTENT_TYPE } from '@/server/storage/thumbnail';

export const MAX_ATTACHMENT_BYTES = ATTACHMENT_MAX_BYTES;

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const EDIT_REFUSAL = 'Only owners and designers can add or delete attachments.';

export const fileTooLarge = () =>
  new AppError(413, 'file_too_large', `The file is larger than ${ATTACHMENT_MAX_LABEL}. Attach a smaller file (export the photo at a lower resolution or compress the PDF).`);

export interface UploadedFile {
  originalName: string;
  bytes: Buffer;
}

export interface Link {
  url: string;
  expiresAt: string;
}

export function attachmentService(deps: ServiceDeps, store: ObjectStore) {
  const { db, logger } = deps;
  const now = () => deps.now?.() ?? new Date();

  const linkFor = async (key: string, fileName: string, contentType: string): Promise<Link> => ({
    url: await store.link(key, { fileName, contentType }),
    expiresAt: new Date(now().getTime() + LINK_LIFETIME_S * 1000).toISOString(),
  });

  const previewName = (fileName: string) => `${fileName.replace(/\.[^.]+$/, '')}-preview.webp`;

  async function present(row: AttachmentListRow) {
    return {
      id: row.id,
      coilId: row.coilId,
      fileName: row.fileName,
      contentType: row.contentType,
      kind: row.contentType.startsWith('image/') ? ('image' as const) : ('document' as const),
      sizeBytes: row.sizeBytes,
      hasThumbnail: row.thumbnailKey !== null,
      // Presigning is local computation (no request to the store), so lists carry preview links directly.
      thumbnailUrl: row.thumbnailKey ? await store.link(row.thumbnailKey, { fileName: previewName(row.fileName), contentType: THUMBNAIL_CONTENT_TYPE }) : null,
      uploadedBy: row.uploadedBy ? { id: row.uploadedBy, name: row.uploaderName } : null,
      createdAt: row.createdAt.toISOString(),
    };
  }

  /** The attachment when the caller's team owns its coil (else 404) and the role may do `capability` (else 403). */
  async function attachmentAccess(id: string, userId: string, capability: 'read' | 'edit') {
    if (!UUID.test(id)) throw notFound('The attachment');
    const found = await findAttachment(db, id);
    const role = found && (await findRole(db, found.teamId, userId));
    if (!found || !role) throw notFound('The attachment');
    if (!can(role, capability)) throw forbidden(EDIT_REFUSAL);
    return found.attachment;
  }

  async function thumbnailOf(bytes: Buffer, fileName: string): Promise<Buffer | null> {
    try {
      return await makeThumbnail(bytes);
    } catch (err) {
      // A photo sharp cannot read (an HEIC codec it lacks, a damaged file) is still kept, just without a preview.
      logger.warn({ err, fileName }, 'attachment preview failed');
      return null;
    }
  }

  return {
    async list(userId: string, coilId: string) {
      await coilAccess(db, coilId, userId, 'read');
      return Promise.all((await listAttachments(db, coilId)).map(present));
    },

    /** Refuses early (before the body is read) when the coil is not the caller's or the role may not upload. */
    async assertCanUpload(userId: string, coilId: string) {
      const { role } = await coilAccess(db, coilId, userId, 'read');
      if (!can(role, 'edit')) throw forbidden(EDIT_REFUSAL);
    },

    async upload(userId: string, coilId: string, file: UploadedFile) {
      const { role } = await coilAccess(db, coilId, userId, 'read');
      if (!can(role, 'edit')) throw forbidden(EDIT_REFUSAL);
      if (file.bytes.length === 0) throw new AppError(400, 'empty_file', 'The file is empty. Choose the file again.');
      if (file.bytes.length > MAX_ATTACHMENT_BYTES) throw fileTooLarge();

      const cleanName = sanitizeFileName(file.originalName);
      const detected = await detectFileType(file.bytes, cleanName);
      if (!detected.ok) {
        throw new AppError(
          415,
          'unsupported_type',
          `"${cleanName}" is ${detected.description}, so it was not attached. Attach ${ACCEPTED_DESCRIPTION}.`,
        );
      }
      const { type } = detected;
      const fileName = withExtensionFor(cleanName, type.extensions);
      // Keys are random: never the user's file name, and not derivable from the attachment id.
      const storageId = randomUUID();
      const objectKey = `attachments/${storageId}`;
      const thumbnail = type.thumbnail ? await thumbnailOf(file.bytes, fileName) : null;
      const thumbnailKey = thumbnail ? `previews/${storageId}` : null;

      const keys = thumbnailKey ? [objectKey, thumbnailKey] : [objectKey];
      try {
        await store.put(objectKey, file.bytes, type.contentType);
        if (thumbnail && thumbnailKey) await store.put(thumbnailKey, thumbnail, THUMBNAIL_CONTENT_TYPE);
      } catch (err) {
        logger.error({ err, keys }, 'attachment storage failed');
        await store.remove(keys).catch(() => undefined);
        throw new AppError(503, 'storage_unavailable', 'File storage is not reachable right now, so nothing was attached. Try again in a moment.');
      }
      let id: string;
      try {
        id = (
          await insertAttachment(db, {
            coilId,
            fileName,
            contentType: type.contentType,
            sizeBytes: file.bytes.length,
            objectKey,
            thumbnailKey,
            uploadedBy: userId,
          })
        ).id;
      } catch (err) {
        await store.remove(keys).catch((e: unknown) => logger.warn({ err: e, keys }, 'orphan attachment objects'));
        // 23503: the coil was deleted while the file was uploading.
        if ((err as { code?: string }).code === '23503') throw notFound('The coil');
        throw err;
      }
      const saved = await findAttachment(db, id);
      if (!saved) throw notFound('The attachment');
      return present(saved.attachment);
    },

    async downloadLink(userId: string, id: string): Promise<Link> {
      const a = await attachmentAccess(id, userId, 'read');
      return linkFor(a.objectKey, a.fileName, a.contentType);
    },

    async thumbnailLink(userId: string, id: string): Promise<Link> {
      const a = await attachmentAccess(id, userId, 'read');
      if (!a.thumbnailKey) throw new AppError(404, 'no_thumbnail', `"${a.fileName}" has no preview image.`);
      return linkFor(a.thumbnailKey, previewName(a.fileName), THUMBNAIL_CONTENT_TYPE);
    },

    async remove(userId: string, id: string): Promise<void> {
      await attachmentAccess(id, userId, 'edit');
      const row = await deleteAttachment(db, id);
      if (!row) return;
      const keys = row.thumbnailKey ? [row.objectKey, row.thumbnailKey] : [row.objectKey];
      // The row is gone, so the file is gone for users; a failed object delete only leaves an orphan to log.
      await store.remove(keys).catch((err: unknown) => logger.warn({ err, keys }, 'orphan attachment objects'));
    },
  };
}

export type AttachmentService = ReturnType<typeof attachmentService>;
export type PublicAttachment = Awaited<ReturnType<AttachmentService['list']>>[number];
