/** The signed-in user: who they are, their teams, and their own settings (DEVELOPERS.md: /api/me). */
import { api } from '@/lib/api/client';
import { meReplySchema, userReplySchema, type MeReply, type UpdateMeBody, type User } from '@/lib/schema/api-auth';

/** react-query key of GET /api/me; every screen that needs the user shares it. */
export const ME_QUERY_KEY = ['me'] as const;

export function getMe(): Promise<MeReply> {
  return api.get('/api/me', meReplySchema);
}

export async function updateMe(body: UpdateMeBody): Promise<User> {
  const reply = await api.patch('/api/me', body, userReplySchema);
  return reply.user;
}
