/** Teams, members and invitations. Only owners manage members; a team always keeps at least one owner. */
import { claimInvite, findOpenInvite, insertInvite, listOpenInvites } from '@/db/queries/tokens';
import {
  deleteMembership,
  findRole,
  findTeam,
  insertMembership,
  insertTeam,
  listMembers,
  lockMemberships,
  updateMembershipRole,
} from '@/db/queries/teams';
import { findUserById } from '@/db/queries/users';
import type { Role } from '@/db/schema';
import { hashToken, newToken } from '@/server/auth/tokens';
import { notFound } from '@/server/errors';
import { inviteMail } from '@/server/mail/messages';
import { conflict, requireCapability, teamRole } from '@/server/services/access';
import type { ServiceDeps } from '@/server/services/context';

const INVITE_LIFETIME_MS = 7 * 24 * 60 * 60 * 1000;

const lastOwner = () =>
  conflict('last_owner', 'A team needs at least one owner. Make someone else an owner first.', {
    role: 'A team needs at least one owner.',
  });

/** Re-checks the caller under the row locks: a concurrent change may have demoted them since the first check. */
function assertStillOwner(rows: { userId: string; role: Role }[], userId: string): void {
  const me = rows.find((r) => r.userId === userId);
  if (!me) throw notFound('The team');
  requireCapability(me.role, 'manage');
}

export function teamService(deps: ServiceDeps) {
  const { db, mailer, logger } = deps;
  const now = deps.now ?? (() => new Date());

  return {
    async create(userId: string, name: string) {
      return db.transaction(async (tx) => {
        const team = await insertTeam(tx, name);
        await insertMembership(tx, team.id, userId, 'owner');
        return { id: team.id, name: team.name, role: 'owner' as Role };
      });
    },

    async members(userId: string, teamId: string) {
      await teamRole(db, teamId, userId, 'read');
      const [members, invites] = await Promise.all([listMembers(db, teamId), listOpenInvites(db, teamId, now())]);
      return { members, invites };
    },

    async invite(userId: string, teamId: string, email: string, role: Role, appOrigin: string) {
      await teamRole(db, teamId, userId, 'manage');
      const address = email.trim().toLowerCase();
      const members = await listMembers(db, teamId);
      if (members.some((m) => m.email === address)) {
        throw conflict('already_member', `${address} is already a member of this team.`, { email: 'Already a member.' });
      }
      const { token, tokenHash } = newToken();
      const invite = await insertInvite(db, {
        teamId,
        email: address,
        role,
        tokenHash,
        invitedBy: userId,
        expiresAt: new Date(now().getTime() + INVITE_LIFETIME_MS),
      });
      const [team, inviter] = await Promise.all([findTeam(db, teamId), findUserById(db, userId)]);
      try {
        await mailer.send(inviteMail(address, inviter?.name ?? 'A colleague', team?.name ?? 'a team', role, `${appOrigin}/invite/${token}`));
      } catch (err) {
        logger.error({ err }, 'invitation mail failed');
      }
      return { id: invite.id, email: invite.email, role: invite.role, expiresAt: invite.expiresAt };
    },

    /** What the invitation page shows before accepting; 404 when unknown, used or expired. */
    async inviteDetails(token: string) {
      const found = await findOpenInvite(db, hashToken(token), now());
      if (!found) throw notFound('This invitation');
      return { teamName: found.teamName, email: found.invite.email, role: found.invite.role };
    },

    async acceptInvite(userId: string, token: string) {
      return db.transaction(async (tx) => {
        const found = await findOpenInvite(tx, hashToken(token), now());
        if (!found) throw notFound('This invitation');
        const { invite } = found;
        if (await findRole(tx, invite.teamId, userId)) {
          throw conflict('already_member', `You are already a member of ${found.teamName}.`);
        }
        if (!(await claimInvite(tx, invite.id, userId, now()))) throw notFound('This invitation');
        await insertMembership(tx, invite.teamId, userId, invite.role);
        return { id: invite.teamId, name: found.teamName, role: invite.role };
      });
    },

    async changeRole(userId: string, teamId: string, memberId: string, role: Role) {
      await teamRole(db, teamId, userId, 'manage');
      return db.transaction(async (tx) => {
        const rows = await lockMemberships(tx, teamId);
        assertStillOwner(rows, userId);
        const target = rows.find((r) => r.userId === memberId);
        if (!target) throw notFound('The member');
        const owners = rows.filter((r) => r.role === 'owner').length;
        if (target.role === 'owner' && role !== 'owner' && owners <= 1) throw lastOwner();
        await updateMembershipRole(tx, teamId, memberId, role);
        const user = await findUserById(tx, memberId);
        return { userId: memberId, email: user?.email ?? '', name: user?.name ?? '', role };
      });
    },

    async removeMember(userId: string, teamId: string, memberId: string) {
      await teamRole(db, teamId, userId, 'manage');
      await db.transaction(async (tx) => {
        const rows = await lockMemberships(tx, teamId);
        assertStillOwner(rows, userId);
        const target = rows.find((r) => r.userId === memberId);
        if (!target) throw notFound('The member');
        if (target.role === 'owner' && rows.filter((r) => r.role === 'owner').length <= 1) {
          throw conflict('last_owner', 'A team needs at least one owner, so its last owner cannot be removed.');
        }
        await deleteMembership(tx, teamId, memberId);
      });
    },
  };
}
