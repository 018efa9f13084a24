import { boolean, pgTable, text, timestamp } from 'drizzle-orm/pg-core';
import { users } from './users';

/** Which e-mail notifications a user wants. No row = every kind on. */
export const notificationSettings = pgTable('notification_settings', {
  userId: text('user_id')
    .primaryKey()
    .references(() => users.id, { onDelete: 'cascade' }),
  reviewRequested: boolean('review_requested').notNull().default(true),
  newComment: boolean('new_comment').notNull().default(true),
  decision: boolean('decision').notNull().default(true),
  updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
});

export type NotificationSettingsRow = typeof notificationSettings.$inferSelect;
