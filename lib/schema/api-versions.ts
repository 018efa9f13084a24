/**
 * Request and reply contracts of versions, compare, review links, comments, decisions and notification
 * settings (DEVELOPERS.md, HTTP API). Shared by the server (body parsing) and the app (forms, reply parsing).
 */
import { z } from 'zod';
import { bendSchema, coilDocumentSchema, endFaceSchema, stubSchema, tubeRefSchema } from '@/lib/schema/coil-document';
import { solveResultSchema } from '@/lib/schema/solve-result';

const isoDate = z.string().refine((v) => !Number.isNaN(Date.parse(v)), 'must be a date and time');
const person = z.object({ id: z.string(), name: z.string() });

// ---- versions ----

export const createVersionBodySchema = z.object({
  message: z
    .string({ error: 'Describe what this version changes.' })
    .trim()
    .min(1, 'Describe what this version changes.')
    .max(500, 'Keep the message under 500 characters.'),
  /** A drawing to keep as this version instead of the draft (a conflicting edit); the draft stays untouched. */
  document: coilDocumentSchema.optional(),
});
export type CreateVersionBody = z.infer<typeof createVersionBodySchema>;

export const versionSummarySchema = z.object({
  valid: z.boolean(),
  capacity_W: z.number().nullable(),
  waterPressureDrop_Pa: z.number().nullable(),
  airPressureDrop_Pa: z.number().nullable(),
  circuitCount: z.number(),
  warningCount: z.number(),
  errorCount: z.number(),
});
export type VersionSummary = z.infer<typeof versionSummarySchema>;

export const DECISION_STATUSES = ['approved', 'changes-requested'] as const;
export const decisionStatusSchema = z.enum(DECISION_STATUSES, { error: 'status must be "approved" or "changes-requested"' });
export type DecisionStatus = z.infer<typeof decisionStatusSchema>;

export const decisionSchema = z.object({
  id: z.string(),
  versionId: z.string(),
  status: decisionStatusSchema,
  note: z.string(),
  decidedBy: person.nullable(),
  createdAt: isoDate,
});
export type Decision = z.infer<typeof decisionSchema>;

export const versionListItemSchema = z.object({
  id: z.string(),
  coilId: z.string(),
  number: z.number().int(),
  message: z.string(),
  draftRevision: z.number().int(),
  author: person.nullable(),
  createdAt: isoDate,
  summary: versionSummarySchema,
  latestDecision: decisionSchema.nullable(),
});
export type VersionListItem = z.infer<typeof versionListItemSchema>;

export const versionDetailSchema = versionListItemSchema.extend({ document: coilDocumentSchema });
export type VersionDetail = z.infer<typeof versionDetailSchema>;

export const versionListReplySchema = z.object({ versions: z.array(versionListItemSchema) });
export const versionReplySchema = z.object({ version: versionDetailSchema });
export const createdVersionReplySchema = z.object({ version: versionListItemSchema });
export const restoreVersionReplySchema = z.object({ revision: z.number().int(), updatedAt: isoDate });
export type RestoreVersionReply = z.infer<typeof restoreVersionReplySchema>;

// ---- compare ----

export const stubKindSchema = z.enum(['supply', 'return']);
export const taggedStubSchema = z.object({ kind: stubKindSchema, stub: stubSchema });
export type TaggedStub = z.infer<typeof taggedStubSchema>;

export const resultDifferenceSchema = z.object({
  key: z.string(),
  a: z.number().nullable(),
  b: z.number().nullable(),
  /** b - a, null when either side is unknown. */
  difference: z.number().nullable(),
});
export type ResultDifference = z.infer<typeof resultDifferenceSchema>;

export const settingDifferenceSchema = z.object({
  path: z.string(),
  a: z.union([z.string(), z.number(), z.boolean(), z.null()]),
  b: z.union([z.string(), z.number(), z.boolean(), z.null()]),
});
export type SettingDifference = z.infer<typeof settingDifferenceSchema>;

export const compareReplySchema = z.object({
  a: z.object({ id: z.string(), number: z.number().int(), coilId: z.string() }),
  b: z.object({ id: z.string(), number: z.number().int(), coilId: z.string() }),
  bends: z.object({
    added: z.array(bendSchema),
    removed: z.array(bendSchema),
    changed: z.array(z.object({ before: bendSchema, after: bendSchema })),
  }),
  stubs: z.object({
    added: z.array(taggedStubSchema),
    removed: z.array(taggedStubSchema),
    changed: z.array(z.object({ before: taggedStubSchema, after: taggedStubSchema })),
  }),
  /** Geometry, conditions and options values that differ (dotted paths). */
  settings: z.array(settingDifferenceSchema),
  results: z.array(resultDifferenceSchema),
});
export type CompareReply = z.infer<typeof compareReplySchema>;

// ---- review links ----

export const createShareLinkBodySchema = z.object({
  expiresAt: isoDate
    .refine((v) => Date.parse(v) > Date.now(), 'must be in the future')
    .nullable()
    .optional(),
  allowComments: z.boolean({ error: 'allowComments must be true or false' }),
});
export type CreateShareLinkBody = z.infer<typeof createShareLinkBodySchema>;

export const shareLinkStateSchema = z.enum(['active', 'revoked', 'expired']);
export const shareLinkSchema = z.object({
  id: z.string(),
  versionId: z.string(),
  versionNumber: z.number().int(),
  allowComments: z.boolean(),
  expiresAt: isoDate.nullable(),
  revokedAt: isoDate.nullable(),
  createdBy: person.nullable(),
  createdAt: isoDate,
  firstOpenedAt: isoDate.nullable(),
  lastOpenedAt: isoDate.nullable(),
  openCount: z.number().int(),
  state: shareLinkStateSchema,
});
export type ShareLink = z.infer<typeof shareLinkSchema>;

/** The token and the link are shown once, in this reply only. */
export const createdShareLinkReplySchema = z.object({ shareLink: shareLinkSchema, token: z.string(), url: z.string() });
export type CreatedShareLinkReply = z.infer<typeof createdShareLinkReplySchema>;
export const shareLinkListReplySchema = z.object({ shareLinks: z.array(shareLinkSchema) });

// ---- comments ----

export const commentPinSchema = z.discriminatedUnion(
  'kind',
  [
    z.object({ kind: z.literal('tube'), row: tubeRefSchema.shape.row, tube: tubeRefSchema.shape.tube }),
    z.object({ kind: z.literal('bend'), end: endFaceSchema, a: tubeRefSchema, b: tubeRefSchema }),
    z.object({ kind: z.literal('circuit'), index: z.number().int('circuit index must be a whole number').min(1, 'circuits are counted from 1') }),
  ],
  { error: 'pin kind must be "tube", "bend" or "circuit"' },
);
export type CommentPin = z.infer<typeof commentPinSchema>;

const commentText = z
  .string({ error: 'Write a comment.' })
  .trim()
  .min(1, 'Write a comment.')
  .max(5000, 'Keep a comment under 5000 characters.');

export const createCommentBodySchema = z.object({
  body: commentText,
  pin: commentPinSchema.nullable().optional(),
  parentId: z.uuid('parentId must be a comment id').nullable().optional(),
});
export type CreateCommentBody = z.infer<typeof createCommentBodySchema>;

export const createGuestCommentBodySchema = createCommentBodySchema.extend({
  guestName: z
    .string({ error: 'Enter your name.' })
    .trim()
    .min(1, 'Enter your name.')
    .max(100, 'Keep the name under 100 characters.'),
});
export type CreateGuestCommentBody = z.infer<typeof createGuestCommentBodySchema>;

export const updateCommentBodySchema = z.object({ resolved: z.boolean({ error: 'resolved must be true or false' }) });
export type UpdateCommentBody = z.infer<typeof updateCommentBodySchema>;

export const commentAuthorSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('member'), id: z.string().nullable(), name: z.string() }),
  z.object({ kind: z.literal('guest'), name: z.string() }),
]);
export type CommentAuthor = z.infer<typeof commentAuthorSchema>;

export const commentSchema = z.object({
  id: z.string(),
  versionId: z.string(),
  parentId: z.string().nullable(),
  author: commentAuthorSchema,
  body: z.string(),
  pin: commentPinSchema.nullable(),
  resolved: z.boolean(),
  resolvedAt: isoDate.nullable(),
  createdAt: isoDate,
});
export type Comment = z.infer<typeof commentSchema>;

export const commentReplySchema = z.object({ comment: commentSchema });
/** Oldest first; a thread is a comment with parentId null plus the comments naming it as parent. */
export const commentListReplySchema = z.object({ comments: z.array(commentSchema) });

// ---- decisions ----

export const createDecisionBodySchema = z.object({
  status: decisionStatusSchema,
  note: z.string().trim().max(2000, 'Keep the note under 2000 characters.').optional(),
});
export type CreateDecisionBody = z.infer<typeof createDecisionBodySchema>;
export const decisionReplySchema = z.object({ decision: decisionSchema });

// ---- public review ----

export const reviewReplySchema = z.object({
  version: z.object({
    number: z.number().int(),
    message: z.string(),
    createdAt: isoDate,
    coilName: z.string(),
    author: z.string().nullable(),
    document: coilDocumentSchema,
    summary: versionSummarySchema,
  }),
  result: solveResultSchema,
  allowComments: z.boolean(),
  expiresAt: isoDate.nullable(),
  /** Present only when the link allows comments. */
  comments: z.array(commentSchema).optional(),
});
export type ReviewReply = z.infer<typeof reviewReplySchema>;

// ---- notification settings ----

export const notificationSettingsSchema = z.object({
  reviewRequested: z.boolean({ error: 'reviewRequested must be true or false' }),
  newComment: z.boolean({ error: 'newComment must be true or false' }),
  decision: z.boolean({ error: 'decision must be true or false' }),
});
export type NotificationSettings = z.infer<typeof notificationSettingsSchema>;
export const notificationSettingsReplySchema = z.object({ settings: notificationSettingsSchema });
