/** One pg pool and the Drizzle database bound to it. The caller owns the pool and must end it on shutdown. */
import { drizzle, type NodePgDatabase } from 'drizzle-orm/node-postgres';
import { Pool } from 'pg';
import * as schema from '@/db/schema';

export type Database = NodePgDatabase<typeof schema>;
/** A database or an open transaction: queries accept either. */
export type Executor = Database | Parameters<Parameters<Database['transaction']>[0]>[0];

export interface DatabaseHandle {
  db: Database;
  pool: Pool;
  close(): Promise<void>;
}

export function createDatabase(connectionString: string, options: { max?: number } = {}): DatabaseHandle {
  const pool = new Pool({ connectionString, max: options.max ?? 10 });
  const db = drizzle(pool, { schema });
  let closed = false;
  return {
    db,
    pool,
    async close() {
      if (closed) return;
      closed = true;
      await pool.end();
    },
  };
}
