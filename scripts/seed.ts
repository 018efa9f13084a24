/** `npm run db:seed`: loads the demo scenario (db/seed.ts) into DATABASE_URL when it has no users yet. */
import { createDatabase } from '@/db/client';
import { DEMO_PASSWORD, DEMO_TEAM, seedDemo } from '@/db/seed';
import { solveCoil } from '@/lib/engine/solve-coil';
import { hashPassword } from '@/server/auth/password';
import { loadConfig } from '@/server/config';
import { createLogger } from '@/server/logger';
import { summarizeCoil } from '@/server/services/coil-summary';

async function main(): Promise<void> {
  const config = loadConfig();
  const logger = createLogger(config.logLevel);
  const database = createDatabase(config.databaseUrl, { max: 1 });
  try {
    const seeded = await seedDemo(database.db, {
      passwordHash: await hashPassword(DEMO_PASSWORD),
      summarize: (document) => summarizeCoil(document, solveCoil, logger),
    });
    console.log(seeded ? `demo team "${DEMO_TEAM}" created` : 'the database already has users: demo seed skipped');
  } finally {
    await database.close();
  }
}

main().catch((err: unknown) => {
  console.error('seed failed:', err instanceof Error ? err.message : err);
  process.exit(1);
});
