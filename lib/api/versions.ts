/**
 * Typed calls for versions, compare, review links, comments, decisions and notification settings
 * (DEVELOPERS.md, HTTP API). Every reply is parsed with its lib/schema/api-versions contract.
 */
import { api } from '@/lib/api/client';
import type { CoilDocument } from '@/lib/schema/coil-document';
import {
  commentListReplySchema,
  commentReplySchema,
  compareReplySchema,
  createdShareLinkReplySchema,
  createdVersionReplySchema,
  decisionReplySchema,
  notificationSettingsReplySchema,
  restoreVersionReplySchema,
  reviewReplySchema,
  shareLinkListReplySchema,
  versionListReplySchema,
  versionReplySchema,
  type Comment,
  type CompareReply,
  type CreateCommentBody,
  type CreateDecisionBody,
  type CreateGuestCommentBody,
  type CreateShareLinkBody,
  type CreatedShareLinkReply,
  type Decision,
  type NotificationSettings,
  type RestoreVersionReply,
  type ReviewReply,
  type ShareLink,
  type VersionDetail,
  type VersionListItem,
} from '@/lib/schema/api-versions';

const id = encodeURIComponent;

/** react-query keys, so screens that show the same data share and invalidate it together. */
export const versionKeys = {
  list: (coilId: string) => ['coil', coilId, 'versions'] as const,
  one: (versionId: string) => ['version', versionId] as const,
  compare: (a: string, b: string) => ['version', a, 'compare', b] as const,
  comments: (versionId: string) => ['version', versionId, 'comments'] as const,
  shareLinks: (coilId: string) => ['coil', coilId, 'share-links'] as const,
  review: (token: string) => ['review', token] as const,
  notifications: ['me', 'notifications'] as const,
};

export async function listVersions(coilId: string): Promise<VersionListItem[]> {
  return (await api.get(`/api/coils/${id(coilId)}/versions`, versionListReplySchema)).versions;
}

/** Saves the draft as a version, or, when `document` is given, that drawing instead (the draft is left as it is). */
export async function saveVersion(coilId: string, message: string, document?: CoilDocument): Promise<VersionListItem> {
  const body = document ? { message, document } : { message };
  return (await api.post(`/api/coils/${id(coilId)}/versions`, body, createdVersionReplySchema)).version;
}

export async function getVersion(versionId: string): Promise<VersionDetail> {
  return (await api.get(`/api/versions/${id(versionId)}`, versionReplySchema)).version;
}

export function restoreVersion(versionId: string): Promise<RestoreVersionReply> {
  return api.post(`/api/versions/${id(versionId)}/restore`, {}, restoreVersionReplySchema);
}

export function compareVersions(a: string, b: string): Promise<CompareReply> {
  return api.get(`/api/versions/${id(a)}/compare/${id(b)}`, compareReplySchema);
}

export async function recordDecision(versionId: string, body: CreateDecisionBody): Promise<Decision> {
  return (await api.post(`/api/versions/${id(versionId)}/decisions`, body, decisionReplySchema)).decision;
}

export function createShareLink(versionId: string, body: CreateShareLinkBody): Promise<CreatedShareLinkReply> {
  return api.post(`/api/versions/${id(versionId)}/share-links`, body, createdShareLinkReplySchema);
}

export async function listShareLinks(coilId: string): Promise<ShareLink[]> {
  return (await api.get(`/api/coils/${id(coilId)}/share-links`, shareLinkListReplySchema)).shareLinks;
}

export async function revokeShareLink(linkId: string): Promise<void> {
  await api.delete(`/api/share-links/${id(linkId)}`);
}

export async function listComments(versionId: string): Promise<Comment[]> {
  return (await api.get(`/api/versions/${id(versionId)}/comments`, commentListReplySchema)).comments;
}

export async function addComment(versionId: string, body: CreateCommentBody): Promise<Comment> {
  return (await api.post(`/api/versions/${id(versionId)}/comments`, body, commentReplySchema)).comment;
}

export async function setCommentResolved(commentId: string, resolved: boolean): Promise<Comment> {
  return (await api.patch(`/api/comments/${id(commentId)}`, { resolved }, commentReplySchema)).comment;
}

/** Public (no sign-in): the version a review link opens. */
export function openReview(token: string): Promise<ReviewReply> {
  return api.get(`/api/review/${id(token)}`, reviewReplySchema);
}

/** Public (no sign-in): a guest's comment through a review link that allows comments. */
export async function addGuestComment(token: string, body: CreateGuestCommentBody): Promise<Comment> {
  return (await api.post(`/api/review/${id(token)}/comments`, body, commentReplySchema)).comment;
}

export async function getNotificationSettings(): Promise<NotificationSettings> {
  return (await api.get('/api/me/notifications', notificationSettingsReplySchema)).settings;
}

export async function saveNotificationSettings(settings: NotificationSettings): Promise<NotificationSettings> {
  return (await api.put('/api/me/notifications', settings, notificationSettingsReplySchema)).settings;
}
