import { pgEnum, pgTable, text, timestamp } from 'drizzle-orm/pg-core';

export const unitSystemEnum = pgEnum('unit_system', ['si', 'ip']);

/** A person who signs in. `id` is text because the session library keys users by string. */
export const users = pgTable('users', {
  id: text('id').primaryKey(),
  /** Stored lower-cased and trimmed; unique. */
  email: text('email').notNull().unique(),
  name: text('name').notNull(),
  passwordHash: text('password_hash').notNull(),
  unitSystem: unitSystemEnum('unit_system').notNull().default('si'),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
});

export type UserRow = typeof users.$inferSelect;
