/** Typed calls for teams, members and invitations (DEVELOPERS.md, HTTP API). */
import { api } from '@/lib/api/client';
import type { Role } from '@/lib/schema/api-auth';
import {
  invitePreviewSchema,
  inviteReplySchema,
  memberReplySchema,
  membersReplySchema,
  teamReplySchema,
  type CreateTeamBody,
  type Invite,
  type InviteBody,
  type InvitePreview,
  type Member,
  type MembersReply,
} from '@/lib/schema/api-teams';

const team = (teamId: string) => `/api/teams/${encodeURIComponent(teamId)}`;

export async function createTeam(body: CreateTeamBody): Promise<{ id: string; name: string }> {
  return (await api.post('/api/teams', body, teamReplySchema)).team;
}

export function listMembers(teamId: string): Promise<MembersReply> {
  return api.get(`${team(teamId)}/members`, membersReplySchema);
}

export async function inviteMember(teamId: string, body: InviteBody): Promise<Invite> {
  return (await api.post(`${team(teamId)}/invites`, body, inviteReplySchema)).invite;
}

export async function changeMemberRole(teamId: string, userId: string, role: Role): Promise<Member> {
  return (await api.patch(`${team(teamId)}/members/${encodeURIComponent(userId)}`, { role }, memberReplySchema)).member;
}

export async function removeMember(teamId: string, userId: string): Promise<void> {
  await api.delete(`${team(teamId)}/members/${encodeURIComponent(userId)}`);
}

export function getInvite(token: string): Promise<InvitePreview> {
  return api.get(`/api/invites/${encodeURIComponent(token)}`, invitePreviewSchema);
}

export async function acceptInvite(token: string): Promise<{ id: string; name: string }> {
  return (await api.post(`/api/invites/${encodeURIComponent(token)}/accept`, {}, teamReplySchema)).team;
}
