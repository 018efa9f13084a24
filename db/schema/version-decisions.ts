import { index, pgEnum, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { coilVersions } from './coil-versions';
import { users } from './users';

// Same list as lib/schema/api-versions.ts (a value import from there would not load in drizzle-kit, which has no @/ alias).
export const DECISION_STATUSES = ['approved', 'changes-requested'] as const;
export const decisionStatusEnum = pgEnum('decision_status', DECISION_STATUSES);

/** A reviewer's or owner's verdict on a version. Kept as a history; the newest one is the version's state. */
export const versionDecisions = pgTable(
  'version_decisions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    versionId: uuid('version_id')
      .notNull()
      .references(() => coilVersions.id, { onDelete: 'cascade' }),
    status: decisionStatusEnum('status').notNull(),
    note: text('note').notNull().default(''),
    decidedBy: text('decided_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('version_decisions_version_id_idx').on(t.versionId, t.createdAt)],
);

export type VersionDecisionRow = typeof versionDecisions.$inferSelect;
