/**
 * Contracts of the coil attachment endpoints (DEVELOPERS.md, HTTP API): photos and documents on a coil, listed for
 * every team member, fetched through short-lived presigned links. The size limit lives here so the app can say
 * "too large" before sending 20 MB over a phone connection.
 */
import { z } from 'zod';

/** Largest accepted file: 20 MB (binary megabytes, as upload limits are usually counted). */
export const ATTACHMENT_MAX_BYTES = 20 * 1024 * 1024;
export const ATTACHMENT_MAX_LABEL = '20 MB';

/** What the picker offers; the server decides by content, so this is only a hint to the file dialog. */
export const ATTACHMENT_PICKER_TYPES = ['image/jpeg', 'image/png', 'image/webp', 'image/heic', 'image/heif', 'application/pdf', 'text/plain', 'text/csv'];

export const attachmentSchema = z.object({
  id: z.string(),
  coilId: z.string(),
  /** Sanitised display name. */
  fileName: z.string(),
  /** Detected from the content by the server. */
  contentType: z.string(),
  kind: z.enum(['image', 'document']),
  sizeBytes: z.number().int().nonnegative(),
  hasThumbnail: z.boolean(),
  /** Presigned preview link (about 320 px), valid for a few minutes; null when there is no preview. */
  thumbnailUrl: z.string().nullable(),
  uploadedBy: z.object({ id: z.string(), name: z.string().nullable() }).nullable(),
  createdAt: z.string(),
});
export type Attachment = z.infer<typeof attachmentSchema>;

/** GET /api/coils/:coilId/attachments (oldest first). */
export const attachmentListReplySchema = z.object({ attachments: z.array(attachmentSchema) });
/** POST /api/coils/:coilId/attachments (multipart, field "file") -> 201. */
export const attachmentReplySchema = z.object({ attachment: attachmentSchema });
/** GET /api/attachments/:id/download and /thumbnail: a presigned GET link and when it stops working. */
export const attachmentLinkReplySchema = z.object({ url: z.string(), expiresAt: z.string() });
export type AttachmentLink = z.infer<typeof attachmentLinkReplySchema>;
