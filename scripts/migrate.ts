/** `npm run db:migrate`: applies drizzle/ migrations to DATABASE_URL. */
import { createDatabase } from '@/db/client';
import { migrateDatabase } from '@/db/migrate';
import { loadConfig } from '@/server/config';

async function main(): Promise<void> {
  const config = loadConfig();
  const database = createDatabase(config.databaseUrl, { max: 1 });
  try {
    await migrateDatabase(database.db);
    console.log('migrations applied');
  } finally {
    await database.close();
  }
}

main().catch((err: unknown) => {
  console.error('migration failed:', err instanceof Error ? err.message : err);
  process.exit(1);
});
