/** Captured e-mail of the development/test mail fake (GET /api/dev/outbox). */
import { api } from '@/lib/api/client';
import { outboxReplySchema, type OutboxMessage } from '@/lib/schema/api-outbox';

export async function listOutbox(): Promise<OutboxMessage[]> {
  return (await api.get('/api/dev/outbox', outboxReplySchema)).messages;
}
