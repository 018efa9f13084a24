import { index, integer, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { coils } from './coils';
import { users } from './users';

/**
 * A photo or document attached to a coil. The bytes live in object storage under `objectKey` (a random id, never
 * the file name); images also get a small preview under `thumbnailKey`. Deleting the coil deletes these rows.
 */
export const attachments = pgTable(
  'attachments',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    coilId: uuid('coil_id')
      .notNull()
      .references(() => coils.id, { onDelete: 'cascade' }),
    /** Sanitised display name (no folders, no control characters). */
    fileName: text('file_name').notNull(),
    /** MIME type detected from the content (magic numbers), not the one the client claimed. */
    contentType: text('content_type').notNull(),
    sizeBytes: integer('size_bytes').notNull(),
    objectKey: text('object_key').notNull().unique(),
    thumbnailKey: text('thumbnail_key'),
    uploadedBy: text('uploaded_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('attachments_coil_id_idx').on(t.coilId)],
);

export type AttachmentRow = typeof attachments.$inferSelect;
