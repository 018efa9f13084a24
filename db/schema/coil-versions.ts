import { integer, jsonb, pgTable, text, timestamp, unique, uuid } from 'drizzle-orm/pg-core';
import type { CoilDocument } from '@/lib/engine/types';
import type { VersionSummary } from '@/lib/schema/api-versions';
import { coils } from './coils';
import { users } from './users';

/**
 * An immutable snapshot of a coil's draft document. `number` counts 1, 2, 3... per coil; the unique key is the
 * backstop, the coil row lock taken while numbering is what keeps concurrent saves from colliding.
 */
export const coilVersions = pgTable(
  'coil_versions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    coilId: uuid('coil_id')
      .notNull()
      .references(() => coils.id, { onDelete: 'cascade' }),
    number: integer('number').notNull(),
    message: text('message').notNull(),
    document: jsonb('document').$type<CoilDocument>().notNull(),
    /** The coil's draft revision the snapshot was taken from. */
    draftRevision: integer('draft_revision').notNull(),
    summary: jsonb('summary').$type<VersionSummary>().notNull(),
    authorId: text('author_id').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  // The unique key's index also serves lookups by coil.
  (t) => [unique('coil_versions_coil_number_unique').on(t.coilId, t.number)],
);

export type CoilVersionRow = typeof coilVersions.$inferSelect;
