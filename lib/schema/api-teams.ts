/** Request and reply contracts of the team, member and invitation endpoints (DEVELOPERS.md, HTTP API). */
import { z } from 'zod';
import { emailSchema, roleSchema } from '@/lib/schema/api-auth';

export const teamNameSchema = z.string().trim().min(1, 'Give the team a name.').max(80, 'Keep the name under 80 characters.');

export const createTeamBodySchema = z.object({ name: teamNameSchema });
export type CreateTeamBody = z.infer<typeof createTeamBodySchema>;

export const inviteBodySchema = z.object({ email: emailSchema, role: roleSchema });
export type InviteBody = z.infer<typeof inviteBodySchema>;

export const changeRoleBodySchema = z.object({ role: roleSchema });
export type ChangeRoleBody = z.infer<typeof changeRoleBodySchema>;

export const teamSchema = z.object({ id: z.string(), name: z.string() });
export const teamReplySchema = z.object({ team: teamSchema });

export const memberSchema = z.object({ userId: z.string(), email: z.string(), name: z.string(), role: roleSchema });
export type Member = z.infer<typeof memberSchema>;
export const memberReplySchema = z.object({ member: memberSchema });

export const inviteSchema = z.object({ id: z.string(), email: z.string(), role: roleSchema, expiresAt: z.string() });
export type Invite = z.infer<typeof inviteSchema>;
export const inviteReplySchema = z.object({ invite: inviteSchema });

export const membersReplySchema = z.object({ members: z.array(memberSchema), invites: z.array(inviteSchema) });
export type MembersReply = z.infer<typeof membersReplySchema>;

/** GET /api/invites/:token: what the invitation is for, shown before accepting. */
export const invitePreviewSchema = z.object({ teamName: z.string(), email: z.string(), role: roleSchema });
export type InvitePreview = z.infer<typeof invitePreviewSchema>;
