import { desc } from 'drizzle-orm';
import type { Executor } from '@/db/client';
import { outboxMessages } from '@/db/schema';

export interface NewOutboxMessage {
  from: string;
  to: string;
  subject: string;
  text: string;
  html: string | null;
}

export async function insertOutboxMessage(db: Executor, message: NewOutboxMessage): Promise<void> {
  await db.insert(outboxMessages).values(message);
}

export function listOutboxMessages(db: Executor, limit = 100) {
  return db.select().from(outboxMessages).orderBy(desc(outboxMessages.sentAt)).limit(limit);
}
