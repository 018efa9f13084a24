import { type AnyPgColumn, index, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import type { CommentPin } from '@/lib/schema/api-versions';
import { coilVersions } from './coil-versions';
import { shareLinks } from './share-links';
import { users } from './users';

/**
 * A comment on a version, by a team member (`authorId`) or by a guest through a review link (`guestName` +
 * `shareLinkId`). Replies name the thread's first comment in `parentId`; only a thread is resolved.
 */
export const versionComments = pgTable(
  'version_comments',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    versionId: uuid('version_id')
      .notNull()
      .references(() => coilVersions.id, { onDelete: 'cascade' }),
    parentId: uuid('parent_id').references((): AnyPgColumn => versionComments.id, { onDelete: 'cascade' }),
    authorId: text('author_id').references(() => users.id, { onDelete: 'set null' }),
    guestName: text('guest_name'),
    shareLinkId: uuid('share_link_id').references(() => shareLinks.id, { onDelete: 'set null' }),
    body: text('body').notNull(),
    /** Where the comment points on the drawing; null = a general comment. */
    pin: jsonb('pin').$type<CommentPin>(),
    resolvedAt: timestamp('resolved_at', { withTimezone: true }),
    resolvedBy: text('resolved_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('version_comments_version_id_idx').on(t.versionId)],
);

export type VersionCommentRow = typeof versionComments.$inferSelect;
