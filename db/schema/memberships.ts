import { index, pgEnum, pgTable, primaryKey, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { teams } from './teams';
import { users } from './users';

export const ROLES = ['owner', 'designer', 'reviewer', 'viewer'] as const;
export type Role = (typeof ROLES)[number];
export const roleEnum = pgEnum('team_role', ROLES);

/** Who belongs to which team, with which role (DEVELOPERS.md, Roles). */
export const memberships = pgTable(
  'memberships',
  {
    teamId: uuid('team_id')
      .notNull()
      .references(() => teams.id, { onDelete: 'cascade' }),
    userId: text('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    role: roleEnum('role').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.teamId, t.userId] }), index('memberships_user_id_idx').on(t.userId)],
);

export type MembershipRow = typeof memberships.$inferSelect;
