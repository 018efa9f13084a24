/** Applies the committed migrations in drizzle/ (programmatic migrator, so drizzle-kit is not needed at run time). */
import path from 'node:path';
import { migrate } from 'drizzle-orm/node-postgres/migrator';
import type { Database } from '@/db/client';

export const MIGRATIONS_FOLDER = path.resolve(__dirname, '..', 'drizzle');

export async function migrateDatabase(db: Database): Promise<void> {
  await migrate(db, { migrationsFolder: MIGRATIONS_FOLDER });
}
