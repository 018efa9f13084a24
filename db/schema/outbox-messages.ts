import { index, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';

/** E-mail captured by the in-process SMTP fake (development and tests), shown on the outbox page. */
export const outboxMessages = pgTable(
  'outbox_messages',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    from: text('from').notNull(),
    to: text('to').notNull(),
    subject: text('subject').notNull(),
    text: text('text').notNull(),
    html: text('html'),
    sentAt: timestamp('sent_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('outbox_messages_sent_at_idx').on(t.sentAt)],
);

export type OutboxMessageRow = typeof outboxMessages.$inferSelect;
