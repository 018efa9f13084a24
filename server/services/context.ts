import type { Database } from '@/db/client';
import type { SessionAuth } from '@/server/auth/sessions';
import type { Config } from '@/server/config';
import type { Logger } from '@/server/logger';
import type { Mailer } from '@/server/mail/mailer';
import type { CoilDocument, SolveResult } from '@/lib/engine/types';

/** The solver; `turndown: false` skips the part-load solves (the editor's quick answer while drawing). */
export type SolveFn = (document: CoilDocument, settings?: { turndown?: boolean }) => SolveResult;

/** What every use case may touch. No req/res: the routes translate HTTP into these calls. */
export interface ServiceDeps {
  config: Config;
  db: Database;
  mailer: Mailer;
  logger: Logger;
  auth: SessionAuth;
  /** The authoritative solver (lib/engine/solve-coil.ts unless a test passes another). */
  solve: SolveFn;
  /** Injectable clock for expiry tests. */
  now?: () => Date;
}
