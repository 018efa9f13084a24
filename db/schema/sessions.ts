import { index, pgTable, text, timestamp } from 'drizzle-orm/pg-core';
import { users } from './users';

/** Sign-in sessions (the shape the session library's Drizzle adapter expects). */
export const sessions = pgTable(
  'sessions',
  {
    id: text('id').primaryKey(),
    userId: text('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    expiresAt: timestamp('expires_at', { withTimezone: true, mode: 'date' }).notNull(),
  },
  (t) => [index('sessions_user_id_idx').on(t.userId)],
);
