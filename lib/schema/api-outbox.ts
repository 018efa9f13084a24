/** Reply of GET /api/dev/outbox: e-mail captured by the development/test mail fake. */
import { z } from 'zod';

export const outboxMessageSchema = z.object({
  id: z.string(),
  to: z.string(),
  subject: z.string(),
  text: z.string(),
  html: z.string().nullish(),
  sentAt: z.string(),
});
export type OutboxMessage = z.infer<typeof outboxMessageSchema>;

export const outboxReplySchema = z.object({ messages: z.array(outboxMessageSchema) });
