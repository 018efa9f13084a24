import { index, integer, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import type { CoilDocument } from '@/lib/engine/types';
import { projects } from './projects';
import { users } from './users';

/** The headline numbers of the last solve of a coil's current document, for lists. Null fields = not known. */
export interface CoilSummary {
  rows: number;
  tubesPerRow: number;
  circuitCount: number | null;
  capacity_W: number | null;
  waterPressureDrop_Pa: number | null;
  warningCount: number | null;
  valid: boolean | null;
}

export const coils = pgTable(
  'coils',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    projectId: uuid('project_id')
      .notNull()
      .references(() => projects.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    document: jsonb('document').$type<CoilDocument>().notNull(),
    /** Bumped by every draft save; a save must name the revision it started from. */
    revision: integer('revision').notNull().default(1),
    summary: jsonb('summary').$type<CoilSummary>(),
    createdBy: text('created_by').references(() => users.id, { onDelete: 'set null' }),
    updatedBy: text('updated_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('coils_project_id_idx').on(t.projectId)],
);

export type CoilRow = typeof coils.$inferSelect;
