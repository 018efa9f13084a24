import { boolean, index, integer, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { coilVersions } from './coil-versions';
import { users } from './users';

/**
 * A review link to one version. The token is shown once; only its SHA-256 is kept. A link is dead once revoked or
 * past `expiresAt` (null = no expiry).
 */
export const shareLinks = pgTable(
  'share_links',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    versionId: uuid('version_id')
      .notNull()
      .references(() => coilVersions.id, { onDelete: 'cascade' }),
    tokenHash: text('token_hash').notNull().unique(),
    allowComments: boolean('allow_comments').notNull(),
    expiresAt: timestamp('expires_at', { withTimezone: true }),
    revokedAt: timestamp('revoked_at', { withTimezone: true }),
    createdBy: text('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    firstOpenedAt: timestamp('first_opened_at', { withTimezone: true }),
    lastOpenedAt: timestamp('last_opened_at', { withTimezone: true }),
    openCount: integer('open_count').notNull().default(0),
  },
  (t) => [index('share_links_version_id_idx').on(t.versionId)],
);

export type ShareLinkRow = typeof shareLinks.$inferSelect;
