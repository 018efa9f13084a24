/**
 * Comments on a version: general or pinned to a tube, a bend or a circuit; a reply joins the thread of the comment
 * it answers; only a thread (its first comment) is resolved or reopened. Members except viewers write; guests write
 * through a review link that allows it (server/services/review.ts).
 */
import { findComment, insertComment, listComments, setCommentResolved, type CommentListRow } from '@/db/queries/comments';
import { findRole } from '@/db/queries/teams';
import { findUserById } from '@/db/queries/users';
import { findVersionTeam, type FoundVersion } from '@/db/queries/versions';
import type { Executor } from '@/db/client';
import type { Comment, CommentPin, CreateCommentBody } from '@/lib/schema/api-versions';
import { AppError, notFound } from '@/server/errors';
import type { ServiceDeps } from '@/server/services/context';
import type { NotificationService } from '@/server/services/notifications';
import { isUuid, requireReviewCapability, versionAccess } from '@/server/services/version-access';

const badField = (field: string, message: string) => new AppError(400, 'invalid_input', `Check ${field}: ${message}`, { [field]: message });

export function presentComment({ comment, authorName }: CommentListRow): Comment {
  const author: Comment['author'] =
    comment.guestName !== null
      ? { kind: 'guest', name: comment.guestName }
      : { kind: 'member', id: comment.authorId, name: authorName ?? 'Former member' };
  return {
    id: comment.id,
    versionId: comment.versionId,
    parentId: comment.parentId,
    author,
    body: comment.body,
    pin: comment.pin,
    resolved: comment.resolvedAt !== null,
    resolvedAt: comment.resolvedAt?.toISOString() ?? null,
    createdAt: comment.createdAt.toISOString(),
  };
}

/** A pin must point at something that exists in this version's drawing. */
function checkPin(pin: CommentPin, version: FoundVersion): void {
  const { rows, tubesPerRow } = version.document.geometry;
  const onSheet = (field: string, t: { row: number; tube: number }) => {
    if (t.row > rows) throw badField(`${field}.row`, `this coil has ${rows} rows`);
    if (t.tube > tubesPerRow) throw badField(`${field}.tube`, `this coil has ${tubesPerRow} tubes per row`);
  };
  if (pin.kind === 'tube') onSheet('pin', pin);
  if (pin.kind === 'bend') {
    onSheet('pin.a', pin.a);
    onSheet('pin.b', pin.b);
  }
  if (pin.kind === 'circuit' && pin.index > version.summary.circuitCount) {
    throw badField('pin.index', `this version has ${version.summary.circuitCount} circuits`);
  }
}

export type CommentAuthorInput = { kind: 'member'; userId: string } | { kind: 'guest'; name: string; shareLinkId: string };

/** Stores a comment on `version` (already authorised) and mails the coil's creator and last editor. */
export async function addComment(
  db: Executor,
  notifications: NotificationService,
  version: FoundVersion,
  author: CommentAuthorInput,
  input: CreateCommentBody,
  coilLink: string,
): Promise<Comment> {
  let parentId: string | null = null;
  if (input.parentId) {
    const parent = await findComment(db, input.parentId);
    if (!parent || parent.comment.versionId !== version.id) throw badField('parentId', 'no such comment on this version');
    parentId = parent.comment.parentId ?? parent.comment.id;
  }
  const pin = input.pin ?? null;
  if (pin) checkPin(pin, version);
  const row = await insertComment(db, {
    versionId: version.id,
    parentId,
    authorId: author.kind === 'member' ? author.userId : null,
    guestName: author.kind === 'guest' ? author.name : null,
    shareLinkId: author.kind === 'guest' ? author.shareLinkId : null,
    body: input.body,
    pin,
  });
  const authorName = author.kind === 'member' ? (await findUserById(db, author.userId))?.name ?? null : null;
  const comment = presentComment({ comment: row, authorName });
  await notifications.newComment(
    { teamId: version.teamId, coilName: version.coilName, versionNumber: version.number },
    {
      recipients: [version.coilCreatedBy, version.coilUpdatedBy],
      actorId: author.kind === 'member' ? author.userId : null,
      authorName: comment.author.kind === 'guest' ? `${comment.author.name} (guest reviewer)` : comment.author.name,
      body: input.body,
      url: coilLink,
    },
  );
  return comment;
}

export const coilUrl = (origin: string, version: FoundVersion) => `${origin}/projects/${version.projectId}/coils/${version.coilId}`;

export function commentService(deps: ServiceDeps, notifications: NotificationService) {
  const { db } = deps;
  const now = deps.now ?? (() => new Date());

  return {
    async list(userId: string, versionId: string): Promise<Comment[]> {
      await versionAccess(db, versionId, userId, 'read');
      return (await listComments(db, versionId)).map(presentComment);
    },

    async create(userId: string, versionId: string, input: CreateCommentBody, origin: string): Promise<Comment> {
      const { version } = await versionAccess(db, versionId, userId, 'comment');
      return addComment(db, notifications, version, { kind: 'member', userId }, input, coilUrl(origin, version));
    },

    async setResolved(userId: string, commentId: string, resolved: boolean): Promise<Comment> {
      const found = isUuid(commentId) ? await findComment(db, commentId) : undefined;
      const teamId = found && (await findVersionTeam(db, found.comment.versionId));
      const role = teamId && (await findRole(db, teamId, userId));
      if (!found || !role) throw notFound('The comment');
      requireReviewCapability(role, 'comment');
      if (found.comment.parentId !== null) throw badField('resolved', 'resolve the thread from its first comment, not from a reply');
      await setCommentResolved(db, commentId, resolved, userId, now());
      const updated = await findComment(db, commentId);
      if (!updated) throw notFound('The comment');
      return presentComment(updated);
    },
  };
}
