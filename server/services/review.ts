/**
 * Review links: a token (shown once; only its SHA-256 is stored) that lets anyone read one version, and write
 * comments on it when the link allows, without signing in. The token reaches nothing else. Unknown, revoked and
 * expired tokens are all "not found".
 */
import { listComments } from '@/db/queries/comments';
import {
  findLiveShareLink,
  findShareLink,
  insertShareLink,
  listShareLinksOfCoil,
  recordShareLinkOpen,
  revokeShareLink,
  type ShareLinkListRow,
} from '@/db/queries/share-links';
import { findRole } from '@/db/queries/teams';
import { findUserById } from '@/db/queries/users';
import { findVersion, type FoundVersion } from '@/db/queries/versions';
import type { Comment, CreateGuestCommentBody, CreateShareLinkBody, CreatedShareLinkReply, ReviewReply, ShareLink } from '@/lib/schema/api-versions';
import { hashToken, newToken } from '@/server/auth/tokens';
import { AppError, notFound } from '@/server/errors';
import { coilAccess } from '@/server/services/access';
import { addComment, coilUrl, presentComment } from '@/server/services/comments';
import type { ServiceDeps } from '@/server/services/context';
import type { NotificationService } from '@/server/services/notifications';
import { isUuid, requireReviewCapability, versionAccess } from '@/server/services/version-access';
import { solveVersion } from '@/server/services/version-results';

/** 32 random bytes in base64url are 43 characters; anything else cannot be a token. */
const TOKEN_SHAPE = /^[A-Za-z0-9_-]{43}$/;
const deadLink = () => notFound('This review link');

export const reviewUrl = (origin: string, token: string) => `${origin}/review/${token}`;

function presentShareLink(row: Pick<ShareLinkListRow, 'link' | 'versionNumber' | 'createdByName'>, now: Date): ShareLink {
  const { link } = row;
  const state = link.revokedAt ? 'revoked' : link.expiresAt && link.expiresAt <= now ? 'expired' : 'active';
  return {
    id: link.id,
    versionId: link.versionId,
    versionNumber: row.versionNumber,
    allowComments: link.allowComments,
    expiresAt: link.expiresAt?.toISOString() ?? null,
    revokedAt: link.revokedAt?.toISOString() ?? null,
    createdBy: link.createdBy ? { id: link.createdBy, name: row.createdByName ?? '' } : null,
    createdAt: link.createdAt.toISOString(),
    firstOpenedAt: link.firstOpenedAt?.toISOString() ?? null,
    lastOpenedAt: link.lastOpenedAt?.toISOString() ?? null,
    openCount: link.openCount,
    state,
  };
}

export function reviewService(deps: ServiceDeps, notifications: NotificationService) {
  const { db, logger } = deps;
  const now = deps.now ?? (() => new Date());

  /** The version a live token opens; 404 for a malformed, unknown, revoked or expired token. */
  async function liveLink(token: string) {
    if (!TOKEN_SHAPE.test(token)) throw deadLink();
    const link = await findLiveShareLink(db, hashToken(token), now());
    const version = link && (await findVersion(db, link.versionId));
    if (!link || !version) throw deadLink();
    return { link, version };
  }

  return {
    async create(userId: string, versionId: string, input: CreateShareLinkBody, origin: string): Promise<CreatedShareLinkReply> {
      const { version } = await versionAccess(db, versionId, userId, 'edit');
      const { token, tokenHash } = newToken();
      const expiresAt = input.expiresAt ? new Date(input.expiresAt) : null;
      const link = await insertShareLink(db, { versionId, tokenHash, allowComments: input.allowComments, expiresAt, createdBy: userId });
      const actor = await findUserById(db, userId);
      const url = reviewUrl(origin, token);
      await notifications.reviewRequested(
        { teamId: version.teamId, coilName: version.coilName, versionNumber: version.number },
        { actorId: userId, actorName: actor?.name ?? 'A colleague', message: version.message, url, expiresAt },
      );
      return { shareLink: presentShareLink({ link, versionNumber: version.number, createdByName: actor?.name ?? null }, now()), token, url };
    },

    async list(userId: string, coilId: string): Promise<ShareLink[]> {
      await coilAccess(db, coilId, userId, 'read');
      const at = now();
      return (await listShareLinksOfCoil(db, coilId)).map((row) => presentShareLink(row, at));
    },

    async revoke(userId: string, linkId: string): Promise<void> {
      const found = isUuid(linkId) ? await findShareLink(db, linkId) : undefined;
      const role = found && (await findRole(db, found.teamId, userId));
      if (!found || !role) throw notFound('The review link');
      requireReviewCapability(role, 'edit');
      await revokeShareLink(db, linkId, now());
    },

    /** Public: what the review page shows. Each call counts as one opening of the link. */
    async open(token: string): Promise<ReviewReply> {
      if (!TOKEN_SHAPE.test(token)) throw deadLink();
      const link = await recordShareLinkOpen(db, hashToken(token), now());
      const version = link && (await findVersion(db, link.versionId));
      if (!link || !version) throw deadLink();
      const comments: Comment[] | undefined = link.allowComments ? (await listComments(db, version.id)).map(presentComment) : undefined;
      return {
        version: publicVersion(version),
        result: solveVersion(version.document, deps.solve, logger),
        allowComments: link.allowComments,
        expiresAt: link.expiresAt?.toISOString() ?? null,
        ...(comments ? { comments } : {}),
      };
    },

    /** Public: a guest's comment through a link that allows comments (403 when it does not). */
    async comment(token: string, input: CreateGuestCommentBody, origin: string): Promise<Comment> {
      const { link, version } = await liveLink(token);
      if (!link.allowComments) throw new AppError(403, 'comments_disabled', 'This review link does not take comments.');
      return addComment(db, notifications, version, { kind: 'guest', name: input.guestName, shareLinkId: link.id }, input, coilUrl(origin, version));
    },
  };
}

function publicVersion(v: FoundVersion): ReviewReply['version'] {
  return {
    number: v.number,
    message: v.message,
    createdAt: v.createdAt.toISOString(),
    coilName: v.coilName,
    author: v.authorName,
    document: v.document,
    summary: v.summary,
  };
}
