/**
 * `npm run db:seed`: loads the demo scenario (db/seed.ts) into DATABASE_URL when it has no users yet, then brings the
 * stored coil summaries up to date with the current solver (they are derived data; the designs are not touched).
 */
import { isDeepStrictEqual } from 'node:util';
import { createDatabase } from '@/db/client';
import { listAllCoilSummaries, setCoilSummary } from '@/db/queries/coils';
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
    const summarize = (document: Parameters<typeof solveCoil>[0]) => summarizeCoil(document, solveCoil, logger);
    const seeded = await seedDemo(database.db, { passwordHash: await hashPassword(DEMO_PASSWORD), summarize });
    console.log(seeded ? `demo team "${DEMO_TEAM}" created` : 'the database already has users: demo seed skipped');
    let refreshed = 0;
    for (const coil of await listAllCoilSummaries(database.db)) {
      const summary = summarize(coil.document);
      if (!isDeepStrictEqual(summary, coil.summary)) {
        await setCoilSummary(database.db, coil.id, summary);
        refreshed += 1;
      }
    }
    if (refreshed > 0) console.log(`coil summaries refreshed with the current solver: ${refreshed}`);
  } finally {
    await database.close();
  }
}

main().catch((err: unknown) => {
  console.error('seed failed:', err instanceof Error ? err.message : err);
  process.exit(1);
});
